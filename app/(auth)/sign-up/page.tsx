import type { Metadata } from "next";
import Link from "next/link";
import { AccountForm } from "@/components/account/account-form";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Create your Axisline account</h1>
      <AccountForm
        testId="sign-up-form"
        endpoint="/api/account/sign-up"
        submitLabel="Create account"
        successMessage={
          <>
            <p className="font-semibold">Check your inbox.</p>
            <p className="mt-1">We sent a link to confirm your e-mail address. Open it to finish setting up your account.</p>
          </>
        }
        fields={[
          { name: "name", label: "Your name", autoComplete: "name" },
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password", type: "password", autoComplete: "new-password", hint: "At least 8 characters. Long passphrases are welcome (up to 128)." },
        ]}
      />
      <p className="text-sm">
        Already have an account? <Link className="font-semibold text-accent-text underline underline-offset-4" href="/sign-in">Sign in</Link>
      </p>
    </div>
  );
}
