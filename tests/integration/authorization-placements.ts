// The placement-brief rows of the authorization matrix (tests/integration/authorization.test.ts
// spreads them into MATRIX) and the strangers' checks: another apprentice, another class's
// instructor, a school manager and a visitor can read neither a submission nor its review.
// preparePlacements gives the matrix apprentice (in the matrix class, taught by the matrix
// instructor) one waiting submission of the kick brief and processed photos for another.
import { expect } from "vitest";
import { classMembers, classes, enrollments, schools, uploads, type Role } from "@/db/schema";
import { testDb, createUser } from "./helpers";
import type { ErrorCode, Ok, Result } from "@/lib/dto/result";
import { getMyBrief, listMyBriefs, submitBrief } from "@/lib/server/briefs";
import { listReviewQueue } from "@/lib/server/review-queue";
import { finalizeReview, getReviewView, saveReviewDraft } from "@/lib/server/reviews";
import type { Viewer } from "@/lib/server/viewer";

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
const onlyFor = (allowed: Who): Partial<Record<Who, ErrorCode>> =>
  Object.fromEntries((["anonymous", "apprentice", "instructor", "school_manager", "admin"] as Who[]).filter((w) => w !== allowed).map((w) => [w, w === "anonymous" ? "not_signed_in" : "forbidden"]));

const KICK = "brief-kick-inside-beater";
const OVERHEADS = "brief-overheads-equidistant";
const SCORES = { aim: 4, distance: 3, clearance: 2, "stand-cable": 3 };
let submissionId = "";
let spare: string[] = [];
let stranger: { apprentice: Viewer; instructor: Viewer } | null = null;

async function photos(ownerId: string, n: number): Promise<string[]> {
  const rows = await testDb()
    .insert(uploads)
    .values(Array.from({ length: n }, () => ({ ownerId, status: "processed" as const, originalName: "matrix.jpg", byteSize: 1000, width: 1600, height: 1200, displayKey: `d-${crypto.randomUUID()}`, thumbKey: `t-${crypto.randomUUID()}` })))
    .returning({ id: uploads.id });
  return rows.map((r) => r.id);
}

const viewerOf = async (role: "apprentice" | "instructor"): Promise<Viewer> => {
  const u = await createUser(role);
  return { id: u.id, email: u.email, name: `Test ${role}`, role, sessionId: "00000000-0000-4000-8000-000000000000" };
};

export async function preparePlacements(apprentice: Viewer): Promise<void> {
  const r = await submitBrief(apprentice, { briefId: KICK, photos: (await photos(apprentice.id, 2)).map((uploadId) => ({ uploadId, caption: "Through the port" })) });
  if (!r.ok) throw new Error(`placement submit failed: ${r.code} ${r.message}`);
  submissionId = r.submissionId;
  spare = await photos(apprentice.id, 2);
  // Another school's class on the same course, with its own apprentice and instructor.
  const s = { apprentice: await viewerOf("apprentice"), instructor: await viewerOf("instructor") };
  const [school] = await testDb().insert(schools).values({ slug: `matrix-placements-${Date.now()}`, name: "Other placements school" }).returning();
  const [c] = await testDb().insert(classes).values({ schoolId: school.id, name: "Other placements class", term: "Test", courseSlug: "miking-the-band" }).returning();
  await testDb().insert(classMembers).values([
    { classId: c.id, userId: s.instructor.id, role: "instructor" },
    { classId: c.id, userId: s.apprentice.id, role: "apprentice" },
  ]);
  await testDb().insert(enrollments).values({ userId: s.apprentice.id, courseSlug: "miking-the-band", source: "class", classId: c.id });
  stranger = s;
}

