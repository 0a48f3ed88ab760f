import type { Metadata } from "next";
import { OrderSummary } from "@/components/purchase/order-summary";
import { getOrderBySession } from "@/lib/server/orders";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Purchase" };

// Checkout's success_url for an apprentice buying alone: fulfilled first (idempotent), then shown.
export default async function MyOrderPage({ params }: { params: Promise<{ session: string }> }) {
  const { session } = await params;
  const viewer = await requirePageViewer(`/learn/orders/${session}`, "apprentice");
  const { order } = pageData(await getOrderBySession(viewer, session));
  return <OrderSummary order={order} backHref="/learn/orders" backLabel="All purchases" />;
}
