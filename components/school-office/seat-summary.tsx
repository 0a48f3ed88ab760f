import type { SeatPoolDto } from "@/lib/dto/school-office";

/** Seats bought, taken, held by invitations and free, as a description list. */
export function SeatSummary({ seats }: { seats: SeatPoolDto }) {
  const items = [
    { term: "Bought", value: seats.purchased },
    { term: "Taken", value: seats.claimed },
    { term: "Held by invitations", value: seats.pendingInvitations },
    { term: "Free", value: seats.free },
  ];
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="seat-summary">
      {items.map((i) => (
        <div key={i.term} className="rounded-card border border-rule bg-surface-raised px-4 py-3">
          <dt className="text-body-sm text-ink-muted">{i.term}</dt>
          <dd className="font-mono text-title-2 tabular-nums">{i.value}</dd>
        </div>
      ))}
    </dl>
  );
}
