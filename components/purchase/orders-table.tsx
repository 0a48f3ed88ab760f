// A list of orders (school office, apprentice, admin): one row each, with status and refunds.
// `extra` renders a last cell per row (a refund form, a decision form).
import Link from "next/link";
import type { ReactNode } from "react";
import { Badge } from "@/components/ui/badge";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import type { OrderDto } from "@/lib/dto/orders";
import { formatMoney } from "@/lib/pricing/prices";
import { dateOf, ORDER_STATUS, REFUND_STATUS } from "./order-words";

/** `linkOrders`: link each order to its buyer's page (off for the admin, who reads them here). */
export function OrdersTable({ caption, orders, showBuyer = false, linkOrders = true, extraHeader, extra }: { caption: string; orders: OrderDto[]; showBuyer?: boolean; linkOrders?: boolean; extraHeader?: string; extra?: (o: OrderDto) => ReactNode }) {
  return (
    <Table caption={caption}>
      <TableHead>
        <TableRow>
          <TableHeaderCell>Order</TableHeaderCell>
          <TableHeaderCell>Date</TableHeaderCell>
          {showBuyer ? <TableHeaderCell>Buyer</TableHeaderCell> : null}
          <TableHeaderCell>Course and class</TableHeaderCell>
          <TableHeaderCell numeric>Seats</TableHeaderCell>
          <TableHeaderCell numeric>Total</TableHeaderCell>
          <TableHeaderCell>Status</TableHeaderCell>
          <TableHeaderCell>Refunds</TableHeaderCell>
          {extra ? <TableHeaderCell>{extraHeader}</TableHeaderCell> : null}
        </TableRow>
      </TableHead>
      <TableBody>
        {orders.map((o) => (
          <TableRow key={o.id} data-testid={`order-${o.ref}`}>
            <TableHeaderCell scope="row" className="font-mono">
              {o.href && linkOrders ? <Link href={o.href}>{o.ref}</Link> : o.ref}
            </TableHeaderCell>
            <TableCell className="whitespace-nowrap">{dateOf(o.createdAtUtc)}</TableCell>
            {showBuyer ? <TableCell>{o.buyerName}</TableCell> : null}
            <TableCell>
              {o.courseTitle}
              {o.className ? (
                <span className="block text-ink-muted">
                  {o.className}
                  {o.schoolName ? `, ${o.schoolName}` : ""}
                </span>
              ) : null}
            </TableCell>
            <TableCell numeric>{o.quantity}</TableCell>
            <TableCell numeric>{formatMoney(o.amountTotal, o.currency)}</TableCell>
            <TableCell>
              <Badge tone={ORDER_STATUS[o.status].tone}>{ORDER_STATUS[o.status].label}</Badge>
            </TableCell>
            <TableCell>
              {o.refunds.length === 0 ? (
                <span className="text-ink-muted">None</span>
              ) : (
                <ul>
                  {o.refunds.map((r) => (
                    <li key={r.id}>
                      {r.seats} × seat, {formatMoney(r.amount, r.currency)}: {REFUND_STATUS[r.status]}
                    </li>
                  ))}
                </ul>
              )}
            </TableCell>
            {extra ? <TableCell>{extra(o)}</TableCell> : null}
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
