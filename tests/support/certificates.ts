// Fixtures for the certificate tests: signing keys for this process (npm test exports its own in
// scripts/test.sh; a lone vitest run makes one), and a school, class and apprentice in it.
import { calculateJwkThumbprint, exportJWK, generateKeyPair } from "jose";
import { classMembers, classes, enrollments, schoolMembers, schools } from "@/db/schema";
import type { Database } from "@/db/connection";
import { createUser } from "../integration/helpers";

export async function newSigningKey(alg: "ES256" | "EdDSA" = "ES256") {
  const { privateKey } = await generateKeyPair(alg, { extractable: true, ...(alg === "EdDSA" ? { crv: "Ed25519" } : {}) });
  const jwk = await exportJWK(privateKey);
  const pub = jwk.kty === "EC" ? { kty: jwk.kty, crv: jwk.crv, x: jwk.x, y: jwk.y } : { kty: jwk.kty, crv: jwk.crv, x: jwk.x };
  return { ...jwk, kid: await calculateJwkThumbprint(pub, "sha256") };
}

export async function ensureSigningKeys(): Promise<void> {
  process.env.CREDENTIAL_SIGNING_KEYS ??= JSON.stringify({ keys: [await newSigningKey()] });
}

/** A school with a class on the course, its instructor, and `apprentices` seated apprentices. */
export async function schoolWithClass(database: Database, courseSlug: string, apprentices = 1) {
  const [school] = await database.insert(schools).values({ slug: `cert-${Date.now()}-${Math.random().toString(36).slice(2, 8)}`, name: "Harbour Light Sound School" }).returning();
  const [klass] = await database.insert(classes).values({ schoolId: school.id, name: "Certificate test class", term: "Test", courseSlug }).returning();
  const instructor = await createUser("instructor");
  await database.insert(schoolMembers).values({ schoolId: school.id, userId: instructor.id, role: "instructor" });
  await database.insert(classMembers).values({ classId: klass.id, userId: instructor.id, role: "instructor" });
  const people = [];
  for (let i = 0; i < apprentices; i++) {
    const a = await createUser("apprentice");
    await database.insert(schoolMembers).values({ schoolId: school.id, userId: a.id, role: "apprentice" });
    await database.insert(classMembers).values({ classId: klass.id, userId: a.id, role: "apprentice" });
    await database.insert(enrollments).values({ userId: a.id, courseSlug, source: "class", classId: klass.id });
    people.push(a);
  }
  return { school, klass, instructor, apprentices: people };
}
