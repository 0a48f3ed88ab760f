import type { Metadata } from "next";
import Link from "next/link";
import { AccountForm } from "@/components/account/account-form";

export const metadata: Metadata = { title: "Confirm your e-mail", robots: { index: false } };

// Opening the link only shows this page; the person's POST confirms (mail scanners open links too).
export default async function VerifyEmailPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Confirm your e-mail</h1>
      {token ? (
        <AccountForm
          testId="verify-form"
          endpoint="/api/account/verify-email"
          submitLabel="Confirm my e-mail"
          successMessage={
            <>
              <p className="font-semibold">Your e-mail is confirmed.</p>
              <p className="mt-1">
                You can now <Link className="font-semibold underline" href="/sign-in">sign in</Link>.
              </p>
            </>
          }
          fields={[{ name: "token", label: "", type: "hidden", defaultValue: token }]}
        />
      ) : (
        <p>This page needs the link from your confirmation e-mail. Open the link again, or copy the whole address into your browser.</p>
      )}
    </div>
  );
}
