// The payment entry points' rows of the authorization matrix (tests/integration/authorization.test.ts
// spreads them into MATRIX and PUBLIC), run against a private payment stand-in. Entries run in
// order: the purchase made by startSchoolPurchase is the one the later rows read.
import Stripe from "stripe";
import { expect } from "vitest";
import { eq } from "drizzle-orm";
import { classes, type Role } from "@/db/schema";
import type { ErrorCode, Ok, Result } from "@/lib/dto/result";
import { fulfilCheckoutSession } from "@/lib/server/fulfilment";
import { getOrderBySession, getPurchaseOptions, listAllPayments, listMyOrders, listSchoolOrders } from "@/lib/server/orders";
import { receiveWebhook } from "@/lib/server/payment-webhook";
import { startSchoolPurchase, startSelfPurchase } from "@/lib/server/purchases";
import { decideRefund, requestRefund } from "@/lib/server/refunds";
import type { Viewer } from "@/lib/server/viewer";
import { testDb } from "./helpers";
import { control, formNonce, SECRET, startHarness, type Harness } from "./purchase-harness";

type Who = "anonymous" | Role;
type Entry = {
  name: string;
  run: (viewer: Viewer | null, who: Who) => Promise<Result<object>>;
  allowed: Who[];
  check: (result: Ok<object>, who: Who) => void | Promise<void>;
  denied: Partial<Record<Who, ErrorCode>>;
};
function entry<T extends object>(e: { name: string; run: (viewer: Viewer | null, who: Who) => Promise<Result<T>>; allowed: Who[]; check: (result: Ok<T>, who: Who) => void | Promise<void>; denied: Partial<Record<Who, ErrorCode>> }): Entry {
  return e as unknown as Entry;
}
const WHO: Who[] = ["anonymous", "apprentice", "instructor", "school_manager", "admin"];
function onlyFor(...allowed: Who[]): Partial<Record<Who, ErrorCode>> {
  return Object.fromEntries(WHO.filter((w) => !allowed.includes(w)).map((w) => [w, w === "anonymous" ? "not_signed_in" : "forbidden"]));
}

const SELF_COURSE = "safe-stage-practice"; // the matrix apprentice has no seat on it
let h: Harness | undefined;
const state = { classId: "", schoolName: "", paidOrderId: "", paidSessionId: "", newSessionId: "", selfOrderId: "", refundId: "" };
const harness = () => h!;

/** Called at the end of the matrix's beforeAll: a stand-in, and a paid order of 3 seats for the matrix class. */
export async function preparePayments(manager: Viewer, classId: string): Promise<void> {
  h = await startHarness();
  state.classId = classId;
  const [c] = await testDb().select({ courseSlug: classes.courseSlug }).from(classes).where(eq(classes.id, classId));
  const r = await startSchoolPurchase(manager, { courseSlug: c.courseSlug, classId, quantity: 3, nonce: formNonce() }, testDb(), h.payments);
  if (!r.ok) throw new Error(`matrix purchase: ${r.message}`);
  await control(h.fake, `checkout/${r.checkoutSessionId}/pay`);
  if ((await fulfilCheckoutSession(r.checkoutSessionId, {}, testDb(), h.payments)) === "no_order") throw new Error("matrix order not found");
  await h.fake.idle();
  Object.assign(state, { paidOrderId: r.orderId, paidSessionId: r.checkoutSessionId });
}

export async function closePayments(): Promise<void> {
  await h?.close();
}

