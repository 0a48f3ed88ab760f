// A chart as a figure: the drawing is one image with a sentence for screen readers (WCAG 1.1.1);
// the numbers themselves are in the item table beside it.
import type { ReactNode } from "react";

export function ChartFrame({ title, summary, legend, children }: { title: string; summary: string; legend?: ReactNode; children: ReactNode }) {
  return (
    <figure className="flex min-w-0 flex-col gap-2 rounded-card border border-rule bg-surface-raised p-4">
      <figcaption className="text-body font-semibold">{title}</figcaption>
      <div role="img" aria-label={summary} className="h-80 w-full min-w-0">
        {children}
      </div>
      {legend}
      <p className="text-body-sm text-ink-muted">{summary}</p>
    </figure>
  );
}
