/**
 * Axisline's question-bank format (our own design), as zod schemas. A bank is a plain
 * JSON-friendly object stored under content/ as .json or .ts and checked by these schemas.
 *
 * Every question kind says which QTI 3.0 interaction it corresponds to (1EdTech QTI 3.0,
 * namespace http://www.imsglobal.org/xsd/imsqtiasi_v3p0), so an export to QTI stays possible.
 * Objects are strict: an unknown key (usually a typo in a key field) is an error.
 */
import "@/lib/validation/zod-in-browser";
import { z } from "zod";
import { GENERATOR_CATALOG, GENERATOR_NAMES, templatePlaceholders } from "./generated";
import { inputRangeSchema } from "./random";
import { UNIT_IDS } from "./units";

/** Ids are short, URL-safe and case-sensitive: "q-comb-01", "kick.inside". */
export const idSchema = z
  .string()
  .max(100)
  .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, "use letters, digits, '.', '_' or '-'");

export const unitIdSchema = z.enum(UNIT_IDS);

const textSchema = z.string().trim().min(1);

const choiceSchema = z.strictObject({ id: idSchema, text: textSchema });

export type Choice = z.infer<typeof choiceSchema>;

/** Fields every question has, whatever its kind. */
const commonFields = {
  id: idSchema,
  /** Short topic label; a learner's wrong answers are grouped by it into "topics to revisit". */
  topic: textSchema,
  prompt: textSchema,
  /** Shown after submission (never before: it is stripped from the client view). */
  explanation: textSchema,
  /** Weight in the attempt's total; default 1. */
  points: z.number().positive().default(1),
};

/**
 * How close a numeric answer must be, after conversion to the key's unit:
 * - absolute: |given − key| ≤ amount, the amount in the key's unit;
 * - relative: |given − key| ≤ percent/100 · |key|.
 */
export const toleranceSchema = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("absolute"), amount: z.number().nonnegative() }),
  z.strictObject({ type: z.literal("relative"), percent: z.number().nonnegative().max(100) }),
]);

export type Tolerance = z.infer<typeof toleranceSchema>;

type IssueContext = { addIssue(issue: { code: "custom"; message: string; path: PropertyKey[] }): void };

function firstDuplicate(ids: readonly string[]): string | undefined {
  const seen = new Set<string>();
  for (const id of ids) {
    if (seen.has(id)) return id;
    seen.add(id);
  }
  return undefined;
}

function requireUniqueIds(ids: readonly string[], path: PropertyKey[], ctx: IssueContext): void {
  const duplicate = firstDuplicate(ids);
  if (duplicate !== undefined) ctx.addIssue({ code: "custom", message: `duplicate id "${duplicate}"`, path });
}

function requireKnownIds(ids: readonly string[], known: readonly string[], path: PropertyKey[], ctx: IssueContext) {
  const knownSet = new Set(known);
  ids.forEach((id, index) => {
    if (!knownSet.has(id)) ctx.addIssue({ code: "custom", message: `unknown id "${id}"`, path: [...path, index] });
  });
}

/**
 * One correct option among several.
 * QTI 3.0: `qti-choice-interaction` with max-choices="1", response cardinality single, base-type identifier.
 * `shuffle` (default true) lets the client view reorder the options per attempt; set it to
 * false when the order carries meaning (values in ascending order, "none of these" last).
 */
export const singleQuestionSchema = z
  .strictObject({
    kind: z.literal("single"),
    ...commonFields,
    options: z.array(choiceSchema).min(2),
    correctOptionId: idSchema,
    shuffle: z.boolean().optional(),
  })
  .superRefine((question, ctx) => {
    const optionIds = question.options.map((option) => option.id);
    requireUniqueIds(optionIds, ["options"], ctx);
    requireKnownIds([question.correctOptionId], optionIds, ["correctOptionId"], ctx);
  });

/**
 * Several correct options; the learner ticks any number.
 * QTI 3.0: `qti-choice-interaction` with max-choices > 1 (or 0 = unlimited), cardinality multiple.
 * Partial credit: score = max(0, (correct picks − wrong picks) / number of correct options);
 * `correct` only when the picked set equals the key exactly. Ticking everything therefore
 * earns (c − w)/c, not full marks.
 */
