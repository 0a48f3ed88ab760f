import "server-only";
// Reads content/ from disk into a checked index. Never throws for bad content: every problem is
// collected with its file and line, so the loaders can refuse and the content check can list them.
import fs from "node:fs/promises";
import path from "node:path";
import { FrontmatterError, splitFrontmatter } from "./frontmatter";
import { countWords, plainText } from "./mdast";
import { collectHeadings, parseLessonBody, type Heading } from "./mdx-pipeline";
import {
  courseSchema,
  glossarySchema,
  issueLines,
  lessonFrontmatterSchema,
  type CourseFile,
  type GlossaryEntry,
  type LessonFrontmatter,
  type ModuleFile,
} from "./schemas";

export type ContentProblem = { file: string; line: number; message: string };

export type LessonMeta = LessonFrontmatter & {
  courseSlug: string;
  moduleSlug: string;
  /** Path relative to the project root, for messages. */
  file: string;
  href: string;
  headings: Heading[];
  /** Words of prose in the body. */
  words: number;
};

export type LessonSource = LessonMeta & {
  body: string;
  bodyStartLine: number;
  /** The body as plain text (for search). */
  text: string;
};

export type CourseModule = ModuleFile & { lessons: LessonMeta[] };

export type Course = Omit<CourseFile, "modules"> & {
  file: string;
  modules: CourseModule[];
  lessonCount: number;
  minutes: number;
  previewCount: number;
};

export type ContentIndex = {
  courses: Course[];
  lessons: Map<string, LessonSource>;
  /** Every lesson file that parsed, duplicates of an id included (the content check checks them all). */
  allLessons: LessonSource[];
  glossary: GlossaryEntry[];
  problems: ContentProblem[];
};

export const lessonHref = (courseSlug: string, lessonId: string) => `/courses/${courseSlug}/${lessonId}`;

async function readJson(file: string, rel: string, problems: ContentProblem[]): Promise<unknown> {
  try {
    return JSON.parse(await fs.readFile(file, "utf8"));
  } catch (err) {
    problems.push({ file: rel, line: 1, message: `cannot read JSON: ${(err as Error).message}` });
    return undefined;
  }
}

async function readGlossary(root: string, relRoot: string, problems: ContentProblem[]): Promise<GlossaryEntry[]> {
  const rel = path.join(relRoot, "glossary.json");
  const raw = await readJson(path.join(root, "glossary.json"), rel, problems);
  if (raw === undefined) return [];
  const parsed = glossarySchema.safeParse(raw);
  if (!parsed.success) {
    for (const message of issueLines(parsed.error)) problems.push({ file: rel, line: 1, message });
    return [];
  }
  return parsed.data;
}

async function readLesson(file: string, rel: string, course: CourseFile, courseModule: ModuleFile, problems: ContentProblem[]): Promise<LessonSource | null> {
  const source = await fs.readFile(file, "utf8");
  let split;
  try {
    split = splitFrontmatter(source);
  } catch (err) {
    if (err instanceof FrontmatterError) {
      problems.push({ file: rel, line: 1, message: err.message });
      return null;
    }
    throw err;
  }
  const front = lessonFrontmatterSchema.safeParse(split.data);
  if (!front.success) {
    for (const message of issueLines(front.error)) problems.push({ file: rel, line: 2, message: `frontmatter ${message}` });
    return null;
  }
  const prefix = /^(\d+)-/.exec(path.basename(file));
  if (!prefix || Number(prefix[1]) !== front.data.order) {
    problems.push({ file: rel, line: 2, message: `file name prefix must be the lesson order (${String(front.data.order).padStart(2, "0")}-…)` });
  }
  let tree;
  try {
    tree = parseLessonBody(split.body);
  } catch (err) {
    const e = err as Error & { line?: number };
    problems.push({ file: rel, line: (e.line ?? 1) + split.bodyStartLine - 1, message: `MDX does not parse: ${e.message}` });
    return null;
  }
  const text = plainText(tree);
  return {
    ...front.data,
    courseSlug: course.slug,
    moduleSlug: courseModule.slug,
    file: rel,
    href: lessonHref(course.slug, front.data.id),
    headings: collectHeadings(tree),
    words: countWords(text),
    body: split.body,
    bodyStartLine: split.bodyStartLine,
    text,
  };
}

