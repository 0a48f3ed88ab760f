// The autosave state in words, in a polite live region (WCAG 4.1.3). The glyph repeats the words.
import type { SaverSnapshot } from "./answer-saver";

const WORDS: Record<SaverSnapshot["status"], string> = {
  idle: "Answers save as you go",
  saving: "Saving…",
  saved: "Saved",
  offline: "Offline — will retry",
  closed: "Saving has stopped",
  failed: "Not saved",
};

export function SaveStatus({ snapshot }: { snapshot: SaverSnapshot }) {
  const { status, message, retryInMs } = snapshot;
  const glyph = status === "saved" ? "✓" : status === "offline" || status === "failed" || status === "closed" ? "!" : "…";
  return (
    <p role="status" className="flex items-center gap-2 text-body-sm" data-testid="save-status" data-status={status}>
      <span aria-hidden="true" className="inline-grid size-5 place-items-center rounded-full border border-border font-mono text-caption">
        {glyph}
      </span>
      <span className={status === "offline" || status === "failed" ? "font-semibold text-caution" : undefined}>
        {WORDS[status]}
        {status === "offline" && retryInMs !== null && <span className="font-normal text-ink-muted"> (next try in {Math.ceil(retryInMs / 1000)} s)</span>}
        {(status === "failed" || status === "closed") && message && <span className="font-normal">: {message}</span>}
      </span>
    </p>
  );
}