export const multipleQuestionSchema = z
  .strictObject({
    kind: z.literal("multiple"),
    ...commonFields,
    options: z.array(choiceSchema).min(2),
    correctOptionIds: z.array(idSchema).min(1),
    shuffle: z.boolean().optional(),
  })
  .superRefine((question, ctx) => {
    const optionIds = question.options.map((option) => option.id);
    requireUniqueIds(optionIds, ["options"], ctx);
    requireUniqueIds(question.correctOptionIds, ["correctOptionIds"], ctx);
    requireKnownIds(question.correctOptionIds, optionIds, ["correctOptionIds"], ctx);
  });

/**
 * A number with a unit, typed by the learner.
 * QTI 3.0: `qti-text-entry-interaction` with a response of base-type float (the unit is a
 * second, identifier-typed response in an export).
 * `answer` is in `unit`; an answer in any other unit of the same quantity (mm for m, °F for °C)
 * is converted to `unit` before the tolerance is applied.
 */
export const numericQuestionSchema = z.strictObject({
  kind: z.literal("numeric"),
  ...commonFields,
  answer: z.number(),
  unit: unitIdSchema,
  tolerance: toleranceSchema,
});

/**
 * A numeric question whose numbers are drawn per attempt. `generator` names one of the
 * registered acoustics generators (see generated.ts); `ranges` gives {min, max, step} for each
 * of its inputs; `prompt` is a template whose "{inputName}" placeholders are filled with the
 * drawn values. The key is computed by the generator, in its unit, and compared as `numeric`.
 * QTI 3.0: `qti-text-entry-interaction`, base-type float; QTI's template variables (template
 * declarations plus template processing) are the nearest counterpart of our ranges [from memory].
 */
export const generatedQuestionSchema = z
  .strictObject({
    kind: z.literal("generated"),
    ...commonFields,
    generator: z.enum(GENERATOR_NAMES),
    ranges: z.record(z.string(), inputRangeSchema),
    tolerance: toleranceSchema,
  })
  .superRefine((question, ctx) => {
    const expected: readonly string[] = GENERATOR_CATALOG[question.generator].inputs;
    const given = Object.keys(question.ranges);
    for (const input of expected) {
      if (!given.includes(input)) {
        ctx.addIssue({ code: "custom", message: `missing range for input "${input}"`, path: ["ranges"] });
      }
    }
    for (const input of given) {
      if (!expected.includes(input)) {
        ctx.addIssue({ code: "custom", message: `"${input}" is not an input of ${question.generator}`, path: ["ranges", input] });
      }
    }
    const domain: Readonly<Record<string, readonly [number, number]>> = GENERATOR_CATALOG[question.generator].domain;
    for (const input of expected) {
      const range = question.ranges[input];
      const [low, high] = domain[input];
      if (range && (range.min < low || range.max > high)) {
        ctx.addIssue({ code: "custom", message: `range for "${input}" must lie within ${low} to ${high}`, path: ["ranges", input] });
      }
    }
    for (const placeholder of templatePlaceholders(question.prompt)) {
      if (!expected.includes(placeholder)) {
        ctx.addIssue({ code: "custom", message: `unknown placeholder "{${placeholder}}"`, path: ["prompt"] });
      }
    }
  });

/**
 * Put items in order (a signal chain, a line-check routine).
 * QTI 3.0: `qti-order-interaction` (on a diagram: `qti-graphic-order-interaction`).
 * All-or-nothing: score 1 only if the submitted order is identical to `correctOrder`, else 0.
 */
export const orderingQuestionSchema = z
  .strictObject({
    kind: z.literal("ordering"),
    ...commonFields,
    items: z.array(choiceSchema).min(2),
    correctOrder: z.array(idSchema),
  })
  .superRefine((question, ctx) => {
    const itemIds = question.items.map((item) => item.id);
    requireUniqueIds(itemIds, ["items"], ctx);
    requireUniqueIds(question.correctOrder, ["correctOrder"], ctx);
    requireKnownIds(question.correctOrder, itemIds, ["correctOrder"], ctx);
    if (question.correctOrder.length !== itemIds.length) {
      ctx.addIssue({ code: "custom", message: "correctOrder must list every item once", path: ["correctOrder"] });
    }
  });

/**
 * Pair each left item with one right item (connector ↔ use). Every left item has exactly one
 * partner in `correctPairs`; the right column may hold extra distractors and a right item may
 * be the partner of more than one left item.
 * QTI 3.0: `qti-match-interaction`.
 * Partial credit: score = fraction of left items paired correctly.
 */
