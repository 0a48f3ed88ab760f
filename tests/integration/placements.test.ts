// Placement briefs end to end in the data-access layer against the real PostgreSQL: submitting
// processed photos, resubmitting after a redo with the history kept, the review queue's order,
// filters and counts, autosaved drafts and finalizing with totals computed from the rubric, the
// batched instructors' digest and the apprentice's mail through the outbox, and approvedBriefIds.
// Uploads are inserted as the pipeline leaves them (processed, with variant keys); the pipeline
// itself is tested in the uploads suite.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { closeDb } from "@/db/connection";
import { briefSubmissions, classMembers, classes, enrollments, mailOutbox, reviewNotices, schools, uploads } from "@/db/schema";
import { briefById } from "@/lib/content/briefs";
import { rubricMax } from "@/lib/assessment/rubric";
import { approvedBriefIds, getMyBrief, listMyBriefs, submitBrief } from "@/lib/server/briefs";
import { listReviewQueue } from "@/lib/server/review-queue";
import { sendReviewDigests } from "@/lib/server/review-digest";
import { finalizeReview, getReviewView, saveReviewDraft } from "@/lib/server/reviews";
import type { Viewer } from "@/lib/server/viewer";
import { createUser, testDb } from "./helpers";

const COURSE = "miking-the-band";
const KICK = "brief-kick-inside-beater"; // rubric: aim 4/2/0, distance 3/1/0, clearance 2/0, stand-cable 3/1/0 → max 12
const OVERHEADS = "brief-overheads-equidistant";

async function person(role: "apprentice" | "instructor", name: string): Promise<Viewer> {
  const u = await createUser(role);
  await testDb().execute(sql`update users set name = ${name} where id = ${u.id}`);
  return { id: u.id, email: u.email, name, role, sessionId: "00000000-0000-4000-8000-000000000000" };
}

async function klass(name: string, instructors: Viewer[], apprentices: Viewer[]): Promise<string> {
  const [school] = await testDb().insert(schools).values({ slug: `placements-${name.toLowerCase().replace(/\W+/g, "-")}-${Date.now()}`, name: `${name} school` }).returning();
  const [c] = await testDb().insert(classes).values({ schoolId: school.id, name, term: "Spring", courseSlug: COURSE }).returning();
  await testDb().insert(classMembers).values([...instructors.map((v) => ({ classId: c.id, userId: v.id, role: "instructor" as const })), ...apprentices.map((v) => ({ classId: c.id, userId: v.id, role: "apprentice" as const }))]);
  for (const a of apprentices) await testDb().insert(enrollments).values({ userId: a.id, courseSlug: COURSE, source: "class", classId: c.id }).onConflictDoNothing();
  return c.id;
}

/** Photos as the upload pipeline leaves them. */
async function processedPhotos(owner: Viewer, n: number, status: "processed" | "stored" = "processed"): Promise<string[]> {
  const rows = await testDb()
    .insert(uploads)
    .values(
      Array.from({ length: n }, (_, i) => ({
        ownerId: owner.id,
        status,
        originalName: `placement-${i + 1}.jpg`,
        byteSize: 2_000_000,
        ...(status === "processed" ? { width: 1600, height: 1200, displayKey: `d-${crypto.randomUUID()}`, thumbKey: `t-${crypto.randomUUID()}` } : {}),
      })),
    )
    .returning({ id: uploads.id });
  return rows.map((r) => r.id);
}

const photosWith = (ids: string[]) => ids.map((uploadId, i) => ({ uploadId, caption: `Shot ${i + 1}: from the drummer's side` }));
const ok = <T extends { ok: boolean }>(r: T) => {
  if (!r.ok) throw new Error(`expected success, got ${JSON.stringify(r)}`);
  return r as Extract<T, { ok: true }>;
};

let ines: Viewer, rowan: Viewer, other: Viewer, ada: Viewer, ben: Viewer, cleo: Viewer;
let classA: string, classB: string;

beforeAll(async () => {
  ines = await person("instructor", "Ines Test");
  rowan = await person("instructor", "Rowan Test");
  other = await person("instructor", "Other Test");
  ada = await person("apprentice", "Ada Test");
  ben = await person("apprentice", "Ben Test");
  cleo = await person("apprentice", "Cleo Test");
  classA = await klass("Placement A", [ines, rowan], [ada, ben]);
  classB = await klass("Placement B", [ines, other], [cleo]);
  // Notices left by other suites would join these digests; start from none pending.
  await testDb().update(reviewNotices).set({ digestedAt: sql`now()` }).where(sql`${reviewNotices.digestedAt} is null`);
});

