// Starting a purchase against a private payment stand-in (real SDK, real PostgreSQL): input
// validation before anything is created, one Checkout Session per form (the idempotency key),
// line items from our price list, the order row written before the redirect, and who may buy.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { classes, enrollments, orders } from "@/db/schema";
import { statusOf } from "@/lib/server/errors";
import { startSchoolPurchase, startSelfPurchase } from "@/lib/server/purchases";
import { testDb } from "./helpers";
import { formNonce, orderRow, sessionCount, startHarness, type Harness } from "./purchase-harness";
import { COURSE, makeClass, makeSchool, OTHER_COURSE, signedIn } from "./seats-fixtures";

let h: Harness;
let manager: Awaited<ReturnType<typeof signedIn>>;
let schoolId: string;
let classId: string;

beforeAll(async () => {
  h = await startHarness();
  manager = await signedIn("school_manager");
  schoolId = await makeSchool(manager.id, "Purchase Test School");
  classId = await makeClass(schoolId, 0, COURSE, "Buying class");
});

afterAll(async () => {
  await h?.close();
  await closeDb();
});

const buy = (input: Record<string, unknown>, viewer = manager.viewer) => startSchoolPurchase(viewer, { courseSlug: COURSE, classId, nonce: formNonce(), ...input }, testDb(), h.payments);

describe("a bad purchase form is refused with a sentence and creates nothing", () => {
  it.each([
    ["0", { quantity: 0 }],
    ["−5", { quantity: -5 }],
    ["1e9", { quantity: 1e9 }],
    ['"5" (a string)', { quantity: "5" }],
    ["5.5", { quantity: 5.5 }],
    ["no quantity", { quantity: undefined }],
    ["a course that does not exist", { quantity: 5, courseSlug: "no-such-course" }],
    ["a course name with odd characters", { quantity: 5, courseSlug: "../etc" }],
    ["no form nonce", { quantity: 5, nonce: undefined }],
  ])("%s → 400", async (_label, input) => {
    const sessionsBefore = await sessionCount(h.payments);
    const ordersBefore = (await testDb().select({ id: orders.id }).from(orders)).length;
    const r = await buy(input);
    expect(r).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/^[A-Z].+\.$/) });
    if (!r.ok) expect(statusOf(r.code)).toBe(400);
    // Nothing at the service (its list endpoint) and nothing here.
    expect(await sessionCount(h.payments)).toBe(sessionsBefore);
    expect((await testDb().select({ id: orders.id }).from(orders)).length).toBe(ordersBefore);
  });

  it("names the quantity problem in words", async () => {
    expect(await buy({ quantity: 0 })).toMatchObject({ message: "Choose a whole number of seats from 1 to 500.", fieldErrors: { quantity: "Choose a whole number of seats from 1 to 500." } });
    expect(await buy({ quantity: 5, courseSlug: "no-such-course" })).toMatchObject({ message: "Choose one of the courses on sale." });
  });

  it("refuses a class that follows another course", async () => {
    const other = await makeClass(schoolId, 0, OTHER_COURSE, "Other course class");
    expect(await buy({ quantity: 3, classId: other })).toMatchObject({ ok: false, code: "invalid_input", fieldErrors: { classId: expect.any(String) } });
  });
});

describe("a valid order", () => {
  it("records the order, then one Checkout Session with our prices, metadata and return addresses", async () => {
    const r = await buy({ quantity: 6 });
    if (!r.ok) throw new Error(r.message);
    const order = await orderRow(r.orderId);
    expect(order).toMatchObject({ kind: "school", classId, schoolId, userId: manager.id, quantity: 6, unitAmount: 6900, amountTotal: 41400, currency: "eur", status: "created", checkoutSessionId: r.checkoutSessionId });
    const session = await h.payments.checkout.sessions.retrieve(r.checkoutSessionId, { expand: ["line_items"] });
    expect(session).toMatchObject({ mode: "payment", amount_total: 41400, currency: "eur", client_reference_id: r.orderId, metadata: { orderId: r.orderId, kind: "school" }, customer_email: manager.email });
    expect(session.line_items!.data).toEqual([expect.objectContaining({ quantity: 6, amount_total: 41400 })]);
    expect(session.success_url).toMatch(/\/school\/orders\/\{CHECKOUT_SESSION_ID\}$/);
    expect(session.cancel_url).toMatch(/\/school\/buy\?cancelled=1$/);
    expect(r.checkoutUrl).toBe(`${h.fake.url}/checkout/${r.checkoutSessionId}`);
  });

  it("prices 12 seats at the 10–24 tier (15 % off 69.00 = 58.65)", async () => {
    const r = await buy({ quantity: 12 });
    if (!r.ok) throw new Error(r.message);
    expect(await orderRow(r.orderId)).toMatchObject({ unitAmount: 5865, amountTotal: 70380 });
  });

  it("a double-submitted form (same nonce, 5 times at once) makes one order and one Checkout Session", async () => {
    const nonce = formNonce();
    const before = await sessionCount(h.payments);
    const results = await Promise.all(Array.from({ length: 5 }, () => startSchoolPurchase(manager.viewer, { courseSlug: COURSE, classId, quantity: 4, nonce }, testDb(), h.payments)));
    const ids = new Set(results.map((r) => (r.ok ? r.checkoutSessionId : r.message)));
    expect(ids.size).toBe(1);
    expect([...ids][0]).toMatch(/^cs_/);
    expect(await sessionCount(h.payments)).toBe(before + 1);
    expect(await testDb().select().from(orders).where(eq(orders.checkoutSessionId, [...ids][0]))).toHaveLength(1);
    // Submitted again later, the same form still answers with the same session.
    const again = await startSchoolPurchase(manager.viewer, { courseSlug: COURSE, classId, quantity: 4, nonce }, testDb(), h.payments);
    expect(again).toMatchObject({ ok: true, checkoutSessionId: [...ids][0] });
    expect(await sessionCount(h.payments)).toBe(before + 1);
  });

  it("can create the class it buys for, once per form", async () => {
    const nonce = formNonce();
    const input = { courseSlug: COURSE, quantity: 2, nonce, newClass: { schoolId, name: "Spring newcomers", term: "Spring 2027" } };
    const [a, b] = await Promise.all([startSchoolPurchase(manager.viewer, input, testDb(), h.payments), startSchoolPurchase(manager.viewer, input, testDb(), h.payments)]);
    if (!a.ok || !b.ok) throw new Error("expected success");
    expect(a.orderId).toBe(b.orderId);
    const created = await testDb().select().from(classes).where(and(eq(classes.schoolId, schoolId), eq(classes.name, "Spring newcomers")));
    expect(created).toHaveLength(1);
    expect(created[0]).toMatchObject({ schoolId, courseSlug: COURSE, seatsPurchased: 0 });
  });
});

