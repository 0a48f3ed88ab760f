import "server-only";
// A school manager invites apprentices into a class: typed addresses or a CSV roster, checked line
// by line against the class (seated, invited, staff accounts, free seats). Nothing is sent unless
// every line is good, or, when the manager says so, the good lines only. Each invitation is a
// single-use link (256 random bits; only the SHA-256 is stored) that holds a seat until it is
// claimed, revoked or expires. Claiming is lib/server/invitation-claims.ts.
import { and, eq, gt, inArray, isNull, lte, sql } from "drizzle-orm";
import { z } from "zod";
import { db as processDb, type Database, type Queryable } from "@/db/client";
import { classInvitations, classMembers, users } from "@/db/schema";
import type { RosterProblem, RosterRefusal } from "@/lib/dto/school-office";
import { getCourse } from "@/lib/content";
import { enqueueMail } from "@/lib/email/outbox";
import type { RequestContext } from "./accounts";
import { fail, waitInWords, type Result } from "./errors";
import { guard } from "./guard";
import { isFailure, managedClass, type ManagedClass } from "./managed-class";
import { limitsFor, refundSlot, takeSlot } from "./rate-limit";
import { MAX_ROSTER_BYTES, parseRosterCsv, parseTypedAddresses, type RosterEntry } from "./roster";
import { releasableSeats } from "./seat-pool";
import { newToken } from "./tokens";
import type { Viewer } from "./viewer";

/** An invitation link works for 7 days. */
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const dayFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

const tooLong = `That is more than one roster may hold (${MAX_ROSTER_BYTES / 1024} KB). Split it into smaller lists.`;
export const InviteInput = z.object({
  classId: z.string(),
  addresses: z.string().max(MAX_ROSTER_BYTES, { error: tooLong }).default(""),
  csv: z.string().max(MAX_ROSTER_BYTES, { error: tooLong }).default(""),
  /** The manager's explicit choice to invite the good lines and skip the others. */
  goodRowsOnly: z.boolean().default(false),
});

type Checked = { good: RosterEntry[]; problems: RosterProblem[] };

/** The roster's lines against the class: already seated, already invited, staff accounts, then the free seats. */
async function checkAgainstClass(tx: Queryable, klass: ManagedClass, entries: RosterEntry[], problems: RosterProblem[]): Promise<Checked> {
  const emails = entries.map((e) => e.email);
  if (emails.length === 0) return { good: [], problems };
  const seated = new Set(
    (
      await tx
        .select({ email: users.email })
        .from(classMembers)
        .innerJoin(users, eq(users.id, classMembers.userId))
        .where(and(eq(classMembers.classId, klass.id), inArray(users.email, emails)))
    ).map((r) => r.email),
  );
  const invited = new Map(
    (
      await tx
        .select({ email: classInvitations.email, expiresAt: classInvitations.expiresAt })
        .from(classInvitations)
        .where(and(eq(classInvitations.classId, klass.id), inArray(classInvitations.email, emails), isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt), gt(classInvitations.expiresAt, sql`now()`)))
    ).map((r) => [r.email, r.expiresAt]),
  );
  const staff = new Set((await tx.select({ email: users.email }).from(users).where(and(inArray(users.email, emails), sql`${users.role} <> 'apprentice'`))).map((r) => r.email));
  const candidates: RosterEntry[] = [];
  for (const e of entries) {
    const problem = seated.has(e.email)
      ? `${e.email} already has a place in this class.`
      : invited.has(e.email)
        ? `Duplicate: ${e.email} already has an invitation to this class, open until ${dayFormat.format(invited.get(e.email)!)}.`
        : staff.has(e.email)
          ? `${e.email} belongs to a staff account; seats are for apprentice accounts.`
          : null;
    if (problem) problems.push({ line: e.line, email: e.email, problem });
    else candidates.push(e);
  }
  const free = await releasableSeats(tx, klass.id);
  for (const e of candidates.slice(free)) {
    problems.push({ line: e.line, email: e.email, problem: `No free seat left for ${e.email}: the class has ${free} free ${free === 1 ? "seat" : "seats"} for ${candidates.length} new ${candidates.length === 1 ? "person" : "people"}.` });
  }
  problems.sort((a, b) => a.line - b.line);
  return { good: candidates.slice(0, free), problems };
}

function refusal(problems: RosterProblem[], goodRowsOnly: boolean): RosterRefusal {
  const count = problems.length;
  const message = goodRowsOnly
    ? "None of the lines can be invited, so nothing was sent."
    : `Nothing was sent: ${count} ${count === 1 ? "line needs" : "lines need"} another look. Correct ${count === 1 ? "it" : "them"}, or choose to invite only the good lines.`;
  return { ...fail("invalid_input", { message }), problems };
}

