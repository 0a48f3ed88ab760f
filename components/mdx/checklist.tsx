import { useId, type ReactNode } from "react";

/**
 * <Checklist title="Before doors">: a list to work through on stage. Each item gets an empty box
 * (drawn by CSS, decorative) so a printed copy can be ticked with a pen.
 */
export function Checklist({ title = "Checklist", children }: { title?: string; children?: ReactNode }) {
  const titleId = `checklist-${useId()}`;
  return (
    <section aria-labelledby={titleId} className="not-prose my-6 rounded-card border border-rule bg-surface-raised px-5 py-4 print:border-black">
      <p id={titleId} className="font-semibold text-ink">
        <span className="font-mono text-caption tracking-wide text-ink-muted uppercase">Checklist · </span>
        {title}
      </p>
      <div className="mt-2 text-body text-ink [&_li]:relative [&_li]:mt-2 [&_li]:pl-8 [&_li]:before:absolute [&_li]:before:top-1 [&_li]:before:left-0 [&_li]:before:size-5 [&_li]:before:rounded-tag [&_li]:before:border-2 [&_li]:before:border-border [&_li]:before:content-[''] [&_ul]:list-none">
        {children}
      </div>
    </section>
  );
}
