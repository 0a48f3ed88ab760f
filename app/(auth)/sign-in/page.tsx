import type { Metadata } from "next";
import Link from "next/link";
import { AccountForm } from "@/components/account/account-form";

export const metadata: Metadata = { title: "Sign in" };

function safeNext(next: string | undefined): string {
  return next && next.startsWith("/") && !next.startsWith("//") ? next : "/home";
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const { next } = await searchParams;
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Sign in</h1>
      <AccountForm
        testId="sign-in-form"
        endpoint="/api/account/sign-in"
        submitLabel="Sign in"
        redirectTo={safeNext(next)}
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
