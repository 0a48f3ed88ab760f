// Zod schemas for the content contract (content/courses/**/course.json, lesson frontmatter,
// content/glossary.json). Pure: no filesystem, safe to import anywhere.
import "@/lib/validation/zod-in-browser";
import { z } from "zod";

const kebab = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;
const slug = z.string().regex(kebab, "use lower-case kebab-case");

export const COURSE_LEVELS = ["foundation", "intermediate", "advanced"] as const;
export type CourseLevel = (typeof COURSE_LEVELS)[number];

/**
 * Safety topics a lesson can touch; each gets the usual cautions in the body: a caution or danger
 * <Callout hazard="<topic>"> that defers to local codes, venue rules or licensed practice
 * (lib/content/safety-checks.ts). "work-at-height" is ladders and access equipment,
 * "outdoor-weather" wind and rain on outdoor stands, "manual-handling" lifting and carrying.
 */
export const SAFETY_TOPICS = ["hearing", "electrical", "phantom-power", "stands-overhead", "cable-runs", "manual-handling", "work-at-height", "outdoor-weather"] as const;
export type SafetyTopic = (typeof SAFETY_TOPICS)[number];

export const moduleSchema = z.strictObject({
  id: z.string().regex(/^mod-[a-z0-9-]+$/, 'module id must look like "mod-<slug>"'),
  slug,
  title: z.string().min(1),
  summary: z.string().min(1),
  order: z.number().int().positive(),
});

export const courseSchema = z
  .strictObject({
    id: z.string().regex(/^course-[a-z0-9-]+$/, 'course id must look like "course-<slug>"'),
    slug,
    title: z.string().min(1),
    summary: z.string().min(1),
    level: z.enum(COURSE_LEVELS),
    outcomes: z.array(z.string().min(1)).min(3).max(6),
    version: z.string().regex(/^\d+\.\d+\.\d+$/, "version must be semver, e.g. 1.0.0"),
    order: z.number().int().positive(),
    modules: z.array(moduleSchema).min(1),
  })
  .superRefine((course, ctx) => {
    if (course.id !== `course-${course.slug}`) ctx.addIssue({ code: "custom", path: ["id"], message: `id must be "course-${course.slug}"` });
    const slugs = new Set<string>();
    const orders = new Set<number>();
    course.modules.forEach((m, index) => {
      if (slugs.has(m.slug)) ctx.addIssue({ code: "custom", path: ["modules", index, "slug"], message: `duplicate module slug "${m.slug}"` });
      if (orders.has(m.order)) ctx.addIssue({ code: "custom", path: ["modules", index, "order"], message: `duplicate module order ${m.order}` });
      slugs.add(m.slug);
      orders.add(m.order);
    });
  });

export type CourseFile = z.infer<typeof courseSchema>;
export type ModuleFile = z.infer<typeof moduleSchema>;

export const lessonFrontmatterSchema = z.strictObject({
  id: z.string().regex(/^les-[a-z0-9]+(?:-[a-z0-9]+)*$/, 'lesson id must look like "les-<short-kebab-id>"'),
  title: z.string().min(1),
  summary: z.string().min(1),
  objectives: z.array(z.string().min(1)).min(2).max(5),
  /** Estimated reading + figure time, minutes. */
  minutes: z.number().int().positive().max(120),
  order: z.number().int().positive(),
  preview: z.boolean(),
  safety: z.array(z.enum(SAFETY_TOPICS)),
  /** Names of the <Figure>/<Diagram> used in the body, exactly as used. */
  figures: z.array(slug),
});

export type LessonFrontmatter = z.infer<typeof lessonFrontmatterSchema>;

export const glossaryEntrySchema = z.strictObject({
  id: slug,
  term: z.string().min(1),
  definition: z.string().min(1),
  seeAlso: z.array(slug).default([]),
});

export const glossarySchema = z.array(glossaryEntrySchema).superRefine((entries, ctx) => {
  const ids = new Set(entries.map((e) => e.id));
  const seen = new Set<string>();
  entries.forEach((entry, index) => {
    if (seen.has(entry.id)) ctx.addIssue({ code: "custom", path: [index, "id"], message: `duplicate glossary id "${entry.id}"` });
    seen.add(entry.id);
    entry.seeAlso.forEach((other, j) => {
      if (!ids.has(other)) ctx.addIssue({ code: "custom", path: [index, "seeAlso", j], message: `seeAlso "${other}" is not a glossary id` });
      if (other === entry.id) ctx.addIssue({ code: "custom", path: [index, "seeAlso", j], message: "an entry cannot see itself" });
    });
  });
});

export type GlossaryEntry = z.infer<typeof glossaryEntrySchema>;

/** "modules.2.slug: duplicate module slug" — one line per zod issue. */
export function issueLines(error: z.ZodError): string[] {
  return error.issues.map((issue) => `${issue.path.length > 0 ? issue.path.join(".") + ": " : ""}${issue.message}`);
}