afterAll(async () => {
  await closeDb();
});

describe("submitting", () => {
  it("lists the briefs of the apprentice's course, not started", async () => {
    const r = ok(await listMyBriefs(ada));
    expect(r.courses.map((c) => c.courseSlug)).toEqual([COURSE]);
    const kick = r.courses[0].briefs.find((b) => b.briefId === KICK);
    expect(kick).toMatchObject({ state: "not_started", attempts: 0, lessonId: "les-mtb-kick-snare-hihat" });
    expect(r.courses[0].briefs.every((b) => b.briefId.startsWith("brief-"))).toBe(true);
  });

  it("refuses photos that are not processed, not the apprentice's, repeated, too few, or without a caption, writing nothing", async () => {
    const [mine] = await processedPhotos(ada, 1);
    const [stored] = await processedPhotos(ada, 1, "stored");
    const [bens] = await processedPhotos(ben, 1);
    const before = await testDb().select().from(briefSubmissions).where(eq(briefSubmissions.userId, ada.id));
    expect(await submitBrief(ada, { briefId: KICK, photos: photosWith([mine, stored]) })).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/not ready yet or is not yours/) });
    expect(await submitBrief(ada, { briefId: KICK, photos: photosWith([mine, bens]) })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await submitBrief(ada, { briefId: KICK, photos: photosWith([mine, mine]) })).toMatchObject({ ok: false, code: "invalid_input", message: "The same photo is attached twice." });
    expect(await submitBrief(ada, { briefId: KICK, photos: photosWith([mine]) })).toMatchObject({ ok: false, code: "invalid_input", message: "This brief needs 2 to 4 photos." });
    expect(await submitBrief(ada, { briefId: KICK, photos: [{ uploadId: mine, caption: "  " }, { uploadId: stored, caption: "x" }] })).toMatchObject({ ok: false, code: "invalid_input", fieldErrors: { "photos.0.caption": expect.any(String) } });
    expect(await submitBrief(ada, { briefId: "brief-nothing", photos: photosWith([mine]) })).toMatchObject({ ok: false, code: "not_found" });
    expect(await testDb().select().from(briefSubmissions).where(eq(briefSubmissions.userId, ada.id))).toEqual(before);
  });

  it("submits attempt 1 with captions in order and a notice for each instructor of the class; a second send waits for the review", async () => {
    const ids = await processedPhotos(ada, 2);
    const r = ok(await submitBrief(ada, { briefId: KICK, photos: photosWith(ids) }));
    expect(r.attempt).toBe(1);
    const detail = ok(await getMyBrief(ada, KICK)).detail;
    expect(detail).toMatchObject({ state: "submitted", canSubmit: false, className: "Placement A" });
    expect(detail.attempts[0].photos.map((p) => [p.uploadId, p.caption, p.displayUrl])).toEqual(ids.map((id, i) => [id, `Shot ${i + 1}: from the drummer's side`, `/api/photos/${id}/display`]));
    const notices = await testDb().select().from(reviewNotices).where(eq(reviewNotices.submissionId, r.submissionId));
    expect(notices.map((n) => n.instructorId).sort()).toEqual([ines.id, rowan.id].sort());
    expect(await submitBrief(ada, { briefId: KICK, photos: photosWith(await processedPhotos(ada, 2)) })).toMatchObject({ ok: false, code: "conflict" });
  });
});

let adaFirst: string;