export const PAYMENT_MATRIX: Entry[] = [
  entry({
    name: "getPurchaseOptions (school office: buy seats page)",
    run: (v) => getPurchaseOptions(v, testDb()),
    allowed: ["school_manager"],
    check: (r) => {
      expect(r.options.schools.flatMap((s) => s.classes.map((c) => c.id))).toContain(state.classId);
      expect(r.options.courses.map((c) => c.slug)).toContain(SELF_COURSE);
    },
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "startSchoolPurchase (buy seats action)",
    run: (v) => startSchoolPurchase(v, { courseSlug: "miking-the-band", classId: state.classId, quantity: 2, nonce: formNonce() }, testDb(), harness().payments),
    allowed: ["school_manager"],
    check: (r) => {
      expect(r.checkoutSessionId).toMatch(/^cs_/);
      state.newSessionId = r.checkoutSessionId;
    },
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "startSelfPurchase (course page: buy this course)",
    run: (v) => startSelfPurchase(v, { courseSlug: SELF_COURSE, nonce: formNonce() }, testDb(), harness().payments),
    allowed: ["apprentice"],
    check: (r) => {
      expect(r.checkoutUrl).toContain(r.checkoutSessionId);
      state.selfOrderId = r.orderId;
    },
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "getOrderBySession (order pages after Checkout)",
    run: (v) => getOrderBySession(v, state.paidSessionId, testDb(), harness().payments),
    allowed: ["school_manager"],
    check: (r) => expect(r.order).toMatchObject({ id: state.paidOrderId, status: "paid", quantity: 3 }),
    // The apprentice may open order pages, but not this school's order.
    denied: { anonymous: "not_signed_in", apprentice: "not_found", instructor: "forbidden", admin: "forbidden" },
  }),
  entry({
    name: "listSchoolOrders (school office: orders)",
    run: (v) => listSchoolOrders(v, testDb()),
    allowed: ["school_manager"],
    check: (r) => expect(r.orders.find((o) => o.id === state.paidOrderId)).toMatchObject({ status: "paid", refundableSeats: 3 }),
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "listMyOrders (apprentice: purchases)",
    run: (v) => listMyOrders(v, testDb()),
    allowed: ["apprentice"],
    check: (r) => expect(r.orders.map((o) => o.id)).toContain(state.selfOrderId),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "requestRefund (school office: refund request action)",
    run: (v) => requestRefund(v, { orderId: state.paidOrderId, seats: 1, reason: "One apprentice moved away" }, testDb()),
    allowed: ["school_manager"],
    check: (r) => {
      expect(r.refund).toMatchObject({ seats: 1, status: "requested" });
      state.refundId = r.refund.id;
    },
    denied: onlyFor("school_manager"),
  }),
  entry({
    name: "listAllPayments (admin: payments)",
    run: (v) => listAllPayments(v, testDb()),
    allowed: ["admin"],
    check: (r) => expect(r.orders.find((o) => o.id === state.paidOrderId)?.refunds).toEqual([expect.objectContaining({ id: state.refundId, status: "requested" })]),
    denied: onlyFor("admin"),
  }),
  entry({
    name: "decideRefund (admin: refund decision action)",
    run: (v) => decideRefund(v, { refundId: state.refundId, decision: "approve" }, testDb(), harness().payments),
    allowed: ["admin"],
    check: (r) => expect(r.refund).toMatchObject({ id: state.refundId, status: "approved" }),
    denied: onlyFor("admin"),
  }),
];

/** Another school's manager: 404 on this school's objects, and none of them in their lists. */
export async function anotherSchoolsManager(stranger: Viewer): Promise<void> {
  const p = harness().payments;
  expect(await startSchoolPurchase(stranger, { courseSlug: "miking-the-band", classId: state.classId, quantity: 2, nonce: formNonce() }, testDb(), p)).toMatchObject({ ok: false, code: "not_found" });
  expect(await getOrderBySession(stranger, state.paidSessionId, testDb(), p)).toMatchObject({ ok: false, code: "not_found" });
  expect(await requestRefund(stranger, { orderId: state.paidOrderId, seats: 1, reason: "Not mine" }, testDb())).toMatchObject({ ok: false, code: "not_found" });
  const orders = await listSchoolOrders(stranger, testDb());
  expect(orders.ok && orders.orders.some((o) => o.id === state.paidOrderId)).toBe(false);
  const options = await getPurchaseOptions(stranger, testDb());
  expect(options.ok && options.options.schools.some((s) => s.classes.some((c) => c.id === state.classId))).toBe(false);
}

/** The webhook takes no viewer: the signature is its authorization. */
export const PAYMENT_PUBLIC: { name: string; run: () => Promise<void> }[] = [
  {
    name: "receiveWebhook",
    run: async () => {
      const event = { id: `evt_matrix_${Date.now()}`, object: "event", type: "customer.created", data: { object: { id: "cus_matrix" } } };
      const body = JSON.stringify(event);
      expect(await receiveWebhook(body, null, testDb(), harness().payments, SECRET)).toMatchObject({ ok: false, code: "invalid_input" });
      const header = Stripe.webhooks.generateTestHeaderString({ payload: body, secret: SECRET });
      expect(await receiveWebhook(body, header, testDb(), harness().payments, SECRET)).toMatchObject({ ok: true, duplicate: false, outcome: "ignored: customer.created" });
    },
  },
];

export const PAYMENT_NOT_ENTRY_POINTS: Record<string, string> = {
  readRawBody: "reads a request's bytes for the webhook, no database (fulfilment.test.ts)",
};
