import type { ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import { AlertIcon, CautionIcon, InfoIcon } from "@/components/ui/icons";

export const CALLOUT_KINDS = ["note", "tip", "caution", "danger"] as const;
export type CalloutKind = (typeof CALLOUT_KINDS)[number];

/** A light bulb: tips. Decorative; the word "Tip" carries the meaning. */
function TipIcon({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 20 20" fill="none" stroke="currentColor" strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" aria-hidden="true" focusable="false" className={cx("size-[1.125em] shrink-0", className)}>
      <path d="M7.5 14.5h5M8.5 17.5h3M10 2.5a5.5 5.5 0 0 0-3.2 10c.5.4.7.9.7 1.5h5c0-.6.2-1.1.7-1.5A5.5 5.5 0 0 0 10 2.5z" />
    </svg>
  );
}

const STYLES: Record<CalloutKind, { word: string; Icon: typeof InfoIcon; box: string; ink: string }> = {
  note: { word: "Note", Icon: InfoIcon, box: "border-note bg-note-soft", ink: "text-note" },
  tip: { word: "Tip", Icon: TipIcon, box: "border-success bg-success-soft", ink: "text-success" },
  caution: { word: "Caution", Icon: CautionIcon, box: "border-caution bg-caution-soft", ink: "text-caution" },
  // Danger: for what can hurt someone (mains, phantom into the wrong gear, hearing, falling loads, trips).
  danger: { word: "Danger", Icon: AlertIcon, box: "border-danger bg-danger-soft", ink: "text-danger" },
};

/** hazard: the lesson's safety topic(s) a caution or danger is about, e.g. "hearing" or "stands-overhead, cable-runs" (checked by npm run content:check). */
export type CalloutProps = { kind?: CalloutKind | (string & {}); title?: string; hazard?: string; children?: ReactNode };

/** <Callout kind="danger" hazard="…" title="…">: the kind is said in words and by glyph, never by colour alone (WCAG 1.4.1). */
export function Callout({ kind = "note", title, hazard, children }: CalloutProps) {
  const style = STYLES[(CALLOUT_KINDS as readonly string[]).includes(kind) ? (kind as CalloutKind) : "note"];
  const { Icon } = style;
  return (
    <div role="note" data-callout={kind} data-hazard={hazard} className={cx("not-prose my-6 flex gap-3 rounded-card border-l-4 px-4 py-3 print:border print:border-l-4", style.box)}>
      <Icon className={cx("mt-1", style.ink)} />
      <div className="min-w-0 flex-1 text-body text-ink">
        <p className={cx("font-semibold", style.ink)}>
          {style.word}
          {title ? <span className="text-ink">: {title}</span> : null}
        </p>
        <div className="mt-1 space-y-2 [&_a]:font-semibold [&_li]:ml-5 [&_ol]:list-decimal [&_ul]:list-disc">{children}</div>
      </div>
    </div>
  );
}
