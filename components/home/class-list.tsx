import Link from "next/link";
import type { ClassSummaryDto } from "@/lib/dto/classes";

/** A class card's data; with an href the class name links to the class's own page. */
export type ClassListItem = ClassSummaryDto & { href?: string };

export function ClassList({ classes, empty, showCounts = true }: { classes: ClassListItem[]; empty: string; showCounts?: boolean }) {
  if (classes.length === 0)
    return (
      <div className="rounded-xl border border-dashed border-border p-8 text-center text-ink-muted">
        <p>{empty}</p>
      </div>
    );
  return (
    <ul className="grid gap-4 md:grid-cols-2" aria-label="Classes">
      {classes.map((c) => (
        <li key={c.id} className="rounded-xl border border-rule bg-surface-raised p-5">
          <h3 className="text-lg font-semibold">
            {c.href ? (
              <Link href={c.href} className="text-ink">
                {c.name}
              </Link>
            ) : (
              c.name
            )}
          </h3>
          <p className="mt-1 text-sm text-ink-muted">
            {c.schoolName} · {c.term}
          </p>
          <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
            <dt className="text-ink-muted">Course</dt>
            <dd className="font-mono">{c.courseSlug}</dd>
            {showCounts && (
              <>
                <dt className="text-ink-muted">Apprentices</dt>
                <dd className="font-mono" data-testid="apprentice-count">{c.apprentices}</dd>
              </>
            )}
          </dl>
        </li>
      ))}
    </ul>
  );
}