async function readCourse(dir: string, relDir: string, problems: ContentProblem[]): Promise<{ course: Course; lessons: LessonSource[] } | null> {
  const rel = path.join(relDir, "course.json");
  const raw = await readJson(path.join(dir, "course.json"), rel, problems);
  if (raw === undefined) return null;
  const parsed = courseSchema.safeParse(raw);
  if (!parsed.success) {
    for (const message of issueLines(parsed.error)) problems.push({ file: rel, line: 1, message });
    return null;
  }
  const file = parsed.data;
  if (file.slug !== path.basename(dir)) problems.push({ file: rel, line: 1, message: `slug "${file.slug}" must match the folder name "${path.basename(dir)}"` });
  const entries = await fs.readdir(dir, { withFileTypes: true });
  for (const entry of entries) {
    if (entry.isDirectory() && !file.modules.some((m) => m.slug === entry.name)) {
      problems.push({ file: path.join(relDir, entry.name), line: 1, message: "folder is not a module listed in course.json" });
    }
  }
  const modules: CourseModule[] = [];
  const all: LessonSource[] = [];
  for (const courseModule of [...file.modules].sort((a, b) => a.order - b.order)) {
    const moduleDir = path.join(dir, courseModule.slug);
    const names = await fs.readdir(moduleDir).catch(() => null);
    if (!names) {
      problems.push({ file: rel, line: 1, message: `module "${courseModule.slug}" has no folder` });
      continue;
    }
    const lessons: LessonSource[] = [];
    for (const name of names.filter((n) => n.endsWith(".mdx")).sort()) {
      const lesson = await readLesson(path.join(moduleDir, name), path.join(relDir, courseModule.slug, name), file, courseModule, problems);
      if (lesson) lessons.push(lesson);
    }
    lessons.sort((a, b) => a.order - b.order);
    const orders = new Set<number>();
    for (const lesson of lessons) {
      if (orders.has(lesson.order)) problems.push({ file: lesson.file, line: 2, message: `another lesson in "${courseModule.slug}" has order ${lesson.order}` });
      orders.add(lesson.order);
    }
    if (lessons.length === 0) problems.push({ file: rel, line: 1, message: `module "${courseModule.slug}" has no lessons` });
    modules.push({ ...courseModule, lessons: lessons.map(toMeta) });
    all.push(...lessons);
  }
  const { modules: _files, ...rest } = file;
  const course: Course = {
    ...rest,
    file: rel,
    modules,
    lessonCount: all.length,
    minutes: all.reduce((sum, l) => sum + l.minutes, 0),
    previewCount: all.filter((l) => l.preview).length,
  };
  return { course, lessons: all };
}

function toMeta(lesson: LessonSource): LessonMeta {
  const { body: _body, bodyStartLine: _line, text: _text, ...meta } = lesson;
  return meta;
}

/** Reads and checks everything under `root` (default: ./content). */
export async function readContent(root = path.join(process.cwd(), "content")): Promise<ContentIndex> {
  const problems: ContentProblem[] = [];
  const relRoot = path.relative(process.cwd(), root) || "content";
  const glossary = await readGlossary(root, relRoot, problems);
  const coursesDir = path.join(root, "courses");
  const dirs = (await fs.readdir(coursesDir, { withFileTypes: true })).filter((d) => d.isDirectory()).map((d) => d.name).sort();
  const courses: Course[] = [];
  const lessons = new Map<string, LessonSource>();
  const allLessons: LessonSource[] = [];
  for (const name of dirs) {
    const read = await readCourse(path.join(coursesDir, name), path.join(relRoot, "courses", name), problems);
    if (!read) continue;
    courses.push(read.course);
    for (const lesson of read.lessons) {
      allLessons.push(lesson);
      const other = lessons.get(lesson.id);
      if (other) problems.push({ file: lesson.file, line: 2, message: `lesson id "${lesson.id}" is also used by ${other.file}` });
      else lessons.set(lesson.id, lesson);
    }
  }
  courses.sort((a, b) => a.order - b.order);
  return { courses, lessons, allLessons, glossary, problems };
}
