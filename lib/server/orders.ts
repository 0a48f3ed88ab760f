import "server-only";
// Reading orders: the order page a buyer returns to from Checkout (it fulfils first, then only
// shows state), the school office's receipts and refunds, an apprentice's own orders, the admin's
// payments list, and what the school's purchase form offers. Each read checks the object in its
// query: a school order is the managers' of its school, a self purchase its buyer's.
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type Stripe from "stripe";
import { db, type Queryable } from "@/db/client";
import { classes, orders, refunds, schoolMembers, schools, users } from "@/db/schema";
import type { OrderDto, PurchaseOptionsDto } from "@/lib/dto/orders";
import { listCourses } from "@/lib/content";
import { paymentsClient } from "@/lib/payments/stripe-client";
import { hasPrice } from "@/lib/pricing/prices";
import { fail, type Result } from "./errors";
import { fulfilCheckoutSession, orderRef } from "./fulfilment";
import { guard } from "./guard";
import { refundableSeatsOf, refundDto } from "./refunds";
import type { Viewer } from "./viewer";

export type { OrderDto, PurchaseOptionsDto } from "@/lib/dto/orders";

type Row = { order: typeof orders.$inferSelect; schoolName: string | null; className: string | null; buyerName: string };

function baseQuery(database: Queryable) {
  return database
    .select({ order: orders, schoolName: schools.name, className: classes.name, buyerName: users.name })
    .from(orders)
    .innerJoin(users, eq(users.id, orders.userId))
    .leftJoin(schools, eq(schools.id, orders.schoolId))
    .leftJoin(classes, eq(classes.id, orders.classId));
}

async function toDtos(database: Queryable, rows: Row[], withRefundable = false): Promise<OrderDto[]> {
  if (rows.length === 0) return [];
  const titles = new Map((await listCourses()).map((c) => [c.slug, c.title]));
  const all = await database.select().from(refunds).where(inArray(refunds.orderId, rows.map((r) => r.order.id))).orderBy(asc(refunds.createdAt));
  const out: OrderDto[] = [];
  for (const { order: o, schoolName, className, buyerName } of rows) {
    const refundable = withRefundable && o.kind === "school" && (o.status === "paid" || o.status === "refunded_partly") ? await refundableSeatsOf(database, o) : 0;
    out.push({
      id: o.id,
      ref: orderRef(o.id),
      kind: o.kind,
      courseSlug: o.courseSlug,
      courseTitle: titles.get(o.courseSlug) ?? o.courseSlug,
      schoolName,
      className,
      classId: o.classId,
      buyerName,
      quantity: o.quantity,
      unitAmount: o.unitAmount,
      amountTotal: o.amountTotal,
      currency: o.currency,
      status: o.status,
      href: o.checkoutSessionId ? `/${o.kind === "school" ? "school" : "learn"}/orders/${o.checkoutSessionId}` : null,
      checkoutUrl: o.status === "created" ? o.checkoutUrl : null,
      createdAtUtc: o.createdAt.toISOString(),
      paidAtUtc: o.paidAt?.toISOString() ?? null,
      seatsRefunded: o.seatsRefunded,
      amountRefunded: o.amountRefunded,
      refundableSeats: refundable,
      refunds: all.filter((r) => r.orderId === o.id).map(refundDto),
    });
  }
  return out;
}

/** Schools the viewer manages (ids). */
async function managedSchoolIds(database: Queryable, userId: string): Promise<string[]> {
  const rows = await database.select({ id: schoolMembers.schoolId }).from(schoolMembers).where(and(eq(schoolMembers.userId, userId), eq(schoolMembers.role, "manager")));
  return rows.map((r) => r.id);
}

/**
 * The page a buyer lands on from Checkout (success_url) and comes back to from a receipt. An
 * order still open is first brought up to date from the service (the same idempotent fulfilment
 * as the webhook, so the two may race); then the page only shows state.
 */
