import type { ReactNode } from "react";
import { cx } from "./cx";

export type EmptyStateProps = {
  title: ReactNode;
  description?: ReactNode;
  /** What to do about it: usually a Button or LinkButton. */
  action?: ReactNode;
  /** A decorative picture; hidden from assistive tech because the title says it all. */
  illustration?: ReactNode;
  titleLevel?: 2 | 3 | 4;
  className?: string;
};

/** What a list or page shows when there is nothing in it yet, and the way forward. */
export function EmptyState({ title, description, action, illustration, titleLevel = 2, className }: EmptyStateProps) {
  const Heading = `h${titleLevel}` as const;
  return (
    <div
      className={cx(
        "flex flex-col items-center gap-3 rounded-card border border-dashed border-border px-6 py-10 text-center",
        className,
      )}
    >
      {illustration && (
        <div aria-hidden="true" className="text-ink-muted">
          {illustration}
        </div>
      )}
      <div aria-hidden="true" className="axis-rule w-24" />
      <Heading className="text-title-3 text-ink">{title}</Heading>
      {description && <p className="max-w-reading text-body text-ink-muted">{description}</p>}
      {action && <div className="mt-2 flex flex-wrap justify-center gap-3">{action}</div>}
    </div>
  );
}
