// Words for an order's state, shared by the order page, the office's list and the admin's.
import type { BadgeTone } from "@/components/ui/badge";
import type { OrderDto, OrderStatusDto, RefundStatusDto } from "@/lib/dto/orders";
import { formatMoney } from "@/lib/pricing/prices";

export const ORDER_STATUS: Record<OrderStatusDto, { label: string; tone: BadgeTone }> = {
  created: { label: "Waiting for payment", tone: "neutral" },
  awaiting_payment: { label: "Payment on its way", tone: "note" },
  paid: { label: "Paid", tone: "success" },
  failed: { label: "Payment failed", tone: "danger" },
  expired: { label: "Not paid (expired)", tone: "caution" },
  refunded_partly: { label: "Paid, partly refunded", tone: "success" },
  refunded: { label: "Refunded", tone: "secondary" },
};

export const REFUND_STATUS: Record<RefundStatusDto, string> = {
  requested: "Waiting for a decision",
  approved: "Approved, money on its way back",
  rejected: "Not approved",
  completed: "Refunded",
};

/** One sentence on where the order stands, for its buyer. */
export function orderSentence(o: OrderDto): string {
  const seats = `${o.quantity} ${o.quantity === 1 ? "seat" : "seats"}`;
  const where = o.kind === "school" ? `${seats} for the class ${o.className ?? ""}` : "your own seat";
  switch (o.status) {
    case "created":
      return `Nothing has been paid yet for ${where}.`;
    case "awaiting_payment":
      return `The payment is being confirmed by your bank. ${o.kind === "school" ? "The seats reach the class" : "Your seat opens"} as soon as it is, and we e-mail a receipt.`;
    case "paid":
      return o.kind === "school" ? `Paid: ${seats} added to the class ${o.className ?? ""}. A receipt was e-mailed.` : "Paid: your seat is ready. A receipt was e-mailed.";
    case "failed":
      return "The payment did not go through. Nothing was charged and no seat was added.";
    case "expired":
      return "The payment page closed before anything was paid. Nothing was charged and no seat was added.";
    case "refunded_partly":
      return `Paid; ${o.seatsRefunded} of ${o.quantity} seats refunded (${formatMoney(o.amountRefunded, o.currency)}).`;
    case "refunded":
      return `Every seat of this order was refunded (${formatMoney(o.amountRefunded, o.currency)}).`;
  }
}

/** "4 Dec 2026" in UTC, the same on the server and in every browser. */
export function dateOf(iso: string): string {
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }).format(new Date(iso));
}