export const matchingQuestionSchema = z
  .strictObject({
    kind: z.literal("matching"),
    ...commonFields,
    left: z.array(choiceSchema).min(2),
    right: z.array(choiceSchema).min(2),
    correctPairs: z.record(idSchema, idSchema),
  })
  .superRefine((question, ctx) => {
    const leftIds = question.left.map((item) => item.id);
    const rightIds = question.right.map((item) => item.id);
    requireUniqueIds(leftIds, ["left"], ctx);
    requireUniqueIds(rightIds, ["right"], ctx);
    requireKnownIds(Object.keys(question.correctPairs), leftIds, ["correctPairs"], ctx);
    requireKnownIds(Object.values(question.correctPairs), rightIds, ["correctPairs"], ctx);
    for (const leftId of leftIds) {
      if (!Object.hasOwn(question.correctPairs, leftId)) {
        ctx.addIssue({ code: "custom", message: `left item "${leftId}" has no partner`, path: ["correctPairs"] });
      }
    }
  });

/** Region shapes in the diagram's viewBox units (x to the right, y downwards, as in SVG). */
export const regionShapeSchema = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("circle"), cx: z.number(), cy: z.number(), r: z.number().positive() }),
  z.strictObject({
    type: z.literal("rect"),
    x: z.number(),
    y: z.number(),
    w: z.number().positive(),
    h: z.number().positive(),
  }),
]);

export type RegionShape = z.infer<typeof regionShapeSchema>;

const regionSchema = z.strictObject({ id: idSchema, label: textSchema, shape: regionShapeSchema });

/**
 * Point at the right place on one of our SVG diagrams (a polar plot's null, a stage-box input).
 * `diagram` is the id of the diagram component. The learner either clicks a point or, from the
 * keyboard, picks a region by its label; both are graded by region.
 * QTI 3.0: `qti-hotspot-interaction` (region pick); a raw point answer is what
 * `qti-select-point-interaction` collects.
 * A point is graded by the first region, in listed order, that contains it, so list small
 * regions before the larger regions that surround them. A point in no region scores 0.
 */
export const hotspotQuestionSchema = z
  .strictObject({
    kind: z.literal("hotspot"),
    ...commonFields,
    diagram: idSchema,
    regions: z.array(regionSchema).min(2),
    correctRegionIds: z.array(idSchema).min(1),
  })
  .superRefine((question, ctx) => {
    const regionIds = question.regions.map((region) => region.id);
    requireUniqueIds(regionIds, ["regions"], ctx);
    requireUniqueIds(question.correctRegionIds, ["correctRegionIds"], ctx);
    requireKnownIds(question.correctRegionIds, regionIds, ["correctRegionIds"], ctx);
  });

export const questionSchema = z.discriminatedUnion("kind", [
  singleQuestionSchema,
  multipleQuestionSchema,
  numericQuestionSchema,
  generatedQuestionSchema,
  orderingQuestionSchema,
  matchingQuestionSchema,
  hotspotQuestionSchema,
]);

/** A question after parsing (defaults applied). */
export type Question = z.output<typeof questionSchema>;
/** A question as an author writes it (points may be left out). */
export type QuestionInput = z.input<typeof questionSchema>;
export type QuestionKind = Question["kind"];
export type QuestionOfKind<K extends QuestionKind> = Extract<Question, { kind: K }>;

export const bankSettingsSchema = z.strictObject({
  passingPercent: z.number().min(0).max(100),
  attemptsAllowed: z.number().int().min(1),
  /** null = untimed. A timed quiz must offer more time on request (WCAG 2.2 SC 2.2.1). */
  timeLimitMinutes: z.number().positive().nullable(),
  showCorrectAnswers: z.boolean(),
  shuffleQuestions: z.boolean(),
});

export type BankSettings = z.infer<typeof bankSettingsSchema>;

export const questionBankSchema = z
  .strictObject({
    id: idSchema,
    title: textSchema,
    /** null: the bank is the course's final quiz rather than a module quiz. */
    moduleId: idSchema.nullable(),
    courseId: idSchema,
    settings: bankSettingsSchema,
    questions: z.array(questionSchema).min(1),
  })
  .superRefine((bank, ctx) => {
    requireUniqueIds(
      bank.questions.map((question) => question.id),
      ["questions"],
      ctx,
    );
  });

export type QuestionBank = z.output<typeof questionBankSchema>;
export type QuestionBankInput = z.input<typeof questionBankSchema>;
