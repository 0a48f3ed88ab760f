import type { Metadata } from "next";
import { OrdersTable } from "@/components/purchase/orders-table";
import { RefundDecisionForm } from "@/components/purchase/refund-forms";
import { formatMoney } from "@/lib/pricing/prices";
import { listAllPayments } from "@/lib/server/orders";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { decideRefundAction } from "./actions";

export const metadata: Metadata = { title: "Payments" };

export default async function AdminPaymentsPage() {
  const viewer = await requirePageViewer("/admin/payments", "admin");
  const { orders } = pageData(await listAllPayments(viewer));
  const waiting = orders.flatMap((o) => o.refunds.filter((r) => r.status === "requested").map((r) => ({ order: o, refund: r })));
  return (
    <div className="space-y-8">
      <h1 className="text-3xl font-bold">Payments</h1>
      <section aria-labelledby="refund-requests" className="space-y-3">
        <h2 id="refund-requests" className="text-title-2">
          Refund requests
        </h2>
        {waiting.length === 0 ? (
          <p className="text-ink-muted">No refund request is waiting.</p>
        ) : (
          <ul className="space-y-4">
            {waiting.map(({ order, refund }) => {
              const label = `${refund.seats} ${refund.seats === 1 ? "seat" : "seats"} of order ${order.ref}`;
              return (
                <li key={refund.id} className="space-y-2 rounded-card border border-rule bg-surface-raised p-4">
                  <p>
                    <span className="font-semibold">{order.schoolName}</span> asks for {label} back ({formatMoney(refund.amount, refund.currency)}), {order.courseTitle},
                    class {order.className}. Reason: “{refund.reason}”
                  </p>
                  <RefundDecisionForm refundId={refund.id} label={label} action={decideRefundAction} />
                </li>
              );
            })}
          </ul>
        )}
      </section>
      <section aria-labelledby="all-orders" className="space-y-3">
        <h2 id="all-orders" className="text-title-2">
          Orders
        </h2>
        {orders.length === 0 ? <p className="text-ink-muted">No orders yet.</p> : <OrdersTable caption="The latest 200 orders, newest first" orders={orders} showBuyer linkOrders={false} />}
      </section>
    </div>
  );
}
