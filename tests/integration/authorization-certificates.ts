// The certificates' rows of the authorization matrix (tests/integration/authorization.test.ts
// spreads them into MATRIX and PUBLIC). prepareCertificates makes a school of its own (so no other
// row's counts move) where the matrix instructor is a school instructor, seats a graduate in a class
// there, completes the course for them and issues the certificate: the apprentice's allowed runs
// act as that graduate, and the instructor may revoke it as an instructor of the issuing school.
import { expect } from "vitest";
import { classMembers, classes, enrollments, schoolMembers, schools, type Role } from "@/db/schema";
import { completeCourseFor } from "@/db/seed-certificates";
import type { ErrorCode, Ok, Result } from "@/lib/dto/result";
import { listManagedCertificates, revokeCertificate } from "@/lib/server/certificate-admin";
import { getCertificatePdf, getCertificatesOverview, getCredentialFile, issueCertificate, setNameVisibility } from "@/lib/server/certificates";
import { statusListCredential, verifyCertificate } from "@/lib/server/verification";
import type { Viewer } from "@/lib/server/viewer";
import { ensureSigningKeys } from "../support/certificates";
import { createUser, ctx, testDb } from "./helpers";

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

const COURSE = "miking-the-band";
const c = { graduate: null as Viewer | null, certificateId: "", code: "" };
/** The apprentice's runs act as the graduate (the matrix apprentice has not finished the course). */
const asGraduate = (v: Viewer | null, who: Who) => (who === "apprentice" ? c.graduate : v);

export async function prepareCertificates(instructor: Viewer): Promise<void> {
  await ensureSigningKeys();
  const [school] = await testDb().insert(schools).values({ slug: `matrix-certificates-${Date.now()}`, name: "Matrix Certificate School" }).returning();
  const [{ id: classId }] = await testDb().insert(classes).values({ schoolId: school.id, name: "Certificate matrix class", term: "Test", courseSlug: COURSE }).returning();
  await testDb().insert(schoolMembers).values({ schoolId: school.id, userId: instructor.id, role: "instructor" });
  const g = await createUser("apprentice");
  await testDb().insert(classMembers).values({ classId, userId: g.id, role: "apprentice" });
  await testDb().insert(enrollments).values({ userId: g.id, courseSlug: COURSE, source: "class", classId });
  await completeCourseFor(testDb(), g.id, COURSE, classId);
  c.graduate = { id: g.id, email: g.email, name: "Test apprentice", role: "apprentice", sessionId: crypto.randomUUID() };
  const issued = await issueCertificate(c.graduate, { courseSlug: COURSE });
  if (!issued.ok) throw new Error(issued.message);
  c.certificateId = issued.certificate.id;
  c.code = issued.certificate.code;
}

export const CERTIFICATE_MATRIX: Entry[] = [
  entry({
    name: "getCertificatesOverview (apprentice: certificates page)",
    run: (v, who) => getCertificatesOverview(asGraduate(v, who)),
    allowed: ["apprentice"],
    check: (r) => expect(r.courses.find((x) => x.courseSlug === COURSE)).toMatchObject({ complete: true, certificate: { id: c.certificateId } }),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "issueCertificate (certificates page action, POST /api/certificates)",
    run: (v, who) => issueCertificate(asGraduate(v, who), { courseSlug: COURSE }),
    // Issued once: asking again returns the same certificate.
    allowed: ["apprentice"],
    check: (r) => expect(r).toMatchObject({ issued: false, certificate: { id: c.certificateId } }),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "setNameVisibility (certificates page action)",
    run: (v, who) => setNameVisibility(asGraduate(v, who), { certificateId: c.certificateId, showName: true }),
    allowed: ["apprentice"],
    check: (r) => expect(r.certificate).toMatchObject({ id: c.certificateId, showName: true }),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "getCertificatePdf (GET /api/certificates/…/pdf)",
    run: (v, who) => getCertificatePdf(asGraduate(v, who), { certificateId: c.certificateId, paper: "letter" }),
    allowed: ["apprentice"],
    check: (r) => expect(Buffer.from(r.pdf.slice(0, 5)).toString("latin1")).toBe("%PDF-"),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "getCredentialFile (GET /api/certificates/…/credential)",
    run: (v, who) => getCredentialFile(asGraduate(v, who), { certificateId: c.certificateId }),
    allowed: ["apprentice"],
    check: (r) => expect(r.jwt.split(".")).toHaveLength(3),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "listManagedCertificates (admin and teach: certificates pages)",
    run: (v) => listManagedCertificates(v, { code: c.code }),
    // An admin sees every certificate; the instructor those of the school they teach in.
    allowed: ["instructor", "admin"],
    check: (r) => expect(r.certificates.map((x) => x.id)).toEqual([c.certificateId]),
    denied: onlyFor("instructor", "admin"),
  }),
  entry({
    name: "revokeCertificate (certificates pages action, POST /api/certificates/…/revoke)",
    run: (v) => revokeCertificate(v, { certificateId: c.certificateId, reason: "Matrix revocation" }),
    allowed: ["instructor", "admin"],
    check: (r) => expect(r.certificate).toMatchObject({ id: c.certificateId, status: "revoked", revocationReason: "Matrix revocation" }),
    denied: onlyFor("instructor", "admin"),
  }),
];

export const CERTIFICATE_PUBLIC: { name: string; run: () => Promise<void> }[] = [
  {
    name: "verifyCertificate",
    run: async () => {
      expect(await verifyCertificate({ code: c.code }, ctx())).toMatchObject({ ok: true, verification: { found: true, courseTitle: "Miking the band" } });
      expect(await verifyCertificate({ code: "0000-0000-0000" }, ctx())).toMatchObject({ ok: true, verification: { found: false } });
    },
  },
  {
    name: "statusListCredential",
    run: async () => {
      const r = await statusListCredential();
      if (!r.ok) throw new Error(r.message);
      expect(r.jwt.split(".")).toHaveLength(3);
    },
  },
];

export const CERTIFICATE_NOT_ENTRY_POINTS: Record<string, string> = {
  addressFromHeaders: "pure: the client address from the edge's request headers, no database",
};
