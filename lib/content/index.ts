import "server-only";
// The content loaders: the only way the app reads content/. Invalid content is a build error
// (run `npm run content:check` for the full list with file and line).
import fs from "node:fs/promises";
import path from "node:path";
import type { GlossaryLookup } from "./mdx-pipeline";
import { readContent, type ContentIndex, type Course, type LessonMeta, type LessonSource } from "./read";
import type { GlossaryEntry } from "./schemas";

export type { ContentIndex, ContentProblem, Course, CourseModule, LessonMeta, LessonSource } from "./read";
export { lessonHref } from "./read";
export type { GlossaryEntry, CourseLevel, SafetyTopic } from "./schemas";
export type { Heading } from "./mdx-pipeline";

const CONTENT_DIR = path.join(process.cwd(), "content");

let cached: { signature: string; index: Promise<ContentIndex> } | undefined;

/** Names, sizes and modification times of every file under content/: changes when any file does. */
async function signatureOf(dir: string): Promise<string> {
  const entries = await fs.readdir(dir, { withFileTypes: true, recursive: true });
  const parts = await Promise.all(
    entries
      .filter((e) => e.isFile())
      .map(async (e) => {
        const file = path.join(e.parentPath, e.name);
        const stat = await fs.stat(file);
        return `${file}:${stat.size}:${stat.mtimeMs}`;
      }),
  );
  return parts.sort().join("|");
}

/** Reads content/ once per process; in development again whenever a file changes, so edits show up. */
async function content(): Promise<ContentIndex> {
  const signature = process.env.NODE_ENV === "development" ? await signatureOf(CONTENT_DIR) : "build";
  if (!cached || cached.signature !== signature) {
    const index = readContent(CONTENT_DIR).then((index) => {
      if (index.problems.length > 0) {
        const lines = index.problems.slice(0, 20).map((p) => `  ${p.file}:${p.line} ${p.message}`);
        throw new Error(`content/ has ${index.problems.length} problem(s); run npm run content:check\n${lines.join("\n")}`);
      }
      return index;
    });
    index.catch(() => {
      cached = undefined;
    });
    cached = { signature, index };
  }
  return cached.index;
}

export async function listCourses(): Promise<Course[]> {
  return (await content()).courses;
}

export async function getCourse(slug: string): Promise<Course | null> {
  return (await content()).courses.find((c) => c.slug === slug) ?? null;
}

/** A course's lessons in syllabus order (module order, then lesson order). */
export async function listLessons(courseSlug: string): Promise<LessonMeta[]> {
  const course = await getCourse(courseSlug);
  return course ? course.modules.flatMap((m) => m.lessons) : [];
}

/** One lesson with its MDX body, or null when the course has no such lesson. */
export async function getLesson(courseSlug: string, lessonId: string): Promise<LessonSource | null> {
  const lesson = (await content()).lessons.get(lessonId);
  return lesson && lesson.courseSlug === courseSlug ? lesson : null;
}

/** Every lesson of every course, for static params and the search index. */
export async function listAllLessons(): Promise<LessonSource[]> {
  return [...(await content()).lessons.values()];
}

export async function getGlossary(): Promise<GlossaryEntry[]> {
  return (await content()).glossary;
}

export async function glossaryLookup(): Promise<GlossaryLookup> {
  return new Map((await getGlossary()).map((e) => [e.id, { term: e.term, definition: e.definition }]));
}

export type LessonNeighbours = { previous: LessonMeta | null; next: LessonMeta | null };

export async function lessonNeighbours(courseSlug: string, lessonId: string): Promise<LessonNeighbours> {
  const lessons = await listLessons(courseSlug);
  const index = lessons.findIndex((l) => l.id === lessonId);
  if (index < 0) return { previous: null, next: null };
  return { previous: lessons[index - 1] ?? null, next: lessons[index + 1] ?? null };
}
