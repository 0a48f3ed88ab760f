// Certificates against the real PostgreSQL: the completion rule, issuing once under concurrency,
// verification, revocation, and the Open Badges 3.0 credential checked by an outside verifier
// (jose's jwtVerify with the published JWK Set) against the specifications:
//   [OB3]  1EdTech Open Badges Specification 3.0, https://www.imsglobal.org/spec/ob/v3p0/
//   [VCDM] W3C Verifiable Credentials Data Model v2.0, https://www.w3.org/TR/vc-data-model-2.0/
//   [BSL]  W3C Bitstring Status List v1.0 (Recommendation, 15 May 2025), https://www.w3.org/TR/vc-bitstring-status-list/
import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { createLocalJWKSet, decodeProtectedHeader, jwtVerify } from "jose";
import { closeDb } from "@/db/connection";
import { certificates, mailOutbox, users } from "@/db/schema";
import { completeCourseFor } from "@/db/seed-certificates";
import { formatCode } from "@/lib/certificates/code";
import { publicJwks } from "@/lib/certificates/signing";
import { decodeStatusList, statusBit } from "@/lib/certificates/status-list";
import { revokeCertificate, listManagedCertificates } from "@/lib/server/certificate-admin";
import { getCertificatesOverview, getCredentialFile, issueCertificate, setNameVisibility } from "@/lib/server/certificates";
import { statusListCredential, verifyCertificate } from "@/lib/server/verification";
import type { Viewer } from "@/lib/server/viewer";
import { ensureSigningKeys, newSigningKey, schoolWithClass } from "../support/certificates";
import { createUser, ctx, testDb } from "./helpers";

const COURSE = "miking-the-band";
const origin = () => new URL(process.env.NEXTAUTH_URL!).origin;
// A decoded credential is read field by field against the specifications.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Claims = Record<string, any>;
const viewerOf = (u: { id: string; email: string }, role: Viewer["role"] = "apprentice"): Viewer => ({ id: u.id, email: u.email, name: "Test", role, sessionId: crypto.randomUUID() });

let setup: Awaited<ReturnType<typeof schoolWithClass>>;

beforeAll(async () => {
  await ensureSigningKeys();
  setup = await schoolWithClass(testDb(), COURSE, 3);
});

afterAll(async () => {
  await closeDb();
});

async function jwks() {
  return createLocalJWKSet(await publicJwks(origin()));
}

describe("the completion rule", () => {
  it("refuses to issue before completion: forbidden, with a sentence of what is missing, and writes nothing", async () => {
    const a = setup.apprentices[0];
    const r = await issueCertificate(viewerOf(a), { courseSlug: COURSE });
    expect(r).toMatchObject({ ok: false, code: "forbidden" });
    if (r.ok) return;
    expect(r.message).toMatch(/^Before the certificate can be issued, complete \d+ lessons, pass \d+ module quizzes \(.+\) and have 6 placement briefs approved \(.+\)\.$/);
    expect(await testDb().select().from(certificates).where(eq(certificates.userId, a.id))).toEqual([]);
  });

  it("lists every lesson, every module quiz (not the final) and the course's briefs, and turns complete when all are done", async () => {
    const a = setup.apprentices[0];
    const before = await getCertificatesOverview(viewerOf(a));
    if (!before.ok) throw new Error(before.code);
    const course = before.courses.find((c) => c.courseSlug === COURSE)!;
    expect(course.complete).toBe(false);
    expect(course.items.filter((i) => i.kind === "quiz").map((i) => i.id)).not.toContain("bank-miking-the-band-final");
    expect(course.items.filter((i) => i.kind === "brief")).toHaveLength(6);
    await completeCourseFor(testDb(), a.id, COURSE, setup.klass.id);
    const after = await getCertificatesOverview(viewerOf(a));
    if (!after.ok) throw new Error(after.code);
    expect(after.courses.find((c) => c.courseSlug === COURSE)).toMatchObject({ complete: true, missing: "", certificate: null });
  });

  it("without a seat there is nothing to earn (not_found), and other roles are refused", async () => {
    const stranger = await createUser("apprentice");
    expect(await issueCertificate(viewerOf(stranger), { courseSlug: COURSE })).toMatchObject({ ok: false, code: "not_found" });
    expect(await issueCertificate(viewerOf(setup.instructor, "instructor"), { courseSlug: COURSE })).toMatchObject({ ok: false, code: "forbidden" });
  });
});

