// Who may upload and who may see a placement photo; what a submission may reference; and a lost
// callback reconciled from what the upload service (a private stand-in, real SDK) reports.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/connection";
import { classMembers, classes, schoolMembers, schools, uploads, type Role } from "@/db/schema";
import { signInWithPassword } from "@/lib/server/accounts";
import { sessionCookieName } from "@/lib/server/session-policy";
import { beginPhotoUploads, processedUploadsOwnedBy, readPhoto } from "@/lib/server/uploads";
import type { Viewer } from "@/lib/server/viewer";
import { reconcileUploads } from "@/lib/storage/reconcile";
import { noiseJpeg } from "../support/photos";
import { putFile, requestUpload, startUploadsHarness, uploadFiles, type Harness } from "../support/uploads";
import { uniqueAddress } from "../support/unique";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";

let h: Harness;
type Person = { cookie: string; viewer: Viewer };
const people = {} as Record<"owner" | "classmate" | "otherApprentice" | "instructor" | "otherInstructor" | "manager" | "admin", Person>;
let photoId: string;

async function signedIn(role: Role): Promise<Person> {
  const u = await createUser(role);
  const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error("sign-in failed");
  return { cookie: `${sessionCookieName()}=${s.sessionToken}`, viewer: (await viewerFromToken(s.sessionToken))! };
}

const row = async (id: string) => (await testDb().select().from(uploads).where(eq(uploads.id, id)))[0];

beforeAll(async () => {
  h = await startUploadsHarness();
  for (const [name, role] of [["owner", "apprentice"], ["classmate", "apprentice"], ["otherApprentice", "apprentice"], ["instructor", "instructor"], ["otherInstructor", "instructor"], ["manager", "school_manager"], ["admin", "admin"]] as const) {
    people[name] = await signedIn(role);
  }
  // One school, two classes: the owner and a classmate in class A taught by `instructor`; the
  // other apprentice in class B taught by `otherInstructor`; the manager runs the school.
  const [school] = await testDb().insert(schools).values({ slug: `photos-${Date.now()}`, name: "Photo Test School" }).returning();
  const [a, b] = await testDb()
    .insert(classes)
    .values([
      { schoolId: school.id, name: "Class A", term: "Test", courseSlug: "miking-the-band" },
      { schoolId: school.id, name: "Class B", term: "Test", courseSlug: "miking-the-band" },
    ])
    .returning();
  await testDb().insert(schoolMembers).values({ schoolId: school.id, userId: people.manager.viewer.id, role: "manager" });
  await testDb().insert(classMembers).values([
    { classId: a.id, userId: people.instructor.viewer.id, role: "instructor" },
    { classId: a.id, userId: people.owner.viewer.id, role: "apprentice" },
    { classId: a.id, userId: people.classmate.viewer.id, role: "apprentice" },
    { classId: b.id, userId: people.otherInstructor.viewer.id, role: "instructor" },
    { classId: b.id, userId: people.otherApprentice.viewer.id, role: "apprentice" },
  ]);
  const { presigned, puts } = await uploadFiles(h.appUrl, people.owner.cookie, uniqueAddress(), [{ name: "overheads.jpg", type: "image/jpeg", bytes: await noiseJpeg(320, 240) }]);
  expect(puts[0].body.serverData).toMatchObject({ status: "processed" });
  photoId = presigned[0].customId!;
});

afterAll(async () => {
  await h.close();
  await closeDb();
});

describe("reading a photo", () => {
  it.each(["owner", "instructor", "admin"] as const)("%s may read both variants", async (who) => {
    for (const variant of ["display", "thumb"] as const) {
      const r = await readPhoto(people[who].viewer, { uploadId: photoId, variant });
      expect(r).toMatchObject({ ok: true, photo: { contentType: "image/jpeg", filename: `overheads-${variant}.jpg` } });
    }
  });

  it.each(["classmate", "otherApprentice", "otherInstructor", "manager"] as const)("%s gets not_found, as for a photo that doesn't exist", async (who) => {
    expect(await readPhoto(people[who].viewer, { uploadId: photoId, variant: "display" })).toMatchObject({ ok: false, code: "not_found" });
  });

  it("a visitor, a bad id and a bad variant get not_found", async () => {
    expect(await readPhoto(null, { uploadId: photoId, variant: "display" })).toMatchObject({ ok: false, code: "not_found" });
    expect(await readPhoto(people.owner.viewer, { uploadId: "not-a-uuid", variant: "display" })).toMatchObject({ ok: false, code: "not_found" });
    expect(await readPhoto(people.owner.viewer, { uploadId: photoId, variant: "original" })).toMatchObject({ ok: false, code: "not_found" });
  });
});

