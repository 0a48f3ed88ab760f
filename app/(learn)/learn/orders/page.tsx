import type { Metadata } from "next";
import Link from "next/link";
import { OrdersTable } from "@/components/purchase/orders-table";
import { listMyOrders } from "@/lib/server/orders";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Purchases" };

export default async function MyOrdersPage() {
  const viewer = await requirePageViewer("/learn/orders", "apprentice");
  const { orders } = pageData(await listMyOrders(viewer));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Your purchases</h1>
      {orders.length === 0 ? (
        <p>
          You haven&apos;t bought a course yet. Each <Link href="/courses">course page</Link> shows its price.
        </p>
      ) : (
        <OrdersTable caption="Courses you bought, newest first" orders={orders} />
      )}
    </div>
  );
}
