// The placement brief contract (content/briefs/<id>.json): a photo assignment attached to a
// lesson, with what to photograph, a rubric and safety notes. Pure: no filesystem, safe anywhere.
// Cross-file rules (the lesson exists in that course, ids unique, safety wording) are in
// brief-checks.ts.
import "@/lib/validation/zod-in-browser";
import { z } from "zod";
import { SAFETY_TOPICS } from "./schemas";

const text = z.string().trim().min(1);
const kebab = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** One level of a rubric criterion: what the instructor sees in the photo, and what it is worth. */
export const rubricLevelSchema = z.strictObject({
  points: z.number().int().min(0).max(10),
  label: text.max(40),
  descriptor: text.max(400),
});

export const rubricCriterionSchema = z
  .strictObject({
    id: z.string().regex(kebab, "use lower-case kebab-case"),
    title: text.max(80),
    /** Highest points first; the lowest level is worth 0 (nothing of it seen in the photos). */
    levels: z.array(rubricLevelSchema).min(2).max(5),
  })
  .superRefine((c, ctx) => {
    c.levels.forEach((level, i) => {
      if (i > 0 && level.points >= c.levels[i - 1].points) ctx.addIssue({ code: "custom", path: ["levels", i, "points"], message: "levels go from the most points to the fewest, each fewer than the one before" });
    });
    if (c.levels.at(-1)?.points !== 0) ctx.addIssue({ code: "custom", path: ["levels"], message: "the last level is worth 0 points" });
  });

export const shotSchema = z.strictObject({
  title: text.max(80),
  /** Where the camera stands and what the frame must hold. */
  angle: text.max(400),
});

export const safetyNoteSchema = z.strictObject({
  hazard: z.enum(SAFETY_TOPICS),
  /** Our own words; must defer to local codes, venue rules or licensed practice (brief-checks.ts). */
  text: text.max(600),
});

export const briefSchema = z
  .strictObject({
    id: z.string().regex(/^brief-[a-z0-9]+(?:-[a-z0-9]+)*$/, 'brief id must look like "brief-<short-kebab-id>"'),
    title: text.max(100),
    courseSlug: z.string().regex(kebab),
    lessonId: z.string().regex(/^les-[a-z0-9-]+$/),
    /** Order among the briefs of the course. */
    order: z.number().int().positive(),
    summary: text.max(300),
    /** The scene in the Lantern Room scenario the brief is set in. */
    setting: text.max(800),
    /** What the apprentice sets up, step by step. */
    task: z.array(text.max(400)).min(2).max(8),
    photos: z.strictObject({
      min: z.number().int().min(1).max(6),
      max: z.number().int().min(1).max(6),
      shots: z.array(shotSchema).min(1).max(6),
      /** What the tape measure (or a length of cable) in the frame must show. */
      measure: text.max(400),
    }),
    rubric: z.array(rubricCriterionSchema).min(2).max(6),
    safety: z.array(safetyNoteSchema).min(1).max(6),
  })
  .superRefine((b, ctx) => {
    if (b.photos.min > b.photos.max) ctx.addIssue({ code: "custom", path: ["photos", "min"], message: "min photos is more than max" });
    if (b.photos.shots.length > b.photos.max) ctx.addIssue({ code: "custom", path: ["photos", "shots"], message: "more shots asked for than photos allowed" });
    const ids = new Set<string>();
    b.rubric.forEach((c, i) => {
      if (ids.has(c.id)) ctx.addIssue({ code: "custom", path: ["rubric", i, "id"], message: `duplicate criterion id "${c.id}"` });
      ids.add(c.id);
    });
  });

export type Brief = z.infer<typeof briefSchema>;
export type RubricCriterion = z.infer<typeof rubricCriterionSchema>;
export type SafetyNote = z.infer<typeof safetyNoteSchema>;
