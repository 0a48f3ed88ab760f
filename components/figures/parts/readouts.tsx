// Readouts: a definition list of labelled values in the figures face, and the one sentence per
// figure that a screen reader hears when the key number changes (aria-live="polite", WCAG 4.1.3).
import type { ReactNode } from "react";
import { cx } from "@/components/ui/cx";

export interface ReadoutItem {
  label: ReactNode;
  value: ReactNode;
  /** For e2e tests that compare the shown value with the library. */
  testId?: string;
  /** A word that carries meaning beside the value (never colour alone, WCAG 1.4.1). */
  tone?: "good" | "bad";
}

export function Readouts({ items, className, label, columns = 1 }: { items: readonly ReadoutItem[]; className?: string; label?: string; columns?: 1 | 2 }) {
  return (
    <dl aria-label={label} className={cx("grid grid-cols-1 gap-x-4 gap-y-2", columns === 2 && "@xl:grid-cols-2", className)}>
      {items.map((item, index) => (
        <div key={index} className="flex min-w-0 items-baseline justify-between gap-3 border-b border-rule pb-1">
          <dt className="text-body-sm text-ink-muted">{item.label}</dt>
          <dd
            data-testid={item.testId}
            className={cx(
              "text-right font-mono text-body-sm font-semibold whitespace-nowrap",
              item.tone === "good" && "text-success",
              item.tone === "bad" && "text-danger",
              !item.tone && "text-ink",
            )}
          >
            {item.value}
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** The key result in one sentence, visible and announced politely when it changes. */
export function KeyResult({ children, testId }: { children: ReactNode; testId?: string }) {
  return (
    <p aria-live="polite" aria-atomic="true" data-testid={testId} className="rounded-control border-l-4 border-accent-line bg-accent-soft px-3 py-2 text-body-sm text-ink">
      {children}
    </p>
  );
}
