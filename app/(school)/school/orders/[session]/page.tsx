import type { Metadata } from "next";
import { OrderSummary } from "@/components/purchase/order-summary";
import { getOrderBySession } from "@/lib/server/orders";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Order" };

// Checkout's success_url: the order is brought up to date from the payment service (the same
// idempotent fulfilment as the webhook), then shown.
export default async function SchoolOrderPage({ params }: { params: Promise<{ session: string }> }) {
  const { session } = await params;
  const viewer = await requirePageViewer(`/school/orders/${session}`, "school_manager");
  const { order } = pageData(await getOrderBySession(viewer, session));
  return <OrderSummary order={order} backHref="/school/orders" backLabel="All orders" />;
}
