import Link from "next/link";
import type { OfficeClassSummaryDto } from "@/lib/dto/school-office";

/** The school's classes, each with its seat pool and a link to its office page. */
export function OfficeClassList({ classes }: { classes: OfficeClassSummaryDto[] }) {
  if (classes.length === 0)
    return (
      <div className="rounded-xl border border-dashed border-border p-8 text-center text-ink-muted">
        <p>
          This school has no classes yet. <Link href="/school/buy">Buy seats</Link> to start one.
        </p>
      </div>
    );
  return (
    <ul className="grid gap-4 md:grid-cols-2" aria-label="Classes">
      {classes.map((c) => (
        <li key={c.id} className="rounded-xl border border-rule bg-surface-raised p-5" data-testid="office-class">
          <h3 className="text-lg font-semibold">
            <Link href={`/school/classes/${c.id}`} className="text-ink">
              {c.name}
            </Link>
          </h3>
          <p className="mt-1 text-sm text-ink-muted">
            {c.term} · {c.courseTitle}
          </p>
          <dl className="mt-3 grid grid-cols-2 gap-x-3 gap-y-1 text-sm sm:grid-cols-4">
            {[
              ["Bought", c.seats.purchased],
              ["Taken", c.seats.claimed],
              ["Invited", c.seats.pendingInvitations],
              ["Free", c.seats.free],
            ].map(([term, value]) => (
              <div key={term}>
                <dt className="text-ink-muted">{term}</dt>
                <dd className="font-mono tabular-nums">{value}</dd>
              </div>
            ))}
          </dl>
        </li>
      ))}
    </ul>
  );
}