describe("starting an upload", () => {
  it("a visitor, an instructor and a cross-site page are refused by the route before any row exists", async () => {
    const file = [{ name: "a.jpg", type: "image/jpeg", size: 1000 }];
    const visitor = await requestUpload(h.appUrl, "", uniqueAddress(), file);
    expect(visitor).toMatchObject({ status: 403, body: { message: "Please sign in to continue." } });
    const instructor = await requestUpload(h.appUrl, people.instructor.cookie, uniqueAddress(), file);
    expect(instructor).toMatchObject({ status: 403, body: { message: "Only apprentices upload placement photos." } });
    const res = await fetch(`${h.appUrl}/api/uploadthing?actionType=upload&slug=placementPhoto`, {
      method: "POST",
      headers: { cookie: people.owner.cookie, origin: "https://elsewhere.example", "content-type": "application/json" },
      body: JSON.stringify({ files: file, input: null }),
    });
    expect(res.status).toBe(403);
    expect((await testDb().select().from(uploads).where(eq(uploads.ownerId, people.instructor.viewer.id))).length).toBe(0);
  });

  it("more than 40 upload requests an hour from one apprentice are refused with a wait", async () => {
    const me = await signedIn("apprentice");
    const files = { files: [{ name: "a.jpg", size: 1000, type: "image/jpeg" }] };
    for (let i = 0; i < 40; i++) expect((await beginPhotoUploads(me.viewer, files, uniqueAddress())).ok).toBe(true);
    const refused = await beginPhotoUploads(me.viewer, files, uniqueAddress());
    expect(refused).toMatchObject({ ok: false, code: "rate_limited" });
    expect(refused.ok ? 0 : refused.retryAfterSeconds).toBeGreaterThan(0);
  });
});

describe("what a submission may reference", () => {
  it("only processed photos of the submitter", async () => {
    const pending = await beginPhotoUploads(people.owner.viewer, { files: [{ name: "b.jpg", size: 1000, type: "image/jpeg" }] }, uniqueAddress());
    if (!pending.ok) throw new Error(pending.code);
    const ids = [photoId, pending.uploads[0].id];
    expect((await processedUploadsOwnedBy(testDb(), people.owner.viewer.id, ids)).map((u) => u.id)).toEqual([photoId]);
    expect(await processedUploadsOwnedBy(testDb(), people.classmate.viewer.id, ids)).toEqual([]);
  });
});

describe("a lost callback", () => {
  it("leaves the row pending; reconciliation finds the file by its customId, processes it and deletes the original", async () => {
    await fetch(`${h.fake.url}/_fake/settings`, { method: "POST", body: JSON.stringify({ dropCallbacks: 1 }) });
    const bytes = await noiseJpeg(300, 200);
    const { presigned, puts } = await uploadFiles(h.appUrl, people.owner.cookie, uniqueAddress(), [{ name: "lost.jpg", type: "image/jpeg", bytes }]);
    const id = presigned[0].customId!;
    expect(puts[0]).toMatchObject({ status: 200, body: { serverData: null } });
    expect(h.fake.state.deliveries.find((d) => d.fileKey === presigned[0].key)).toMatchObject({ outcome: "dropped" });
    expect(await row(id)).toMatchObject({ status: "pending", fileKey: null });
    const report = await reconcileUploads({ pendingAfterSeconds: 0, storedAfterSeconds: 0 });
    expect(report.stored).toBeGreaterThanOrEqual(1);
    expect(await row(id)).toMatchObject({ status: "processed", fileKey: presigned[0].key, width: 300, height: 200 });
    expect(h.fake.state.store.get(presigned[0].key)).toBeUndefined();
    expect(await readPhoto(people.owner.viewer, { uploadId: id, variant: "thumb" })).toMatchObject({ ok: true });
  });

  it("an upload that never arrived is failed once its presigned URL can no longer be used", async () => {
    const asked = await requestUpload(h.appUrl, people.owner.cookie, uniqueAddress(), [{ name: "never.jpg", type: "image/jpeg", size: 5000 }]);
    const [p] = asked.body as { customId: string }[];
    await reconcileUploads({ pendingAfterSeconds: 0, giveUpAfterSeconds: 3600 });
    expect((await row(p.customId)).status).toBe("pending"); // still within the URL's life
    await reconcileUploads({ pendingAfterSeconds: 0, giveUpAfterSeconds: 0 });
    expect(await row(p.customId)).toMatchObject({ status: "failed", failureReason: "The upload didn't finish. Send the photo again." });
  });

  it("a PUT after reconciliation failed the row is stored but never processed", async () => {
    const asked = await requestUpload(h.appUrl, people.owner.cookie, uniqueAddress(), [{ name: "late.jpg", type: "image/jpeg", size: 4000 }]);
    const [p] = asked.body as { url: string; key: string; customId: string; name: string }[];
    await reconcileUploads({ pendingAfterSeconds: 0, giveUpAfterSeconds: 0 });
    const put = await putFile(p, { name: "late.jpg", type: "image/jpeg", bytes: (await noiseJpeg(40, 30)).subarray(0, 4000) });
    expect(put.body.serverData).toMatchObject({ uploadId: p.customId, status: "failed" });
    expect((await row(p.customId)).status).toBe("failed");
  });
});