describe("issuing", () => {
  it("issues one certificate under 20 concurrent requests, with one mail through the outbox", async () => {
    const a = setup.apprentices[0];
    const results = await Promise.all(Array.from({ length: 20 }, () => issueCertificate(viewerOf(a), { courseSlug: COURSE })));
    const ids = new Set(results.map((r) => (r.ok ? r.certificate.id : r.code)));
    expect(ids.size).toBe(1);
    expect(results.filter((r) => r.ok && r.issued)).toHaveLength(1);
    const rows = await testDb().select().from(certificates).where(eq(certificates.userId, a.id));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ courseSlug: COURSE, schoolName: "Harbour Light Sound School", instructorName: "Test instructor", showName: true, revokedAt: null });
    expect(rows[0].code).toMatch(/^[0-9A-HJKMNP-TV-Z]{12}$/);
    const mails = await testDb().select().from(mailOutbox).where(and(eq(mailOutbox.toAddress, a.email), eq(mailOutbox.template, "certificate_issued")));
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain(formatCode(rows[0].code));
  });
});

describe("the Open Badges 3.0 credential", () => {
  it("verifies with jose against the published JWK Set and has the header OB 3.0 §8.2.1 allows", async () => {
    const a = setup.apprentices[0];
    const [row] = await testDb().select().from(certificates).where(eq(certificates.userId, a.id));
    const file = await getCredentialFile(viewerOf(a), { certificateId: row.id });
    if (!file.ok) throw new Error(file.code);
    expect(file.jwt).toBe(row.credentialJwt);
    const { protectedHeader } = await jwtVerify(file.jwt, await jwks());
    // [OB3] §8.2.1: alg, kid (a URI dereferencing to a JWK), typ "JWT" if present; "Additional JOSE Headers are NOT allowed."
    expect(Object.keys(protectedHeader).sort()).toEqual(["alg", "kid", "typ"]);
    expect(protectedHeader).toMatchObject({ alg: "ES256", typ: "JWT" });
    expect(protectedHeader.kid).toMatch(new RegExp(`^${origin()}/issuer/keys/[A-Za-z0-9_-]+$`));
  });

  it("carries every required field, with @context in the specified order", async () => {
    const a = setup.apprentices[0];
    const [row] = await testDb().select().from(certificates).where(eq(certificates.userId, a.id));
    const [person] = await testDb().select().from(users).where(eq(users.id, a.id));
    const { payload: vc } = (await jwtVerify(row.credentialJwt, await jwks())) as unknown as { payload: Claims };
    // [VCDM] §4.3: the first @context is https://www.w3.org/ns/credentials/v2; [OB3] §"OpenBadgeCredential": then the OB 3.0 context.
    expect(vc["@context"]).toEqual(["https://www.w3.org/ns/credentials/v2", "https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json"]);
    // [OB3] AchievementCredential: id (URI), type ∋ VerifiableCredential and OpenBadgeCredential, issuer Profile, validFrom DateTimeZ.
    expect(vc.id).toBe(`urn:uuid:${row.id}`);
    expect(vc.type).toEqual(expect.arrayContaining(["VerifiableCredential", "OpenBadgeCredential"]));
    expect(vc.issuer).toMatchObject({ id: `${origin()}/issuer`, type: ["Profile"], name: "Axisline" });
    expect(vc.validFrom).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ$/);
    expect(Date.parse(vc.validFrom)).toBe(row.issuedAt.getTime());
    // [OB3] §8.2.3 JWT Payload: iss = issuer.id, jti = id, nbf = validFrom, sub = credentialSubject.id.
    expect(vc).toMatchObject({ iss: vc.issuer.id, jti: vc.id, nbf: Date.parse(vc.validFrom) / 1000, sub: vc.credentialSubject.id });
    // [OB3] AchievementSubject: type ∋ AchievementSubject, achievement (1), id or identifier.
    const subject = vc.credentialSubject;
    expect(subject.type).toContain("AchievementSubject");
    expect(subject.id).toMatch(/^urn:uuid:[0-9a-f-]{36}$/);
    // [OB3] Achievement: id, type ∋ Achievement, name, description, criteria (narrative).
    expect(subject.achievement).toMatchObject({ id: `${origin()}/courses/${COURSE}`, type: ["Achievement"], name: row.courseTitle });
    expect(subject.achievement.description.length).toBeGreaterThan(20);
    expect(subject.achievement.criteria.narrative.length).toBeGreaterThan(20);
    // [OB3] IdentityObject: hashed identityHash = "sha256$" + hex SHA-256 of identifier + salt (recomputed here with node:crypto).
    const identity = subject.identifier[0];
    expect(identity).toMatchObject({ type: "IdentityObject", identityType: "emailAddress", hashed: true });
    expect(identity.identityHash).toBe(`sha256$${createHash("sha256").update(person.email + identity.salt).digest("hex")}`);
    // [BSL] §2.1 BitstringStatusListEntry: type, statusPurpose, statusListIndex (a string), statusListCredential (a URL).
    expect(vc.credentialStatus).toEqual({
      id: `${origin()}/credentials/status/1#${row.statusListIndex}`,
      type: "BitstringStatusListEntry",
      statusPurpose: "revocation",
      statusListIndex: String(row.statusListIndex),
      statusListCredential: `${origin()}/credentials/status/1`,
    });
  });

  it("fails verification once tampered with (a changed achievement name under the original signature)", async () => {
    const [row] = await testDb().select().from(certificates).where(eq(certificates.userId, setup.apprentices[0].id));
    const [header, payload, signature] = row.credentialJwt.split(".");
    const claims = JSON.parse(Buffer.from(payload, "base64url").toString("utf8"));
    claims.credentialSubject.achievement.name = "Advanced Everything";
    const forged = [header, Buffer.from(JSON.stringify(claims)).toString("base64url"), signature].join(".");
    await expect(jwtVerify(forged, await jwks())).rejects.toMatchObject({ code: "ERR_JWS_SIGNATURE_VERIFICATION_FAILED" });
  });

  it("keeps verifying after a key rotation: the new key signs, the old one stays published", async () => {
    const before = process.env.CREDENTIAL_SIGNING_KEYS!;
    const [old] = await testDb().select().from(certificates).where(eq(certificates.userId, setup.apprentices[0].id));
    const oldKid = decodeProtectedHeader(old.credentialJwt).kid;
    process.env.CREDENTIAL_SIGNING_KEYS = JSON.stringify({ keys: [await newSigningKey("EdDSA"), ...JSON.parse(before).keys] });
    try {
      const b = setup.apprentices[1];
      await completeCourseFor(testDb(), b.id, COURSE, setup.klass.id);
      const issued = await issueCertificate(viewerOf(b), { courseSlug: COURSE });
      if (!issued.ok) throw new Error(issued.message);
      const [fresh] = await testDb().select().from(certificates).where(eq(certificates.id, issued.certificate.id));
      const set = await jwks();
      const newer = await jwtVerify(fresh.credentialJwt, set);
      expect(newer.protectedHeader.alg).toBe("EdDSA");
      expect(newer.protectedHeader.kid).not.toBe(oldKid);
      expect((await jwtVerify(old.credentialJwt, set)).protectedHeader.kid).toBe(oldKid);
    } finally {
      process.env.CREDENTIAL_SIGNING_KEYS = before;
    }
  });
});

