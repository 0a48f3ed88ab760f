/**
 * What a browser may send as its answer to one question, per kind. Parse with these before
 * grading: the grader trusts the shape (not the content) of what it is given. `answerSchemaFor`
 * then holds an answer to the question as it was shown: only its own choice ids, a point only
 * inside its picture.
 */
import "@/lib/validation/zod-in-browser";
import { z } from "zod";
import type { ClientQuestion } from "./client-view";
import { idSchema, unitIdSchema } from "./question-schema";

const MAX_LIST = 200; // far above any real question; stops oversized payloads early

/** Names that reach an object's prototype machinery when used as a key (OWASP: prototype pollution). */
const PROTOTYPE_KEYS: ReadonlySet<string> = new Set(["__proto__", "constructor", "prototype"]);

/** An id used as an object key: never one of the prototype names. */
const keyIdSchema = idSchema.refine((id) => !PROTOTYPE_KEYS.has(id), { message: "not allowed as a key" });

/**
 * A map keyed by ids with at most MAX_LIST entries. The check runs on the raw object first:
 * a record parse may skip a "__proto__" key instead of reporting it.
 */
function idRecord<V extends z.ZodType>(values: V) {
  return z
    .custom<Record<string, unknown>>(
      (raw) =>
        typeof raw === "object" &&
        raw !== null &&
        !Array.isArray(raw) &&
        Object.keys(raw).length <= MAX_LIST &&
        Object.keys(raw).every((key) => !PROTOTYPE_KEYS.has(key)),
      { message: `a map of at most ${MAX_LIST} ids` },
    )
    .pipe(z.record(keyIdSchema, values));
}

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
  pairs: idRecord(idSchema),
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
export const attemptAnswersSchema = idRecord(answerSchema);

/** The picture a hotspot question is drawn on, in its viewBox units (origin top left). */
export type ImageBounds = { width: number; height: number };

type Issue = { addIssue(issue: { code: "custom"; message: string; path?: PropertyKey[] }): void };

function allKnown(ids: readonly string[], known: readonly string[], what: string, ctx: Issue, path: PropertyKey[]) {
  const set = new Set(known);
  if (ids.some((id) => !set.has(id))) ctx.addIssue({ code: "custom", message: `not one of this question's ${what}`, path });
  if (new Set(ids).size !== ids.length) ctx.addIssue({ code: "custom", message: `${what} repeated`, path });
}

/**
 * An answer to one question as the attempt showed it (its presented ids): the kind must match,
 * every id must be one of the question's, and a clicked point must lie inside the picture
 * (`imageBounds`; without them only a region may be picked).
 */
export function answerSchemaFor(question: ClientQuestion, limits: { imageBounds?: ImageBounds } = {}) {
  return answerSchema.superRefine((answer, ctx) => {
    if (answer.kind !== question.kind) {
      ctx.addIssue({ code: "custom", message: "the answer is for another kind of question", path: ["kind"] });
      return;
    }
    if ((answer.kind === "single" || answer.kind === "multiple") && (question.kind === "single" || question.kind === "multiple")) {
      const ids = answer.kind === "single" ? [answer.optionId] : answer.optionIds;
      allKnown(ids, question.options.map((o) => o.id), "options", ctx, ["options"]);
    } else if (answer.kind === "ordering" && question.kind === "ordering") {
      allKnown(answer.order, question.items.map((i) => i.id), "items", ctx, ["order"]);
    } else if (answer.kind === "matching" && question.kind === "matching") {
      allKnown(Object.keys(answer.pairs), question.left.map((c) => c.id), "items to match", ctx, ["pairs"]);
      const right = new Set(question.right.map((c) => c.id));
      if (Object.values(answer.pairs).some((id) => !right.has(id))) ctx.addIssue({ code: "custom", message: "not one of this question's matches", path: ["pairs"] });
    } else if (answer.kind === "hotspot" && question.kind === "hotspot") {
      const { pick } = answer;
      if (pick.by === "region") {
        allKnown([pick.regionId], question.regions.map((r) => r.id), "positions", ctx, ["pick", "regionId"]);
      } else {
        const bounds = limits.imageBounds;
        const inside = bounds !== undefined && pick.x >= 0 && pick.y >= 0 && pick.x <= bounds.width && pick.y <= bounds.height;
        if (!inside) ctx.addIssue({ code: "custom", message: "the point is outside the picture", path: ["pick"] });
      }
    }
  });
}

export type Answer = z.infer<typeof answerSchema>;
export type AnswerOfKind<K extends Answer["kind"]> = Extract<Answer, { kind: K }>;
export type AttemptAnswers = z.infer<typeof attemptAnswersSchema>;
export type HotspotPick = z.infer<typeof hotspotPickSchema>;
