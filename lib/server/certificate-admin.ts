import "server-only";
// Revocation: admins (any certificate) and the issuing school's instructors (a certificate whose
// school they teach in). The reason is public: the verification page and the graduate's page show
// it, and the credential's bit in the status list is set (lib/server/verification.ts).
import { and, desc, eq, isNull, or, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { certificates, classMembers, classes, schoolMembers, type CertificateRow } from "@/db/schema";
import { formatCode, normalizeCode } from "@/lib/certificates/code";
import type { ManagedCertificateDto } from "@/lib/dto/certificates";
import { writeAudit } from "./audit";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import type { Viewer } from "./viewer";

export type { ManagedCertificateDto } from "@/lib/dto/certificates";

const NOT_YOURS = "We couldn't find that certificate among those you may revoke.";

function toManaged(row: CertificateRow): ManagedCertificateDto {
  return {
    id: row.id,
    displayCode: formatCode(row.code),
    recipientName: row.recipientName,
    courseTitle: row.courseTitle,
    schoolName: row.schoolName,
    issuedAt: row.issuedAt.toISOString(),
    status: row.revokedAt ? "revoked" : "valid",
    revokedAt: row.revokedAt?.toISOString() ?? null,
    revocationReason: row.revocationReason,
  };
}

/** Certificates this viewer may revoke: all for an admin; for an instructor, those of schools they teach in. */
function revocableBy(viewer: Viewer): SQL | undefined {
  if (viewer.role === "admin") return undefined;
  return sql`${certificates.schoolId} in (
    select ${schoolMembers.schoolId} from ${schoolMembers} where ${schoolMembers.userId} = ${viewer.id} and ${schoolMembers.role} = 'instructor'
    union
    select ${classes.schoolId} from ${classes} join ${classMembers} on ${classMembers.classId} = ${classes.id}
    where ${classMembers.userId} = ${viewer.id} and ${classMembers.role} = 'instructor')`;
}

const ListInput = z.object({ code: z.string().max(40).optional() });

/** The newest 100 certificates the viewer may revoke, or the one with a typed code. */
export async function listManagedCertificates(viewer: Viewer | null, raw: unknown = {}, database: Queryable = db()): Promise<Result<{ certificates: ManagedCertificateDto[] }>> {
  const allowed = guard(viewer, ["admin", "instructor"]);
  if (!allowed.ok) return allowed;
  const parsed = ListInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input");
  const typed = parsed.data.code?.trim();
  const code = typed ? normalizeCode(typed) : null;
  if (typed && !code) return { ok: true, certificates: [] };
  const rows = await database
    .select()
    .from(certificates)
    .where(and(revocableBy(allowed.viewer), code ? eq(certificates.code, code) : undefined))
    .orderBy(desc(certificates.issuedAt))
    .limit(100);
  return { ok: true, certificates: rows.map(toManaged) };
}

const RevokeInput = z.object({
  certificateId: z.uuid(),
  reason: z.string().trim().min(3, { error: "Give a reason of a few words: the verification page shows it." }).max(300, { error: "Keep the reason under 300 characters." }),
});

/** Revokes once (a second revocation keeps the first date and reason); audited. */
export async function revokeCertificate(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ certificate: ManagedCertificateDto }>> {
  const allowed = guard(viewer, ["admin", "instructor"]);
  if (!allowed.ok) return allowed;
  const parsed = RevokeInput.safeParse(raw);
  if (!parsed.success) {
    return fail("invalid_input", { fieldErrors: Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])) });
  }
  const me = allowed.viewer;
  return database.transaction(async (tx) => {
    const mine = and(eq(certificates.id, parsed.data.certificateId), revocableBy(me));
    const [revoked] = await tx
      .update(certificates)
      .set({ revokedAt: sql`now()`, revokedBy: me.id, revocationReason: parsed.data.reason })
      .where(and(mine, isNull(certificates.revokedAt)))
      .returning();
    if (revoked) {
      await writeAudit(tx, { actorId: me.id, action: "certificate.revoked", targetType: "certificate", targetId: revoked.id, detail: { reason: parsed.data.reason, code: revoked.code } });
      return { ok: true as const, certificate: toManaged(revoked) };
    }
    const [row] = await tx.select().from(certificates).where(or(mine));
    if (!row) return fail("not_found", { message: NOT_YOURS });
    return { ok: true as const, certificate: toManaged(row) };
  });
}
