// The price list and its quotes. The prices and tiers are our own business rules (stated in
// DEVELOPERS.md, "Buying and fulfilment"); what is checked against outside sources is that every
// amount is one the payment service accepts (Stripe API reference, "amount": a positive integer in
// the smallest currency unit, at least 0.50 of the currency, at most eight digits) and that euro
// amounts have two decimals (ISO 4217: EUR, minor unit 2).
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { CURRENCY, formatMoney, MAX_SEATS_PER_ORDER, quoteSchoolOrder, quoteSelfPurchase, SCHOOL_TIERS, SEAT_PRICE_CENTS, tierFor } from "@/lib/pricing/prices";

// Stripe API reference, PaymentIntent / Price `unit_amount`: minimum $0.50 or the equivalent (EUR 0.50, Stripe
// "Supported currencies", minimum charge amounts), "supports up to eight digits (e.g. 99999999)".
const STRIPE_MIN_EUR_CENTS = 50;
const STRIPE_MAX_AMOUNT = 99_999_999;

describe("the price list", () => {
  it("prices every course in content/ (a course without a price could not be bought)", async () => {
    // Each course's course.json names its slug (read directly: loading every lesson is slow).
    const root = path.resolve(import.meta.dirname, "../../../content/courses");
    const folders = await readdir(root);
    expect(folders.length).toBeGreaterThan(3);
    for (const folder of folders) {
      const { slug } = JSON.parse(await readFile(path.join(root, folder, "course.json"), "utf8")) as { slug: string };
      expect(SEAT_PRICE_CENTS[slug], slug).toBeGreaterThan(0);
    }
  });

  it("is in one currency, lower-case ISO 4217 as the payment service wants it", () => {
    expect(CURRENCY).toBe("eur");
  });

  it("tiers cover 1 to the order limit without gaps or overlaps", () => {
    let next = 1;
    for (const t of SCHOOL_TIERS) {
      expect(t.minSeats).toBe(next);
      next = t.maxSeats + 1;
    }
    expect(next - 1).toBe(MAX_SEATS_PER_ORDER);
  });

  it("every unit price and the largest order total are amounts the service accepts", () => {
    for (const slug of Object.keys(SEAT_PRICE_CENTS)) {
      for (const t of SCHOOL_TIERS) {
        const q = quoteSchoolOrder({ courseSlug: slug, quantity: t.maxSeats });
        if (!q.ok) throw new Error(q.message);
        expect(Number.isInteger(q.unitAmount)).toBe(true);
        expect(q.unitAmount).toBeGreaterThanOrEqual(STRIPE_MIN_EUR_CENTS);
        expect(q.amountTotal).toBeLessThanOrEqual(STRIPE_MAX_AMOUNT);
      }
    }
  });
});

describe("quoteSchoolOrder", () => {
  it("prices the whole order at its tier: boundaries 9/10 and 24/25", () => {
    expect(tierFor(9)?.percentOff).toBe(0);
    expect(tierFor(10)?.percentOff).toBe(15);
    expect(tierFor(24)?.percentOff).toBe(15);
    expect(tierFor(25)?.percentOff).toBe(25);
    // 6 seats at the list price of 49.00: 294.00.
    expect(quoteSchoolOrder({ courseSlug: "how-microphones-hear", quantity: 6 })).toMatchObject({ ok: true, unitAmount: 4900, amountTotal: 29400, percentOff: 0 });
    // 10 seats: 15 % off 49.00 = 41.65 each, 416.50.
    expect(quoteSchoolOrder({ courseSlug: "how-microphones-hear", quantity: 10 })).toMatchObject({ ok: true, unitAmount: 4165, amountTotal: 41650, percentOff: 15 });
    // 25 seats: 25 % off 69.00 = 51.75 each, 1,293.75.
    expect(quoteSchoolOrder({ courseSlug: "miking-the-band", quantity: 25 })).toMatchObject({ ok: true, unitAmount: 5175, amountTotal: 129375, percentOff: 25 });
  });

  it("refuses quantities that are not a whole number from 1 to the limit, and unknown courses", () => {
    for (const quantity of [0, -5, 1e9, 5.5, MAX_SEATS_PER_ORDER + 1, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(quoteSchoolOrder({ courseSlug: "miking-the-band", quantity }), String(quantity)).toMatchObject({ ok: false, reason: "bad_quantity" });
    }
    expect(quoteSchoolOrder({ courseSlug: "no-such-course", quantity: 5 })).toMatchObject({ ok: false, reason: "unknown_course" });
    // A name on Object.prototype is not a course.
    expect(quoteSchoolOrder({ courseSlug: "constructor", quantity: 5 })).toMatchObject({ ok: false, reason: "unknown_course" });
  });
});

describe("quoteSelfPurchase", () => {
  it("is one seat at the list price", () => {
    expect(quoteSelfPurchase("safe-stage-practice")).toMatchObject({ ok: true, quantity: 1, unitAmount: 3900, amountTotal: 3900 });
    expect(quoteSelfPurchase("toString")).toMatchObject({ ok: false, reason: "unknown_course" });
  });
});

describe("formatMoney", () => {
  it("shows cents as euros with two decimals (ISO 4217: EUR minor unit 2)", () => {
    expect(formatMoney(4900)).toBe("€49.00");
    expect(formatMoney(129375)).toBe("€1,293.75");
  });
});
