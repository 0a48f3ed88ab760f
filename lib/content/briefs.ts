import "server-only";
// Placement briefs (content/briefs/*.json), read once per process and checked against the
// lessons (lib/content/brief-checks.ts). Invalid briefs are an error here as in
// `npm run content:check`, so no build ships one.
import fs from "node:fs/promises";
import path from "node:path";
import type { Brief } from "./brief-schema";
import { checkBriefFiles, type BriefFile } from "./brief-checks";
import { listAllLessons, listCourses } from "./index";

export type { Brief, RubricCriterion, SafetyNote } from "./brief-schema";

/** A brief with the titles of its lesson and course, for pages and mail. */
export type BriefEntry = Brief & { lessonTitle: string; courseTitle: string };

const BRIEFS_DIR = path.join(process.cwd(), "content", "briefs");

let cached: Promise<BriefEntry[]> | undefined;

/** The brief files under a folder, named relative to the working directory as the content check prints them. */
export async function readBriefFiles(dir = BRIEFS_DIR): Promise<BriefFile[]> {
  let names: string[];
  try {
    names = (await fs.readdir(dir)).filter((n) => n.endsWith(".json")).sort();
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw err;
  }
  return Promise.all(names.map(async (n) => ({ file: path.relative(process.cwd(), path.join(dir, n)), text: await fs.readFile(path.join(dir, n), "utf8") })));
}

async function load(): Promise<BriefEntry[]> {
  const [files, lessons, courses] = await Promise.all([readBriefFiles(), listAllLessons(), listCourses()]);
  const { briefs, problems } = checkBriefFiles(files, new Map(lessons.map((l) => [l.id, l.courseSlug])));
  if (problems.length > 0) {
    const lines = problems.slice(0, 20).map((p) => `  ${p.file}:${p.line} ${p.message}`);
    throw new Error(`content/briefs has ${problems.length} problem(s); run npm run content:check\n${lines.join("\n")}`);
  }
  const lessonTitle = new Map(lessons.map((l) => [l.id, l.title]));
  const courseTitle = new Map(courses.map((c) => [c.slug, c.title]));
  return briefs.map((b) => ({ ...b, lessonTitle: lessonTitle.get(b.lessonId)!, courseTitle: courseTitle.get(b.courseSlug)! }));
}

/** Every placement brief, by course then order. */
export async function listBriefs(): Promise<BriefEntry[]> {
  // In development a changed file should show without a restart; elsewhere read once.
  if (!cached || process.env.NODE_ENV === "development") {
    cached = load();
    cached.catch(() => {
      cached = undefined;
    });
  }
  return cached;
}

export async function briefById(id: string): Promise<BriefEntry | null> {
  return (await listBriefs()).find((b) => b.id === id) ?? null;
}

/** The briefs of one course, in order (the certificates rule counts them). */
export async function briefsOfCourse(courseSlug: string): Promise<BriefEntry[]> {
  return (await listBriefs()).filter((b) => b.courseSlug === courseSlug);
}
