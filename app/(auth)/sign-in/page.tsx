import type { Metadata } from "next";
import Link from "next/link";
import { AccountForm } from "@/components/account/account-form";
import { safeRedirectPath } from "@/lib/net/safe-redirect";
import { publicOrigin } from "@/lib/server/http";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string | string[] }> }) {
  const { next } = await searchParams;
  // A repeated parameter (?next=a&next=b) is refused rather than guessed at.
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Sign in</h1>
      <AccountForm
        testId="sign-in-form"
        endpoint="/api/account/sign-in"
        submitLabel="Sign in"
        redirectTo={safeRedirectPath(typeof next === "string" ? next : undefined, publicOrigin())}
        fields={[
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password", type: "password", autoComplete: "current-password" },
        ]}
      />
      <ul className="space-y-2 text-sm">
        <li>
          <Link className="font-semibold text-accent-text underline underline-offset-4" href="/sign-in/link">E-mail me a sign-in link instead</Link>
        </li>
        <li>
          <Link className="font-semibold text-accent-text underline underline-offset-4" href="/reset-password">Forgot your password?</Link>
        </li>
        <li>
          New to Axisline? <Link className="font-semibold text-accent-text underline underline-offset-4" href="/sign-up">Create an account</Link>
        </li>
      </ul>
    </div>
  );
}
