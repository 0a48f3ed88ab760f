import "server-only";
// The graduate's side of certificates: the checklist of every course with a seat, issuing (once,
// in one transaction with its code, its signed credential and its mail), hiding or showing the
// name on the public page, and the two downloads (PDF, VC-JWT). docs/decisions/008-certificates.md.
import { randomBytes, randomInt, randomUUID } from "node:crypto";
import { and, asc, eq } from "drizzle-orm";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { certificates, classMembers, classes, enrollments, schools, users, type CertificateRow } from "@/db/schema";
import { formatCode, newVerificationCode } from "@/lib/certificates/code";
import { buildOpenBadgeCredential, jwtPayloadOf } from "@/lib/certificates/credential";
import { renderCertificatePdf, type Paper } from "@/lib/certificates/pdf";
import { signJwt } from "@/lib/certificates/signing";
import { STATUS_LIST_SIZE } from "@/lib/certificates/status-list";
import { getCourse } from "@/lib/content";
import type { CertificatesOverviewDto, MyCertificateDto } from "@/lib/dto/certificates";
import { enqueueMail } from "@/lib/email/outbox";
import { completionOf, NO_SEAT_MESSAGE, seatedCourses } from "./completion";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import { publicOrigin } from "./http";
import type { Viewer } from "./viewer";

export type { CertificatesOverviewDto, MyCertificateDto } from "@/lib/dto/certificates";

const ONLY_APPRENTICES = "Only apprentices earn certificates.";
const NO_CERTIFICATE = "We couldn't find that certificate among yours.";
export const NO_KEYS_MESSAGE = "Certificates can't be issued right now: the signing key is not configured. Please tell the Axisline team.";

export function verifyUrlOf(code: string): string {
  return `${publicOrigin()}/verify/${formatCode(code)}`;
}

export function toMyCertificate(row: CertificateRow): MyCertificateDto {
  return {
    id: row.id,
    courseSlug: row.courseSlug,
    courseTitle: row.courseTitle,
    code: row.code,
    displayCode: formatCode(row.code),
    issuedAt: row.issuedAt.toISOString(),
    hours: row.hours,
    schoolName: row.schoolName,
    instructorName: row.instructorName,
    showName: row.showName,
    status: row.revokedAt ? "revoked" : "valid",
    revokedAt: row.revokedAt?.toISOString() ?? null,
    revocationReason: row.revocationReason,
    verifyUrl: verifyUrlOf(row.code),
  };
}

/** Every course the apprentice has a seat on: its checklist and, once issued, its certificate. */
export async function getCertificatesOverview(viewer: Viewer | null, database: Queryable = db()): Promise<Result<CertificatesOverviewDto>> {
  const allowed = guard(viewer, ["apprentice"], ONLY_APPRENTICES);
  if (!allowed.ok) return allowed;
  const me = allowed.viewer;
  const mine = await database.select().from(certificates).where(eq(certificates.userId, me.id));
  const courses: CertificatesOverviewDto["courses"] = [];
  for (const slug of await seatedCourses(me.id, database)) {
    const completion = await completionOf(me.id, slug, database);
    if (!completion) continue;
    const row = mine.find((c) => c.courseSlug === slug);
    courses.push({ ...completion, certificate: row ? toMyCertificate(row) : null });
  }
  return { ok: true, courses };
}

/** The school and instructor of the class that gave the seat (none for a seat bought alone). */
async function schoolOfSeat(database: Queryable, userId: string, courseSlug: string) {
  const [seat] = await database
    .select({ schoolId: schools.id, schoolName: schools.name, classId: classes.id })
    .from(enrollments)
    .innerJoin(classes, eq(classes.id, enrollments.classId))
    .innerJoin(schools, eq(schools.id, classes.schoolId))
    .where(and(eq(enrollments.userId, userId), eq(enrollments.courseSlug, courseSlug)));
  if (!seat) return { schoolId: null, schoolName: null, instructorName: null };
  const [instructor] = await database
    .select({ name: users.name })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(and(eq(classMembers.classId, seat.classId), eq(classMembers.role, "instructor")))
    .orderBy(asc(users.name))
    .limit(1);
  return { schoolId: seat.schoolId, schoolName: seat.schoolName, instructorName: instructor?.name ?? null };
}

const IssueInput = z.object({ courseSlug: z.string().min(1).max(120) });

/**
 * Issues the apprentice's certificate for a course they have completed, or returns the one they
 * already have (issued: false). Not complete: forbidden, with the sentence of what is missing.
 * One INSERT … ON CONFLICT DO NOTHING on the unique (user, course): of concurrent requests one
 * inserts, the others wait for its commit and read its row. A clash of the random code or
 * status-list index (no row, none existing) draws again.
 */