export async function getOrderBySession(viewer: Viewer | null, sessionId: unknown, database: Queryable = db(), payments: Stripe = paymentsClient()): Promise<Result<{ order: OrderDto }>> {
  const allowed = guard(viewer, ["school_manager", "apprentice"]);
  if (!allowed.ok) return allowed;
  if (typeof sessionId !== "string" || !/^cs_[A-Za-z0-9_]{1,200}$/.test(sessionId)) return fail("not_found", { message: "We couldn't find that order." });
  const mine = async () => {
    const [row] = await baseQuery(database).where(eq(orders.checkoutSessionId, sessionId));
    if (!row) return null;
    const ok = row.order.kind === "self" ? row.order.userId === allowed.viewer.id : (await managedSchoolIds(database, allowed.viewer.id)).includes(row.order.schoolId!);
    return ok ? row : null;
  };
  const row = await mine();
  if (!row) return fail("not_found", { message: "We couldn't find that order." });
  if (row.order.status === "created" || row.order.status === "awaiting_payment") {
    try {
      await fulfilCheckoutSession(sessionId, {}, database, payments);
    } catch (error) {
      // The service could not be asked now: show what we know; the webhook or the job will catch up.
      console.error("[payments] order page could not refresh", sessionId, error instanceof Error ? error.message : error);
    }
  }
  const fresh = (await mine())!;
  return { ok: true, order: (await toDtos(database, [fresh], fresh.order.kind === "school"))[0] };
}

/** School office: every order of the schools the viewer manages, newest first, with refunds. */
export async function listSchoolOrders(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ orders: OrderDto[] }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const ids = await managedSchoolIds(database, allowed.viewer.id);
  if (ids.length === 0) return { ok: true, orders: [] };
  const rows = await baseQuery(database).where(and(eq(orders.kind, "school"), inArray(orders.schoolId, ids))).orderBy(desc(orders.createdAt)).limit(200);
  return { ok: true, orders: await toDtos(database, rows, true) };
}

/** An apprentice's own purchases. */
export async function listMyOrders(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ orders: OrderDto[] }>> {
  const allowed = guard(viewer, ["apprentice"]);
  if (!allowed.ok) return allowed;
  const rows = await baseQuery(database).where(and(eq(orders.kind, "self"), eq(orders.userId, allowed.viewer.id))).orderBy(desc(orders.createdAt)).limit(100);
  return { ok: true, orders: await toDtos(database, rows) };
}

/** Admin: the latest orders of everyone, with their refunds (pending requests first in the page). */
export async function listAllPayments(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ orders: OrderDto[] }>> {
  const allowed = guard(viewer, ["admin"]);
  if (!allowed.ok) return allowed;
  const rows = await baseQuery(database).orderBy(desc(orders.createdAt)).limit(200);
  return { ok: true, orders: await toDtos(database, rows) };
}

/** The school's purchase form: the viewer's schools with their classes, and the courses on sale. */
export async function getPurchaseOptions(viewer: Viewer | null, database: Queryable = db()): Promise<Result<{ options: PurchaseOptionsDto }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const ids = await managedSchoolIds(database, allowed.viewer.id);
  const schoolRows = ids.length ? await database.select({ id: schools.id, name: schools.name }).from(schools).where(inArray(schools.id, ids)).orderBy(asc(schools.name)) : [];
  const classRows = ids.length
    ? await database
        .select({ id: classes.id, schoolId: classes.schoolId, name: classes.name, term: classes.term, courseSlug: classes.courseSlug, seatsPurchased: classes.seatsPurchased, seatsClaimed: classes.seatsClaimed })
        .from(classes)
        .where(inArray(classes.schoolId, ids))
        .orderBy(asc(classes.name))
    : [];
  const courses = (await listCourses()).filter((c) => hasPrice(c.slug)).map((c) => ({ slug: c.slug, title: c.title }));
  return {
    ok: true,
    options: {
      schools: schoolRows.map((s) => ({ schoolId: s.id, schoolName: s.name, classes: classRows.filter((c) => c.schoolId === s.id).map(({ schoolId: _s, ...c }) => c) })),
      courses,
    },
  };
}
