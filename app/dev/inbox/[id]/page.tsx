import Link from "next/link";
import { notFound } from "next/navigation";
import { devInboxEnabled, getCaughtMail } from "@/lib/server/dev-inbox";

export const dynamic = "force-dynamic";

export default async function DevMessagePage({ params }: { params: Promise<{ id: string }> }) {
  if (!(await devInboxEnabled())) notFound();
  const message = await getCaughtMail((await params).id);
  if (!message) notFound();
  return (
    <article className="space-y-4">
      <p>
        <Link href="/dev/inbox" className="font-semibold text-accent-text underline underline-offset-4">← Dev inbox</Link>
      </p>
      <h1 className="text-2xl font-bold">{message.subject}</h1>
      <p className="text-sm text-ink-muted">
        From {message.from} to {message.to.join(", ")} at {message.receivedAt} (UTC)
      </p>
      {/* Shown as text: the mail's HTML never runs in the app's origin. */}
      <pre className="overflow-x-auto whitespace-pre-wrap rounded-xl border border-rule bg-surface-raised p-4 font-mono text-sm">{linkify(message.text)}</pre>
    </article>
  );
}

function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} href={part} className="text-accent-text underline">
        {part}
      </a>
    ) : (
      part
    ),
  );
}
