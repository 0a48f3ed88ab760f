import Link from "next/link";

export default function NotFound() {
  return (
    <section className="mx-auto max-w-xl py-12 text-center">
      <p className="font-mono text-sm text-ink-muted">404</p>
      <h1 className="mt-2 text-3xl font-bold">No signal on this line</h1>
      <p className="mt-4 text-ink-muted">The page you asked for doesn&apos;t exist, or it has moved.</p>
      <p className="mt-6">
        <Link href="/" className="font-semibold text-accent-text underline underline-offset-4">Back to the start</Link>
      </p>
    </section>
  );
}
