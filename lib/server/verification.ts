import "server-only";
// What anyone may learn about a certificate, with no sign-in: the public verification answer
// (rate-limited by client address) and the signed revocation list (W3C Bitstring Status List v1.0).
import { eq, isNotNull } from "drizzle-orm";
import { db, type Database } from "@/db/client";
import { certificates } from "@/db/schema";
import { formatCode, normalizeCode } from "@/lib/certificates/code";
import { CREDENTIAL_CONTEXTS, dateTimeZ, issuerId, STATUS_LIST_PATH } from "@/lib/certificates/credential";
import { signJwt } from "@/lib/certificates/signing";
import { encodeStatusList } from "@/lib/certificates/status-list";
import type { VerificationDto } from "@/lib/dto/certificates";
import { EDGE_HEADERS } from "@/lib/net/client-address";
import { fail, waitInWords, type Result } from "./errors";
import { publicOrigin } from "./http";
import { limitsFor, refundSlot, takeSlot } from "./rate-limit";

export type { VerificationDto } from "@/lib/dto/certificates";

/**
 * The client address as the server edge resolved it, from a page's request headers (the same rule
 * as clientAddress in ./http.ts: without the edge's peer header nothing is believed).
 */
export function addressFromHeaders(headers: Headers): string {
  if (!headers.get(EDGE_HEADERS.peerAddress)) return "unknown";
  return headers.get(EDGE_HEADERS.clientAddress)?.trim() || "unknown";
}

/**
 * The public answer for a typed or scanned code: valid, revoked (date and public reason) or
 * unknown. The name only when the graduate allows it; the course always. A code that can't be a
 * code is "unknown" without a database look-up; an unknown one counts against the address.
 */
export async function verifyCertificate(raw: { code?: unknown }, ctx: { address: string }, database: Database = db()): Promise<Result<{ verification: VerificationDto }>> {
  const typed = typeof raw.code === "string" ? raw.code.slice(0, 64) : "";
  const code = normalizeCode(typed);
  if (!code) return { ok: true, verification: { found: false, code: typed } };
  const slot = await takeSlot(database, limitsFor("verifyLookups", null, ctx.address));
  if (!slot.ok) {
    return fail("rate_limited", { message: `Too many certificate look-ups from your address. Try again ${waitInWords(slot.retryAfterSeconds)}.`, retryAfterSeconds: slot.retryAfterSeconds });
  }
  const [row] = await database.select().from(certificates).where(eq(certificates.code, code));
  if (!row) return { ok: true, verification: { found: false, code: formatCode(code) } };
  await refundSlot(database, slot);
  return {
    ok: true,
    verification: {
      found: true,
      code: row.code,
      displayCode: formatCode(row.code),
      status: row.revokedAt ? "revoked" : "valid",
      recipientName: row.showName ? row.recipientName : null,
      courseTitle: row.courseTitle,
      issuedAt: row.issuedAt.toISOString(),
      hours: row.hours,
      schoolName: row.schoolName,
      instructorName: row.instructorName,
      revokedAt: row.revokedAt?.toISOString() ?? null,
      revocationReason: row.revocationReason,
    },
  };
}

/**
 * The revocation list as a BitstringStatusListCredential (Bitstring Status List v1.0 §2.2),
 * signed as a VC-JWT like the certificates' credentials, fresh on every request (a revocation
 * shows at once). Bits set: every revoked certificate's statusListIndex.
 */
export async function statusListCredential(database: Database = db()): Promise<Result<{ jwt: string }>> {
  const revoked = await database.select({ index: certificates.statusListIndex }).from(certificates).where(isNotNull(certificates.revokedAt));
  const origin = publicOrigin();
  const id = `${origin}${STATUS_LIST_PATH}`;
  const validFrom = dateTimeZ(new Date());
  const credential = {
    "@context": [CREDENTIAL_CONTEXTS[0]],
    id,
    type: ["VerifiableCredential", "BitstringStatusListCredential"],
    issuer: issuerId(origin),
    validFrom,
    credentialSubject: { id: `${id}#list`, type: "BitstringStatusList", statusPurpose: "revocation", encodedList: encodeStatusList(revoked.map((r) => r.index)) },
  };
  const jwt = await signJwt(origin, { ...credential, iss: credential.issuer, jti: id, nbf: Math.floor(Date.parse(validFrom) / 1000) });
  if (!jwt) return fail("unavailable", { message: "The status list can't be signed right now: the signing key is not configured." });
  return { ok: true, jwt };
}