describe("verification and revocation", () => {
  it("answers valid, unknown and malformed codes; shows the name only while the graduate allows", async () => {
    const a = setup.apprentices[0];
    const [row] = await testDb().select().from(certificates).where(eq(certificates.userId, a.id));
    const typed = formatCode(row.code).toLowerCase();
    expect(await verifyCertificate({ code: typed }, ctx())).toMatchObject({ ok: true, verification: { found: true, status: "valid", recipientName: "Test apprentice", courseTitle: row.courseTitle } });
    expect(await verifyCertificate({ code: "0000-0000-0000" }, ctx())).toMatchObject({ ok: true, verification: { found: false } });
    expect(await verifyCertificate({ code: "not a code" }, ctx())).toMatchObject({ ok: true, verification: { found: false } });
    expect(await setNameVisibility(viewerOf(a), { certificateId: row.id, showName: false })).toMatchObject({ ok: true, certificate: { showName: false } });
    expect(await verifyCertificate({ code: row.code }, ctx())).toMatchObject({ ok: true, verification: { found: true, recipientName: null, courseTitle: row.courseTitle } });
    // Someone else's certificate: not found.
    expect(await setNameVisibility(viewerOf(setup.apprentices[2]), { certificateId: row.id, showName: true })).toMatchObject({ ok: false, code: "not_found" });
    await setNameVisibility(viewerOf(a), { certificateId: row.id, showName: true });
  });

  it("limits unknown look-ups per address (60 in 15 minutes); known codes give their slot back", async () => {
    const [row] = await testDb().select().from(certificates).where(eq(certificates.userId, setup.apprentices[0].id));
    const here = ctx();
    for (let i = 0; i < 70; i++) expect((await verifyCertificate({ code: row.code }, here)).ok).toBe(true);
    for (let i = 0; i < 60; i++) expect((await verifyCertificate({ code: `ZZZZ-ZZZZ-${String(i).padStart(4, "0")}` }, here)).ok).toBe(true);
    const refused = await verifyCertificate({ code: "ZZZZ-ZZZZ-ZZZZ" }, here);
    expect(refused).toMatchObject({ ok: false, code: "rate_limited", retryAfterSeconds: expect.any(Number) });
  });

  it("lets only admins and the issuing school's instructors revoke; the page and the status list then say so", async () => {
    const a = setup.apprentices[0];
    const [row] = await testDb().select().from(certificates).where(eq(certificates.userId, a.id));
    const other = await schoolWithClass(testDb(), COURSE, 0);
    const outsider = viewerOf(other.instructor, "instructor");
    expect(await revokeCertificate(outsider, { certificateId: row.id, reason: "Not mine to revoke" })).toMatchObject({ ok: false, code: "not_found" });
    expect(await listManagedCertificates(outsider, {})).toEqual({ ok: true, certificates: [] });
    expect(await revokeCertificate(viewerOf(a), { certificateId: row.id, reason: "Revoking my own" })).toMatchObject({ ok: false, code: "forbidden" });
    const teacher = viewerOf(setup.instructor, "instructor");
    expect(await revokeCertificate(teacher, { certificateId: row.id, reason: "" })).toMatchObject({ ok: false, code: "invalid_input", fieldErrors: { reason: expect.any(String) } });
    const done = await revokeCertificate(teacher, { certificateId: row.id, reason: "Placement photos were not the apprentice's own work" });
    expect(done).toMatchObject({ ok: true, certificate: { status: "revoked", revocationReason: "Placement photos were not the apprentice's own work" } });

    expect(await verifyCertificate({ code: row.code }, ctx())).toMatchObject({
      ok: true,
      verification: { found: true, status: "revoked", revocationReason: "Placement photos were not the apprentice's own work", revokedAt: expect.any(String) },
    });
    const mine = await getCertificatesOverview(viewerOf(a));
    if (!mine.ok) throw new Error(mine.code);
    expect(mine.courses.find((c) => c.courseSlug === COURSE)!.certificate).toMatchObject({ status: "revoked" });

    // [BSL] §3.3: fetch the status list credential, verify it, expand the bitstring, read the bit at statusListIndex.
    const list = await statusListCredential();
    if (!list.ok) throw new Error(list.code);
    const { payload } = (await jwtVerify(list.jwt, await jwks())) as unknown as { payload: Claims };
    expect(payload.type).toEqual(["VerifiableCredential", "BitstringStatusListCredential"]);
    expect(payload.credentialSubject).toMatchObject({ type: "BitstringStatusList", statusPurpose: "revocation" });
    const bits = decodeStatusList(payload.credentialSubject.encodedList);
    expect(bits.length).toBe(16_384); // [BSL] §2.2: at least 16KB uncompressed
    expect(statusBit(bits, row.statusListIndex)).toBe(1);
    const [still] = await testDb().select().from(certificates).where(eq(certificates.userId, setup.apprentices[1].id));
    expect(statusBit(bits, still.statusListIndex)).toBe(0);
  });
});