describe("who may buy", () => {
  it("another school's manager gets 404 for this school's class and its school", async () => {
    const other = await signedIn("school_manager");
    await makeSchool(other.id, "Another school");
    expect(await buy({ quantity: 2 }, other.viewer)).toMatchObject({ ok: false, code: "not_found" });
    expect(await startSchoolPurchase(other.viewer, { courseSlug: COURSE, quantity: 2, nonce: formNonce(), newClass: { schoolId, name: "Sneaky", term: "Now" } }, testDb(), h.payments)).toMatchObject({ ok: false, code: "not_found" });
  });

  it.each(["apprentice", "instructor", "admin"] as const)("a(n) %s may not buy school seats (403)", async (role) => {
    const u = await signedIn(role);
    expect(await buy({ quantity: 2 }, u.viewer)).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("a visitor is asked to sign in (401)", async () => {
    expect(await startSchoolPurchase(null, { courseSlug: COURSE, classId, quantity: 2, nonce: formNonce() }, testDb(), h.payments)).toMatchObject({ ok: false, code: "not_signed_in" });
    expect(await startSelfPurchase(null, { courseSlug: COURSE, nonce: formNonce() }, testDb(), h.payments)).toMatchObject({ ok: false, code: "not_signed_in" });
  });
});

describe("an apprentice buying alone", () => {
  it("gets one seat at the list price, success back to /learn/orders", async () => {
    const a = await signedIn("apprentice");
    const r = await startSelfPurchase(a.viewer, { courseSlug: "safe-stage-practice", nonce: formNonce() }, testDb(), h.payments);
    if (!r.ok) throw new Error(r.message);
    expect(await orderRow(r.orderId)).toMatchObject({ kind: "self", userId: a.id, schoolId: null, classId: null, quantity: 1, unitAmount: 3900, amountTotal: 3900 });
    const session = await h.payments.checkout.sessions.retrieve(r.checkoutSessionId);
    expect(session.success_url).toMatch(/\/learn\/orders\/\{CHECKOUT_SESSION_ID\}$/);
    expect(session.cancel_url).toMatch(/\/courses\/safe-stage-practice\?purchase=cancelled$/);
  });

  it("is refused (409) when they already have a seat on the course", async () => {
    const a = await signedIn("apprentice");
    await testDb().insert(enrollments).values({ userId: a.id, courseSlug: COURSE, source: "class", classId });
    const before = await sessionCount(h.payments);
    expect(await startSelfPurchase(a.viewer, { courseSlug: COURSE, nonce: formNonce() }, testDb(), h.payments)).toMatchObject({ ok: false, code: "conflict", message: expect.stringContaining("through your class") });
    expect(await sessionCount(h.payments)).toBe(before);
  });

  it.each(["instructor", "school_manager", "admin"] as const)("a(n) %s may not buy a seat for themselves (403)", async (role) => {
    const u = await signedIn(role);
    expect(await startSelfPurchase(u.viewer, { courseSlug: COURSE, nonce: formNonce() }, testDb(), h.payments)).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("refuses bad input with a sentence and no session", async () => {
    const a = await signedIn("apprentice");
    const before = await sessionCount(h.payments);
    for (const input of [{ courseSlug: "nope", nonce: formNonce() }, { courseSlug: COURSE }, { courseSlug: 5, nonce: formNonce() }]) {
      expect(await startSelfPurchase(a.viewer, input, testDb(), h.payments)).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/^[A-Z].+\.$/) });
    }
    expect(await sessionCount(h.payments)).toBe(before);
  });
});
