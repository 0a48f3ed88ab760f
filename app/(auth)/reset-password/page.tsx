import type { Metadata } from "next";
import Link from "next/link";
import { AccountForm } from "@/components/account/account-form";

export const metadata: Metadata = { title: "Reset your password", robots: { index: false } };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (token)
    return (
      <div className="space-y-6">
        <h1 className="text-2xl font-bold">Choose a new password</h1>
        <AccountForm
          testId="reset-form"
          endpoint="/api/account/reset-password"
          submitLabel="Save new password"
          successMessage={
            <p>
              Your password is changed and every other session is signed out. <Link className="font-semibold underline" href="/sign-in">Sign in</Link> with the new one.
            </p>
          }
          fields={[
            { name: "token", label: "", type: "hidden", defaultValue: token },
            { name: "password", label: "New password", type: "password", autoComplete: "new-password", hint: "At least 8 characters; up to 128." },
          ]}
        />
      </div>
    );
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Reset your password</h1>
      <AccountForm
        testId="reset-request-form"
        endpoint="/api/account/reset-request"
        submitLabel="E-mail me a reset link"
        successMessage={<p>If that address has an Axisline account, a reset link is on its way. It works once, for 30 minutes.</p>}
        fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email" }]}
      />
    </div>
  );
}
