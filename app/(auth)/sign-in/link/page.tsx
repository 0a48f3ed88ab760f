import type { Metadata } from "next";
import { AccountForm } from "@/components/account/account-form";

export const metadata: Metadata = { title: "Sign in with an e-mail link", robots: { index: false } };

// Scanner-safe: a GET or HEAD of the e-mailed address shows this page and consumes nothing.
// Only the person's POST (the button) signs in.
export default async function LinkPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (token)
    return (
      <div className="space-y-6">
        <h1 className="text-2xl font-bold">Finish signing in</h1>
        <p>Press the button to sign in to Axisline on this device.</p>
        <AccountForm testId="link-confirm-form" endpoint="/api/account/link" submitLabel="Sign in to Axisline" redirectTo="/home" fields={[{ name: "token", label: "", type: "hidden", defaultValue: token }]} />
      </div>
    );
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Sign in with an e-mail link</h1>
      <p className="text-ink-muted">We&apos;ll e-mail you a link that signs you in once, within 10 minutes.</p>
      <AccountForm
        testId="link-request-form"
        endpoint="/api/account/link-request"
        submitLabel="E-mail me a link"
        successMessage={<p>If that address has an Axisline account, a sign-in link is on its way. It works once, for 10 minutes.</p>}
        fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email" }]}
      />
    </div>
  );
}
