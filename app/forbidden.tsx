import Link from "next/link";

export default function Forbidden() {
  return (
    <section className="mx-auto max-w-xl py-12 text-center">
      <p className="font-mono text-sm text-ink-muted">403</p>
      <h1 className="mt-2 text-3xl font-bold">This area isn&apos;t part of your role</h1>
      <p className="mt-4 text-ink-muted">You are signed in, but your account doesn&apos;t have access to this page.</p>
      <p className="mt-6">
        <Link href="/home" className="font-semibold text-accent-text underline underline-offset-4">Go to your home</Link>
      </p>
    </section>
  );
}
