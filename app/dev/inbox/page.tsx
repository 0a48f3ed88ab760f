import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { devInboxEnabled, listCaughtMail } from "@/lib/server/dev-inbox";

export const metadata: Metadata = { title: "Dev inbox", robots: { index: false } };
export const dynamic = "force-dynamic";

// What the local SMTP catcher received. Absent when SERVICES_MODE=hosted.
export default async function DevInboxPage() {
  if (!(await devInboxEnabled())) notFound();
  const messages = await listCaughtMail();
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Dev inbox</h1>
      <p className="text-ink-muted">Mail caught by the local SMTP catcher. This page exists only with the local fakes.</p>
      {messages === null ? (
        <p role="alert">The mail catcher is not answering. Start it with the demo command.</p>
      ) : messages.length === 0 ? (
        <p className="rounded-xl border border-dashed border-border p-8 text-center text-ink-muted">No mail yet.</p>
      ) : (
        <ul className="divide-y divide-rule rounded-xl border border-rule bg-surface-raised">
          {messages.map((m) => (
            <li key={m.id} className="p-4">
              <Link href={`/dev/inbox/${m.id}`} className="font-semibold text-accent-text underline underline-offset-4">{m.subject}</Link>
              <p className="text-sm text-ink-muted">
                to {m.to.join(", ")} · <time dateTime={m.receivedAt}>{m.receivedAt.replace("T", " ").slice(0, 19)} UTC</time>
              </p>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
