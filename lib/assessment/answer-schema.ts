/**
 * What a browser may send as its answer to one question, per kind. Parse with these before
 * grading: the grader trusts the shape (not the content) of what it is given.
 */
import { z } from "zod";
import { idSchema, unitIdSchema } from "./question-schema";

const MAX_LIST = 200; // far above any real question; stops oversized payloads early

export const singleAnswerSchema = z.strictObject({ kind: z.literal("single"), optionId: idSchema });

export const multipleAnswerSchema = z.strictObject({
  kind: z.literal("multiple"),
  optionIds: z.array(idSchema).max(MAX_LIST),
});

/** `unit` may be left out: the value is then read in the question's own unit. */
const quantityFields = { value: z.number(), unit: unitIdSchema.optional() };

export const numericAnswerSchema = z.strictObject({ kind: z.literal("numeric"), ...quantityFields });

export const generatedAnswerSchema = z.strictObject({ kind: z.literal("generated"), ...quantityFields });

export const orderingAnswerSchema = z.strictObject({
  kind: z.literal("ordering"),
  order: z.array(idSchema).max(MAX_LIST),
});

export const matchingAnswerSchema = z.strictObject({
  kind: z.literal("matching"),
  /** leftId → rightId; left items left unpaired simply score nothing. */
  pairs: z.record(idSchema, idSchema),
});

/** A click (diagram viewBox units) or, from the keyboard, a region chosen by its label. */
export const hotspotPickSchema = z.discriminatedUnion("by", [
  z.strictObject({ by: z.literal("point"), x: z.number(), y: z.number() }),
  z.strictObject({ by: z.literal("region"), regionId: idSchema }),
]);

export const hotspotAnswerSchema = z.strictObject({ kind: z.literal("hotspot"), pick: hotspotPickSchema });

export const answerSchema = z.discriminatedUnion("kind", [
  singleAnswerSchema,
  multipleAnswerSchema,
  numericAnswerSchema,
  generatedAnswerSchema,
  orderingAnswerSchema,
  matchingAnswerSchema,
  hotspotAnswerSchema,
]);

/** A whole submission: question id → answer; unanswered questions are simply absent. */
export const attemptAnswersSchema = z.record(idSchema, answerSchema);

export type Answer = z.infer<typeof answerSchema>;
export type AnswerOfKind<K extends Answer["kind"]> = Extract<Answer, { kind: K }>;
export type AttemptAnswers = z.infer<typeof attemptAnswersSchema>;
export type HotspotPick = z.infer<typeof hotspotPickSchema>;
