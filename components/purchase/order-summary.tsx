// An order as its buyer sees it after Checkout or from a receipt: where it stands, what it bought,
// what it cost, and its refunds. Shows state only; the page fulfilled the order before rendering.
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { LinkButton } from "@/components/ui/link-button";
import type { OrderDto } from "@/lib/dto/orders";
import { formatMoney } from "@/lib/pricing/prices";
import { dateOf, ORDER_STATUS, orderSentence, REFUND_STATUS } from "./order-words";

export function OrderSummary({ order: o, backHref, backLabel }: { order: OrderDto; backHref: string; backLabel: string }) {
  const status = ORDER_STATUS[o.status];
  return (
    <article className="max-w-reading space-y-6" data-testid="order-summary" data-status={o.status}>
      <header className="space-y-2">
        <h1 className="text-3xl font-bold">Order {o.ref}</h1>
        <Badge tone={status.tone} withIcon>
          {status.label}
        </Badge>
        <p className="text-lead" role="status">
          {orderSentence(o)}
        </p>
      </header>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-2">
        <dt className="font-semibold">Course</dt>
        <dd>
          <Link href={`/courses/${o.courseSlug}`}>{o.courseTitle}</Link>
        </dd>
        {o.kind === "school" ? (
          <>
            <dt className="font-semibold">Class</dt>
            <dd>
              {o.className}, {o.schoolName}
            </dd>
          </>
        ) : null}
        <dt className="font-semibold">Seats</dt>
        <dd className="font-mono tabular-nums">
          {o.quantity} × {formatMoney(o.unitAmount, o.currency)}
        </dd>
        <dt className="font-semibold">Total</dt>
        <dd className="font-mono tabular-nums">{formatMoney(o.amountTotal, o.currency)}</dd>
        <dt className="font-semibold">Ordered</dt>
        <dd>{dateOf(o.createdAtUtc)}</dd>
        {o.paidAtUtc ? (
          <>
            <dt className="font-semibold">Paid</dt>
            <dd>{dateOf(o.paidAtUtc)}</dd>
          </>
        ) : null}
      </dl>
      {o.refunds.length > 0 ? (
        <section aria-labelledby="refunds" className="space-y-2">
          <h2 id="refunds" className="text-title-3">
            Refunds
          </h2>
          <ul className="space-y-1">
            {o.refunds.map((r) => (
              <li key={r.id}>
                {r.seats} {r.seats === 1 ? "seat" : "seats"}, {formatMoney(r.amount, r.currency)}: {REFUND_STATUS[r.status]}
                {r.decisionNote ? ` (${r.decisionNote})` : ""}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <div className="flex flex-wrap gap-3">
        {o.checkoutUrl ? (
          <a href={o.checkoutUrl} className="font-semibold">
            Return to the payment page
          </a>
        ) : null}
        {o.kind === "self" && (o.status === "paid" || o.status === "refunded_partly") ? (
          <LinkButton href={`/courses/${o.courseSlug}`} variant="primary">
            Open the course
          </LinkButton>
        ) : null}
        <LinkButton href={backHref}>{backLabel}</LinkButton>
      </div>
    </article>
  );
}