export const PLACEMENT_MATRIX: Entry[] = [
  entry({
    name: "listMyBriefs (apprentice: placement briefs page)",
    run: (v) => listMyBriefs(v),
    allowed: ["apprentice"],
    check: (r) => expect(r.courses.flatMap((c) => c.briefs).find((b) => b.briefId === KICK)).toMatchObject({ state: "submitted", attempts: 1 }),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "getMyBrief (apprentice: brief page)",
    run: (v) => getMyBrief(v, KICK),
    allowed: ["apprentice"],
    check: (r) => expect(r.detail.attempts.map((a) => a.submissionId)).toEqual([submissionId]),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "submitBrief (brief page action)",
    run: (v) => submitBrief(v, { briefId: OVERHEADS, photos: spare.map((uploadId) => ({ uploadId, caption: "Both overheads" })) }),
    allowed: ["apprentice"],
    check: (r) => expect(r.attempt).toBe(1),
    denied: onlyFor("apprentice"),
  }),
  entry({
    name: "listReviewQueue (instructor: review queue)",
    run: (v) => listReviewQueue(v, { briefId: KICK }),
    allowed: ["instructor"],
    check: (r) => expect(r.queue.items.map((i) => i.submissionId)).toEqual([submissionId]),
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "getReviewView (instructor: review page)",
    run: (v) => getReviewView(v, submissionId),
    allowed: ["instructor"],
    check: (r) => expect(r.view.submission).toMatchObject({ id: submissionId, attempt: 1, status: "submitted" }),
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "saveReviewDraft (review page autosave action)",
    run: (v) => saveReviewDraft(v, { submissionId, version: 0, scores: { aim: 4 }, pins: [], comment: "" }),
    allowed: ["instructor"],
    check: (r) => expect(r.review).toMatchObject({ version: 1, totalPoints: 4, maxPoints: 12 }),
    denied: onlyFor("instructor"),
  }),
  entry({
    name: "finalizeReview (review page decision action)",
    run: (v) => finalizeReview(v, { submissionId, version: 1, scores: SCORES, pins: [], comment: "", decision: "approve" }),
    allowed: ["instructor"],
    check: (r) => expect(r.review).toMatchObject({ version: 2, totalPoints: 12 }),
    denied: onlyFor("instructor"),
  }),
];

/** Strangers to the submission: each read or write of it and its review is refused, with the code. */
export function placementStrangerCases(schoolManager: () => Viewer | null): { name: string; run: () => Promise<void> }[] {
  const s = () => stranger!;
  return [
    {
      name: "another apprentice sees only their own attempts and cannot open the submission",
      run: async () => {
        const mine = await getMyBrief(s().apprentice, KICK);
        expect(mine).toMatchObject({ ok: true, detail: { attempts: [] } });
        expect(await getReviewView(s().apprentice, submissionId)).toMatchObject({ ok: false, code: "forbidden" });
      },
    },
    {
      name: "another class's instructor finds neither the submission nor its review, nor sees it queued",
      run: async () => {
        expect(await getReviewView(s().instructor, submissionId)).toMatchObject({ ok: false, code: "not_found" });
        expect(await saveReviewDraft(s().instructor, { submissionId, version: 2, scores: {} })).toMatchObject({ ok: false, code: "not_found" });
        expect(await finalizeReview(s().instructor, { submissionId, version: 2, scores: SCORES, decision: "redo", comment: "x" })).toMatchObject({ ok: false, code: "not_found" });
        const queue = await listReviewQueue(s().instructor, { status: "all" });
        expect(queue.ok && queue.queue.items.some((i) => i.submissionId === submissionId)).toBe(false);
      },
    },
    {
      name: "the school's manager and a visitor are refused",
      run: async () => {
        expect(await getReviewView(schoolManager(), submissionId)).toMatchObject({ ok: false, code: "forbidden" });
        expect(await getMyBrief(schoolManager(), KICK)).toMatchObject({ ok: false, code: "forbidden" });
        expect(await getReviewView(null, submissionId)).toMatchObject({ ok: false, code: "not_signed_in" });
        expect(await getMyBrief(null, KICK)).toMatchObject({ ok: false, code: "not_signed_in" });
      },
    },
  ];
}
