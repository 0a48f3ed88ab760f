"use client";

export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <section className="mx-auto max-w-xl py-12 text-center" role="alert">
      <h1 className="text-3xl font-bold">Something went wrong on our side</h1>
      <p className="mt-4 text-ink-muted">Nothing you entered was lost on the server. Try again; if it keeps happening, tell your instructor or the Axisline team.</p>
      <button type="button" onClick={reset} className="mt-6 inline-flex min-h-11 items-center rounded-md bg-accent px-4 font-semibold text-accent-ink hover:bg-accent-hover">
        Try again
      </button>
    </section>
  );
}
