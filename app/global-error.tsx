"use client";

export default function GlobalError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", padding: 32 }}>
        <h1>Axisline could not load this page</h1>
        <p>Please try again in a moment.</p>
        <button type="button" onClick={reset} style={{ minHeight: 44, padding: "0 16px" }}>
          Try again
        </button>
      </body>
    </html>
  );
}
