import type { Metadata } from "next";
import Link from "next/link";
import { OrdersTable } from "@/components/purchase/orders-table";
import { RefundRequestForm } from "@/components/purchase/refund-forms";
import { LinkButton } from "@/components/ui/link-button";
import { listSchoolOrders } from "@/lib/server/orders";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { requestRefundAction } from "./actions";

export const metadata: Metadata = { title: "Orders" };

export default async function SchoolOrdersPage() {
  const viewer = await requirePageViewer("/school/orders", "school_manager");
  const { orders } = pageData(await listSchoolOrders(viewer));
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/school">School office</Link> <span aria-hidden="true">›</span> <span aria-current="page">Orders</span>
      </nav>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl font-bold">Orders and refunds</h1>
        <LinkButton href="/school/buy" variant="primary">
          Buy seats
        </LinkButton>
      </div>
      <p className="max-w-reading text-ink-muted">
        Every order of your school, with its receipt (open an order) and refunds. Seats that nobody has taken and no pending invitation holds can be refunded; an Axisline
        admin approves each request.
      </p>
      {orders.length === 0 ? (
        <p>Your school has no orders yet.</p>
      ) : (
        <OrdersTable
          caption="Your school's orders, newest first"
          orders={orders}
          showBuyer
          extraHeader="Refund"
          extra={(o) =>
            o.refundableSeats > 0 ? (
              <RefundRequestForm orderId={o.id} orderRef={o.ref} maxSeats={o.refundableSeats} action={requestRefundAction} />
            ) : (
              <span className="text-ink-muted">{o.refunds.some((r) => r.status === "requested") ? "Request waiting" : "No free seat"}</span>
            )
          }
        />
      )}
    </div>
  );
}
