// Axisline's prices, in one place. Pure and client-safe: the course page, the school office and
// the purchase functions (lib/server/purchases.ts) all quote from here, and the Checkout Session's
// line items are built from these numbers on the server, never from what a browser sends.
//
// Money is integer minor units (euro cents) in one currency, EUR, as the payment service expects
// `unit_amount` (the smallest currency unit; EUR has 2 decimals, ISO 4217).

export const CURRENCY = "eur" as const;

/** List price of one seat on each course, in euro cents. Also what an apprentice pays alone. */
export const SEAT_PRICE_CENTS: Readonly<Record<string, number>> = {
  "how-microphones-hear": 4900,
  "direct-boxes-and-levels": 4900,
  "miking-the-band": 6900,
  "safe-stage-practice": 3900,
  "stage-box-to-mix": 6900,
};

/**
 * School volume tiers: the whole order is priced at the tier its quantity falls in (not
 * marginally). `percentOff` of the list price, rounded half up to the cent.
 */
export const SCHOOL_TIERS = [
  { minSeats: 1, maxSeats: 9, percentOff: 0, label: "1–9 seats" },
  { minSeats: 10, maxSeats: 24, percentOff: 15, label: "10–24 seats" },
  { minSeats: 25, maxSeats: 500, percentOff: 25, label: "25–500 seats" },
] as const;

/** The most seats one school order may buy; larger orders are arranged with us directly. */
export const MAX_SEATS_PER_ORDER = 500;

export type SchoolTier = (typeof SCHOOL_TIERS)[number];

export type Quote = {
  courseSlug: string;
  quantity: number;
  currency: typeof CURRENCY;
  /** Per seat, after the tier's reduction, in cents. */
  unitAmount: number;
  /** unitAmount × quantity, in cents. */
  amountTotal: number;
  /** The list price of one seat, in cents. */
  listUnitAmount: number;
  percentOff: number;
  tierLabel: string;
};

export type QuoteError = { ok: false; reason: "unknown_course" | "bad_quantity"; message: string };

export function hasPrice(courseSlug: string): boolean {
  return Object.hasOwn(SEAT_PRICE_CENTS, courseSlug);
}

export function tierFor(quantity: number): SchoolTier | null {
  return SCHOOL_TIERS.find((t) => quantity >= t.minSeats && quantity <= t.maxSeats) ?? null;
}

/** list × (100 − percent) / 100 in integers, rounded half up (all values are positive). */
function reduce(listCents: number, percentOff: number): number {
  return Math.floor((listCents * (100 - percentOff) + 50) / 100);
}

/** A school's order of `quantity` seats on one course, priced by its tier. */
export function quoteSchoolOrder(input: { courseSlug: string; quantity: number }): ({ ok: true } & Quote) | QuoteError {
  const { courseSlug, quantity } = input;
  if (!hasPrice(courseSlug)) return { ok: false, reason: "unknown_course", message: "There is no course with that name to buy." };
  const tier = Number.isSafeInteger(quantity) ? tierFor(quantity) : null;
  if (!tier) return { ok: false, reason: "bad_quantity", message: `Choose a whole number of seats from 1 to ${MAX_SEATS_PER_ORDER}.` };
  const listUnitAmount = SEAT_PRICE_CENTS[courseSlug];
  const unitAmount = reduce(listUnitAmount, tier.percentOff);
  return { ok: true, courseSlug, quantity, currency: CURRENCY, unitAmount, amountTotal: unitAmount * quantity, listUnitAmount, percentOff: tier.percentOff, tierLabel: tier.label };
}

/** One seat for an apprentice buying alone: the list price. */
export function quoteSelfPurchase(courseSlug: string): ({ ok: true } & Quote) | QuoteError {
  if (!hasPrice(courseSlug)) return { ok: false, reason: "unknown_course", message: "There is no course with that name to buy." };
  const listUnitAmount = SEAT_PRICE_CENTS[courseSlug];
  return { ok: true, courseSlug, quantity: 1, currency: CURRENCY, unitAmount: listUnitAmount, amountTotal: listUnitAmount, listUnitAmount, percentOff: 0, tierLabel: "One seat" };
}

/** "€49.00": cents in euros, for display (en-IE puts the sign first and uses a decimal point). */
export function formatMoney(cents: number, currency: string = CURRENCY): string {
  return new Intl.NumberFormat("en-IE", { style: "currency", currency: currency.toUpperCase() }).format(cents / 100);
}
