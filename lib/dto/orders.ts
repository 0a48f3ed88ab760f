// Client-safe DTOs of buying (lib/server/purchases.ts, orders.ts, refunds.ts return them).
// Money is integer cents with its currency; format with lib/pricing/prices.ts formatMoney.

export type OrderStatusDto = "created" | "awaiting_payment" | "paid" | "failed" | "expired" | "refunded_partly" | "refunded";
export type RefundStatusDto = "requested" | "approved" | "rejected" | "completed";

export type RefundDto = {
  id: string;
  seats: number;
  amount: number;
  currency: string;
  status: RefundStatusDto;
  reason: string;
  decisionNote: string | null;
  requestedAtUtc: string;
  decidedAtUtc: string | null;
};

export type OrderDto = {
  id: string;
  /** The first 8 characters of the id, upper case: what a receipt and the office call the order. */
  ref: string;
  kind: "school" | "self";
  courseSlug: string;
  courseTitle: string;
  schoolName: string | null;
  className: string | null;
  classId: string | null;
  buyerName: string;
  quantity: number;
  unitAmount: number;
  amountTotal: number;
  currency: string;
  status: OrderStatusDto;
  /** The order's page: /school/orders/<session> or /learn/orders/<session>; null if no session was made. */
  href: string | null;
  /** The payment page, while the order waits for payment (created); null otherwise. */
  checkoutUrl: string | null;
  createdAtUtc: string;
  paidAtUtc: string | null;
  seatsRefunded: number;
  amountRefunded: number;
  /** Seats of a paid school order that could be refunded now (free in the class, not yet asked for); 0 otherwise. */
  refundableSeats: number;
  refunds: RefundDto[];
};

/** What the school's purchase form offers: the manager's schools and their classes. */
export type PurchaseOptionsDto = {
  schools: { schoolId: string; schoolName: string; classes: { id: string; name: string; term: string; courseSlug: string; seatsPurchased: number; seatsClaimed: number }[] }[];
  courses: { slug: string; title: string }[];
};