describe("the review queue", () => {
  it("lists the waiting work of the instructor's classes oldest first, with counts and the oldest wait", async () => {
    const benSub = ok(await submitBrief(ben, { briefId: OVERHEADS, photos: photosWith(await processedPhotos(ben, 2)) }));
    const cleoSub = ok(await submitBrief(cleo, { briefId: KICK, photos: photosWith(await processedPhotos(cleo, 2)) }));
    // Make the ages plain: Ada's 3 h ago, Ben's 2 h, Cleo's 1 h.
    const ada1 = ok(await listReviewQueue(ines, { briefId: KICK, classId: classA })).queue.items[0].submissionId;
    adaFirst = ada1;
    for (const [id, hours] of [[ada1, 3], [benSub.submissionId, 2], [cleoSub.submissionId, 1]] as const) {
      await testDb().update(briefSubmissions).set({ submittedAt: sql`now() - make_interval(hours => ${hours})` }).where(eq(briefSubmissions.id, id));
    }
    const q = ok(await listReviewQueue(ines)).queue;
    const mine = q.items.filter((i) => ["Ada Test", "Ben Test", "Cleo Test"].includes(i.apprenticeName));
    expect(mine.map((i) => i.apprenticeName)).toEqual(["Ada Test", "Ben Test", "Cleo Test"]);
    expect(q.counts.submitted).toBe(3);
    expect(q.oldestWaitingSeconds).toBeGreaterThanOrEqual(3 * 3600 - 5);
    expect(q.oldestWaitingSeconds).toBeLessThan(3 * 3600 + 120);
    expect(q.classes.map((c) => c.name)).toEqual(["Placement A", "Placement B"]);
    expect(q.briefs.map((b) => b.id)).toContain(KICK);
  });

  it("filters by class and by brief; another instructor sees only their class; an invalid filter is ignored", async () => {
    expect(ok(await listReviewQueue(ines, { classId: classB })).queue.items.map((i) => i.apprenticeName)).toEqual(["Cleo Test"]);
    expect(ok(await listReviewQueue(ines, { briefId: OVERHEADS })).queue.items.map((i) => i.apprenticeName)).toEqual(["Ben Test"]);
    const others = ok(await listReviewQueue(other)).queue;
    expect(others.items.map((i) => i.apprenticeName)).toEqual(["Cleo Test"]);
    expect(others.counts).toEqual({ submitted: 1, redo_requested: 0, approved: 0 });
    expect(ok(await listReviewQueue(ines, { classId: "nope", status: "weird" })).queue.filters).toEqual({ classId: null, briefId: null, status: "submitted" });
  });
});

describe("reviewing", () => {
  it("autosaves a draft with pins and partial scores, refuses a stale version, levels not in the rubric and pins off the photos", async () => {
    const view = ok(await getReviewView(ines, adaFirst)).view;
    expect(view.brief.maxPoints).toBe(rubricMax((await briefById(KICK))!.rubric));
    expect(view.review).toBeNull();
    const photo = view.photos[0].id;
    const pins = [{ id: "p1", photoId: photo, x: 0.25, y: 0.5, comment: "Aim at the beater, not the shell." }];
    const first = ok(await saveReviewDraft(ines, { submissionId: adaFirst, version: 0, scores: { aim: 2 }, pins, comment: "" })).review;
    expect(first).toMatchObject({ version: 1, totalPoints: 2, maxPoints: 12, scored: 1, criteria: 4 });
    const second = ok(await saveReviewDraft(rowan, { submissionId: adaFirst, version: 1, scores: { aim: 2, distance: 1 }, pins, comment: "Closer." })).review;
    expect(second).toMatchObject({ version: 2, totalPoints: 3 });
    // Ines's tab still holds version 1: her save would overwrite Rowan's.
    expect(await saveReviewDraft(ines, { submissionId: adaFirst, version: 1, scores: {}, pins: [], comment: "" })).toMatchObject({ ok: false, code: "conflict" });
    expect(await saveReviewDraft(ines, { submissionId: adaFirst, version: 2, scores: { aim: 3 } })).toMatchObject({ ok: false, code: "invalid_input", message: expect.stringMatching(/3 is not a level of "aim"/) });
    expect(await saveReviewDraft(ines, { submissionId: adaFirst, version: 2, pins: [{ ...pins[0], photoId: crypto.randomUUID() }] })).toMatchObject({ ok: false, code: "invalid_input" });
    expect(await saveReviewDraft(ines, { submissionId: adaFirst, version: 2, pins: [{ ...pins[0], x: 1.2 }] })).toMatchObject({ ok: false, code: "invalid_input" });
    const reloaded = ok(await getReviewView(ines, adaFirst)).view.review;
    expect(reloaded).toMatchObject({ state: "draft", version: 2, scores: { aim: 2, distance: 1 }, pins, comment: "Closer.", reviewerName: "Rowan Test" });
    // The apprentice never sees a draft.
    expect(ok(await getMyBrief(ada, KICK)).detail.attempts[0].review).toBeNull();
  });

  it("finalizes a redo only with every criterion scored and a comment, total from the rubric, and mails the apprentice", async () => {
    const base = { submissionId: adaFirst, version: 2, pins: ok(await getReviewView(ines, adaFirst)).view.review!.pins };
    expect(await finalizeReview(ines, { ...base, scores: { aim: 2, distance: 1 }, comment: "x", decision: "redo" })).toMatchObject({ ok: false, code: "invalid_input", message: "Score every criterion of the rubric before you decide." });
    const scores = { aim: 2, distance: 1, clearance: 2, "stand-cable": 3 }; // 2 + 1 + 2 + 3 = 8 of 12
    expect(await finalizeReview(ines, { ...base, scores, comment: " ", decision: "redo" })).toMatchObject({ ok: false, code: "invalid_input", fieldErrors: { comment: "Say what to change." } });
    // A total sent by the browser is not an input: it is ignored.
    const done = ok(await finalizeReview(ines, { ...base, scores, totalPoints: 12, comment: "Move it to the beater and measure again.", decision: "redo" })).review;
    expect(done).toMatchObject({ version: 3, totalPoints: 8, maxPoints: 12 });
    expect(await saveReviewDraft(rowan, { ...base, version: 3, scores })).toMatchObject({ ok: false, code: "conflict", message: "This submission has already been reviewed." });
    const [mail] = await testDb().select().from(mailOutbox).where(and(eq(mailOutbox.toAddress, ada.email), eq(mailOutbox.template, "review_result")));
    expect(mail.subject).toBe("Redo requested: Kick microphone inside the shell, aimed at the beater");
    expect(mail.text).toContain("8 of 12 points. There is 1 comment pinned on your photos.");
    expect(mail.text).toContain("Move it to the beater and measure again.");
    const detail = ok(await getMyBrief(ada, KICK)).detail;
    expect(detail).toMatchObject({ state: "redo_requested", canSubmit: true });
    expect(detail.attempts[0].review).toMatchObject({ state: "final", decision: "redo", totalPoints: 8, pins: [{ x: 0.25, y: 0.5 }] });
  });

  it("resubmits as attempt 2, keeps attempt 1 with its review, then approves; approvedBriefIds counts it", async () => {
    expect(await approvedBriefIds(ada.id, COURSE)).toEqual([]);
    const second = ok(await submitBrief(ada, { briefId: KICK, photos: photosWith(await processedPhotos(ada, 3)) }));
    expect(second.attempt).toBe(2);
    const view = ok(await getReviewView(rowan, second.submissionId)).view;
    expect(view.earlier.map((a) => [a.attempt, a.review?.decision])).toEqual([[1, "redo"]]);
    ok(await finalizeReview(rowan, { submissionId: second.submissionId, version: 0, scores: { aim: 4, distance: 3, clearance: 2, "stand-cable": 3 }, decision: "approve" }));
    const detail = ok(await getMyBrief(ada, KICK)).detail;
    expect(detail.attempts.map((a) => [a.attempt, a.status, a.photos.length, a.review?.totalPoints])).toEqual([
      [2, "approved", 3, 12],
      [1, "redo_requested", 2, 8],
    ]);
    expect(detail.canSubmit).toBe(false);
    expect(await approvedBriefIds(ada.id, COURSE)).toEqual([KICK]);
    expect(await approvedBriefIds(ada.id, "how-microphones-hear")).toEqual([]);
    expect(await submitBrief(ada, { briefId: KICK, photos: photosWith(await processedPhotos(ada, 2)) })).toMatchObject({ ok: false, code: "conflict", message: "This brief is already approved." });
    const counts = ok(await listReviewQueue(ines, { classId: classA, status: "all" })).queue;
    expect(counts.counts).toMatchObject({ approved: 1, redo_requested: 1 });
    expect(counts.items.find((i) => i.submissionId === adaFirst)).toMatchObject({ status: "redo_requested", waitedSeconds: expect.any(Number) });
  });
});