export async function issueCertificate(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ certificate: MyCertificateDto; issued: boolean }>> {
  const allowed = guard(viewer, ["apprentice"], ONLY_APPRENTICES);
  if (!allowed.ok) return allowed;
  const me = allowed.viewer;
  const parsed = IssueInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const { courseSlug } = parsed.data;
  const existing = async () => (await database.select().from(certificates).where(and(eq(certificates.userId, me.id), eq(certificates.courseSlug, courseSlug))))[0];
  const already = await existing();
  if (already) return { ok: true, certificate: toMyCertificate(already), issued: false };
  if (!(await seatedCourses(me.id, database)).includes(courseSlug)) return fail("not_found", { message: NO_SEAT_MESSAGE });
  const completion = await completionOf(me.id, courseSlug, database);
  const course = await getCourse(courseSlug);
  if (!completion || !course) return fail("not_found", { message: NO_SEAT_MESSAGE });
  if (!completion.complete) return fail("forbidden", { message: completion.missing });

  const [person] = await database.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, me.id));
  const seat = await schoolOfSeat(database, me.id, courseSlug);
  const origin = publicOrigin();
  const hours = Math.round((course.minutes / 60) * 10) / 10;
  for (let tries = 0; tries < 5; tries++) {
    const row = {
      id: randomUUID(),
      userId: me.id,
      courseSlug,
      code: newVerificationCode(),
      issuedAt: new Date(Math.floor(Date.now() / 1000) * 1000),
      recipientName: person.name,
      courseTitle: course.title,
      hours,
      ...seat,
      subjectId: randomUUID(),
      statusListIndex: randomInt(0, STATUS_LIST_SIZE),
    };
    const credential = buildOpenBadgeCredential({ origin, certificateId: row.id, subjectId: row.subjectId, issuedAt: row.issuedAt, courseSlug, courseTitle: course.title, courseSummary: course.summary, hours, email: person.email, salt: randomBytes(16).toString("hex"), statusListIndex: row.statusListIndex });
    const credentialJwt = await signJwt(origin, jwtPayloadOf(credential));
    if (!credentialJwt) return fail("unavailable", { message: NO_KEYS_MESSAGE });
    const inserted = await database.transaction(async (tx) => {
      const [created] = await tx.insert(certificates).values({ ...row, credentialJwt }).onConflictDoNothing().returning();
      if (created) {
        await enqueueMail(tx, person.email, { template: "certificate_issued", name: person.name, courseTitle: course.title, code: formatCode(created.code), verifyUrl: verifyUrlOf(created.code), pageUrl: `${origin}/learn/certificates` });
      }
      return created;
    });
    if (inserted) return { ok: true, certificate: toMyCertificate(inserted), issued: true };
    const winner = await existing();
    if (winner) return { ok: true, certificate: toMyCertificate(winner), issued: false };
  }
  throw new Error("issueCertificate: five random codes or status-list indexes in a row were taken");
}

const CertificateRef = z.object({ certificateId: z.uuid() });

async function ownCertificate(database: Queryable, userId: string, raw: unknown): Promise<CertificateRow | null> {
  const parsed = CertificateRef.safeParse(raw);
  if (!parsed.success) return null;
  const [row] = await database.select().from(certificates).where(and(eq(certificates.id, parsed.data.certificateId), eq(certificates.userId, userId)));
  return row ?? null;
}

const VisibilityInput = CertificateRef.extend({ showName: z.boolean() });

/** The graduate decides whether the public verification page shows their name (the course always shows). */
export async function setNameVisibility(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ certificate: MyCertificateDto }>> {
  const allowed = guard(viewer, ["apprentice"], ONLY_APPRENTICES);
  if (!allowed.ok) return allowed;
  const parsed = VisibilityInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const [row] = await database
    .update(certificates)
    .set({ showName: parsed.data.showName })
    .where(and(eq(certificates.id, parsed.data.certificateId), eq(certificates.userId, allowed.viewer.id)))
    .returning();
  if (!row) return fail("not_found", { message: NO_CERTIFICATE });
  return { ok: true, certificate: toMyCertificate(row) };
}

const PdfInput = CertificateRef.extend({ paper: z.enum(["a4", "letter"]).default("a4") });

/** The certificate as a PDF on A4 or US Letter, for its graduate. */
export async function getCertificatePdf(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ pdf: Uint8Array; filename: string }>> {
  const allowed = guard(viewer, ["apprentice"], ONLY_APPRENTICES);
  if (!allowed.ok) return allowed;
  const parsed = PdfInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const row = await ownCertificate(database, allowed.viewer.id, parsed.data);
  if (!row) return fail("not_found", { message: NO_CERTIFICATE });
  const paper: Paper = parsed.data.paper;
  const pdf = await renderCertificatePdf({ ...row, code: row.code, verifyUrl: verifyUrlOf(row.code), paper });
  return { ok: true, pdf, filename: `axisline-certificate-${formatCode(row.code)}-${paper}.pdf` };
}

/** The signed Open Badges 3.0 credential (a compact JWS), for its graduate. */
export async function getCredentialFile(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ jwt: string; filename: string }>> {
  const allowed = guard(viewer, ["apprentice"], ONLY_APPRENTICES);
  if (!allowed.ok) return allowed;
  const row = await ownCertificate(database, allowed.viewer.id, raw);
  if (!row) return fail("not_found", { message: NO_CERTIFICATE });
  return { ok: true, jwt: row.credentialJwt, filename: `axisline-credential-${formatCode(row.code)}.jwt` };
}