/** Writes the invitations and queues their mails (the caller's transaction holds the class lock). */
async function issueInvitations(tx: Queryable, klass: ManagedClass, good: RosterEntry[], invitedBy: string, baseUrl: string): Promise<void> {
  // An expired invitation to the same address makes way for the new one (one pending per class and address).
  await tx
    .update(classInvitations)
    .set({ revokedAt: sql`now()` })
    .where(and(eq(classInvitations.classId, klass.id), inArray(classInvitations.email, good.map((e) => e.email)), isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt), lte(classInvitations.expiresAt, sql`now()`)));
  const courseTitle = (await getCourse(klass.courseSlug))?.title ?? klass.courseSlug;
  const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_MS);
  for (const e of good) {
    const { token, tokenHash } = newToken();
    await tx.insert(classInvitations).values({ classId: klass.id, email: e.email, name: e.name, tokenHash, invitedBy, expiresAt });
    await enqueueMail(tx, e.email, {
      template: "class_invitation",
      name: e.name,
      schoolName: klass.schoolName,
      className: klass.name,
      courseTitle,
      expiresOn: dayFormat.format(expiresAt),
      url: `${baseUrl}/invitations/${token}`,
    });
  }
}

/**
 * Invites the people of a roster into a class the manager runs. Answers how many were invited and
 * which lines were skipped, or refuses the whole roster with every line's problem.
 */
export async function inviteApprentices(
  viewer: Viewer | null,
  raw: unknown,
  ctx: RequestContext,
  database: Database = processDb(),
): Promise<Result<{ invited: number; skipped: RosterProblem[] }> | RosterRefusal> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const manager = allowed.viewer;
  const parsed = InviteInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { message: parsed.error.issues[0]?.message ?? "Some of what you entered needs another look." });
  const { classId, addresses, csv, goodRowsOnly } = parsed.data;
  const known = await managedClass(database, manager.id, classId);
  if (isFailure(known)) return known;
  if (addresses.trim() && csv.trim()) return fail("invalid_input", { message: "Use either the box or a CSV file, one at a time." });
  if (!addresses.trim() && !csv.trim()) return fail("invalid_input", { message: "Type at least one e-mail address, or choose a CSV file." });
  const roster = csv.trim() ? parseRosterCsv(csv) : parseTypedAddresses(addresses);
  if (roster.problems.some((p) => p.line === 0)) return refusal(roster.problems, false);

  const slot = await takeSlot(database, limitsFor("invitationRosters", manager.id, ctx.address));
  if (!slot.ok) return fail("rate_limited", { message: `You've sent a lot of invitations in the last hour. Please try again ${waitInWords(slot.retryAfterSeconds)}.`, retryAfterSeconds: slot.retryAfterSeconds });

  const outcome = await database.transaction(async (tx) => {
    const klass = await managedClass(tx, manager.id, classId, true);
    if (isFailure(klass)) return klass;
    const { good, problems } = await checkAgainstClass(tx, klass, roster.entries, [...roster.problems]);
    if ((problems.length > 0 && !goodRowsOnly) || good.length === 0) return refusal(problems, goodRowsOnly);
    await issueInvitations(tx, klass, good, manager.id, ctx.baseUrl);
    return { ok: true as const, invited: good.length, skipped: problems };
  });
  // Only a roster that sent mail counts against the hourly limit.
  if (!outcome.ok) await refundSlot(database, slot);
  return outcome;
}

export const RevokeInput = z.object({ invitationId: z.uuid({ error: "Choose an invitation to withdraw." }) });

/** Withdraws an invitation nobody has claimed yet; its seat is free again at once. */
export async function revokeInvitation(viewer: Viewer | null, raw: unknown, database: Queryable = processDb()): Promise<Result<{ email: string }>> {
  const allowed = guard(viewer, ["school_manager"]);
  if (!allowed.ok) return allowed;
  const parsed = RevokeInput.safeParse(raw);
  if (!parsed.success) return fail("not_found", { message: "We couldn't find that invitation." });
  const [invitation] = await database.select({ classId: classInvitations.classId }).from(classInvitations).where(eq(classInvitations.id, parsed.data.invitationId));
  if (!invitation) return fail("not_found", { message: "We couldn't find that invitation." });
  const klass = await managedClass(database, allowed.viewer.id, invitation.classId);
  if (isFailure(klass)) return fail("not_found", { message: "We couldn't find that invitation." });
  const [row] = await database
    .update(classInvitations)
    .set({ revokedAt: sql`now()` })
    .where(and(eq(classInvitations.id, parsed.data.invitationId), isNull(classInvitations.claimedAt), isNull(classInvitations.revokedAt)))
    .returning({ email: classInvitations.email });
  if (!row) return fail("conflict", { message: "That invitation has already been accepted or withdrawn." });
  return { ok: true, email: row.email };
}