describe("mail on submission, batched", () => {
  it("one digest per instructor for all their new submissions, none for work already reviewed, and nothing on a second run", async () => {
    const r = await sendReviewDigests(testDb(), "http://axisline.test");
    const digests = await testDb().select().from(mailOutbox).where(eq(mailOutbox.template, "review_digest"));
    const to = (v: Viewer) => digests.filter((m) => m.toAddress === v.email);
    // Ines teaches both classes: Ben's overheads and Cleo's kick in one mail. Ada's first attempt
    // was reviewed before the run and her second approved, so neither is listed.
    expect(to(ines)).toHaveLength(1);
    expect(to(ines)[0].subject).toBe("Placement photos to review: 2 new submissions");
    expect(to(ines)[0].text).toContain("Ben Test: Overheads measured equidistant from the snare (Placement A)");
    expect(to(ines)[0].text).toContain("Cleo Test: Kick microphone inside the shell, aimed at the beater (Placement B)");
    expect(to(ines)[0].text).toContain("http://axisline.test/teach/reviews");
    expect(to(ines)[0].text).not.toContain("Ada Test");
    expect(to(rowan)[0].subject).toBe("Placement photos to review: 1 new submission");
    expect(to(other)[0].text).toContain("Cleo Test");
    expect(r).toMatchObject({ mails: 3, notices: 4 });
    expect(await sendReviewDigests(testDb(), "http://axisline.test")).toEqual({ mails: 0, notices: 0 });
  });
});
