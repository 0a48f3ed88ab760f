/**
 * Pure graders: one per question kind, each returning a score in [0, 1] and whether the
 * answer is fully correct, plus `gradeAttempt` for a whole submission. The partial-credit
 * rule of each kind is documented on its schema in question-schema.ts.
 */
import type { Answer, AnswerOfKind, AttemptAnswers, HotspotPick } from "./answer-schema";
import type { GeneratedValue, GeneratorRegistry } from "./generated";
import type { Question, QuestionKind, QuestionOfKind, RegionShape, Tolerance } from "./question-schema";
import { convertUnit, sameQuantity, type UnitId } from "./units";
import { computeGeneratedKey, drawQuestionInputs } from "./variant";

export interface GradeResult {
  /** Fraction of the question's points earned, 0…1. */
  score: number;
  /** True only for a fully correct answer. */
  correct: boolean;
}

const WRONG: GradeResult = { score: 0, correct: false };

function allOrNothing(correct: boolean): GradeResult {
  return correct ? { score: 1, correct: true } : WRONG;
}

export function gradeSingle(question: QuestionOfKind<"single">, answer: AnswerOfKind<"single">): GradeResult {
  return allOrNothing(answer.optionId === question.correctOptionId);
}

/** max(0, (right picks − wrong picks) / number of correct options); repeated picks count once. */
export function gradeMultiple(question: QuestionOfKind<"multiple">, answer: AnswerOfKind<"multiple">): GradeResult {
  const key = new Set(question.correctOptionIds);
  let rightPicks = 0;
  let wrongPicks = 0;
  for (const optionId of new Set(answer.optionIds)) {
    if (key.has(optionId)) rightPicks++;
    else wrongPicks++; // an id that is not an option at all also counts as a wrong pick
  }
  const score = Math.max(0, (rightPicks - wrongPicks) / key.size);
  return { score, correct: rightPicks === key.size && wrongPicks === 0 };
}

/** Largest allowed |given − key| in the key's unit. */
export function allowedError(keyValue: number, tolerance: Tolerance): number {
  return tolerance.type === "absolute" ? tolerance.amount : (tolerance.percent / 100) * Math.abs(keyValue);
}

/**
 * Compares a quantity with a key after converting it to the key's unit. An answer in a unit
 * of another quantity (ms for a length) is wrong, not an error. A relative slack of 1e-12
 * absorbs the rounding of the unit conversion itself (1.01 m typed as 101 cm).
 */
export function gradeQuantity(
  key: GeneratedValue,
  tolerance: Tolerance,
  answer: { value: number; unit?: UnitId },
): GradeResult {
  const answerUnit = answer.unit ?? key.unit;
  if (!Number.isFinite(answer.value) || !sameQuantity(answerUnit, key.unit)) return WRONG;
  const given = convertUnit(answer.value, answerUnit, key.unit);
  const allowed = allowedError(key.value, tolerance);
  const slack = 1e-12 * Math.max(Math.abs(key.value), Math.abs(given), allowed);
  return allOrNothing(Math.abs(given - key.value) <= allowed + slack);
}

export function gradeNumeric(question: QuestionOfKind<"numeric">, answer: AnswerOfKind<"numeric">): GradeResult {
  return gradeQuantity({ value: question.answer, unit: question.unit }, question.tolerance, answer);
}

export interface GeneratedGradingContext {
  generators: GeneratorRegistry;
  /** The attempt seed the learner's variant was drawn from. */
  variantSeed: number;
}

export function gradeGenerated(
  question: QuestionOfKind<"generated">,
  answer: AnswerOfKind<"generated">,
  context: GeneratedGradingContext,
): GradeResult {
  const inputs = drawQuestionInputs(question, context.variantSeed);
  const key = computeGeneratedKey(question, inputs, context.generators);
  return gradeQuantity(key, question.tolerance, answer);
}

/** All-or-nothing: 1 only when the order is identical to the key. */
export function gradeOrdering(question: QuestionOfKind<"ordering">, answer: AnswerOfKind<"ordering">): GradeResult {
  const key = question.correctOrder;
  if (answer.order.length !== key.length) return WRONG;
  return allOrNothing(key.every((itemId, index) => answer.order[index] === itemId));
}

/** Fraction of left items whose chosen partner is the key's partner. */
export function gradeMatching(question: QuestionOfKind<"matching">, answer: AnswerOfKind<"matching">): GradeResult {
  const keyPairs = Object.entries(question.correctPairs);
  let matched = 0;
  for (const [leftId, rightId] of keyPairs) {
    if (Object.hasOwn(answer.pairs, leftId) && answer.pairs[leftId] === rightId) matched++;
  }
  return { score: matched / keyPairs.length, correct: matched === keyPairs.length };
}

/** Inclusive containment; coordinates in the diagram's viewBox units. */
export function shapeContains(shape: RegionShape, x: number, y: number): boolean {
  if (shape.type === "circle") {
    const dx = x - shape.cx;
    const dy = y - shape.cy;
    return dx * dx + dy * dy <= shape.r * shape.r;
  }
  return x >= shape.x && x <= shape.x + shape.w && y >= shape.y && y <= shape.y + shape.h;
}

/** The region a pick lands in: the first listed region containing a point, or the chosen id. */
export function regionOfPick(question: QuestionOfKind<"hotspot">, pick: HotspotPick): string | null {
  if (pick.by === "region") {
    return question.regions.some((region) => region.id === pick.regionId) ? pick.regionId : null;
  }
  const hit = question.regions.find((region) => shapeContains(region.shape, pick.x, pick.y));
  return hit ? hit.id : null;
}

export function gradeHotspot(question: QuestionOfKind<"hotspot">, answer: AnswerOfKind<"hotspot">): GradeResult {
  const regionId = regionOfPick(question, answer.pick);
  return allOrNothing(regionId !== null && question.correctRegionIds.includes(regionId));
}

export interface GradingContext {
  /** Needed only when the questions include generated ones. */
  generators?: GeneratorRegistry;
  variantSeed?: number;
}

function generatedContext(context: GradingContext, questionId: string): GeneratedGradingContext {
  if (!context.generators || context.variantSeed === undefined) {
    throw new Error(`grading generated question "${questionId}" needs generators and a variantSeed`);
  }
  return { generators: context.generators, variantSeed: context.variantSeed };
}

/** Grades one answer; an answer of another kind than the question scores 0. */
export function gradeAnswer(question: Question, answer: Answer, context: GradingContext = {}): GradeResult {
  if (question.kind !== answer.kind) return WRONG;
  switch (question.kind) {
    case "single":
      return gradeSingle(question, answer as AnswerOfKind<"single">);
    case "multiple":
      return gradeMultiple(question, answer as AnswerOfKind<"multiple">);
    case "numeric":
      return gradeNumeric(question, answer as AnswerOfKind<"numeric">);
    case "generated":
      return gradeGenerated(question, answer as AnswerOfKind<"generated">, generatedContext(context, question.id));
    case "ordering":
      return gradeOrdering(question, answer as AnswerOfKind<"ordering">);
    case "matching":
      return gradeMatching(question, answer as AnswerOfKind<"matching">);
    case "hotspot":
      return gradeHotspot(question, answer as AnswerOfKind<"hotspot">);
  }
}

export interface QuestionResult extends GradeResult {
  questionId: string;
  kind: QuestionKind;
  topic: string;
  answered: boolean;
  points: number;
  earnedPoints: number;
  /** For numeric and generated questions: the key the answer was compared with. */
  expected?: GeneratedValue;
}

export interface AttemptResult {
  results: QuestionResult[];
  earnedPoints: number;
  possiblePoints: number;
  /** 100 · earned / possible (0 for an empty quiz). */
  percent: number;
  /** Distinct topics of questions not fully correct, in question order. */
  topicsToRevisit: string[];
}

function expectedKey(question: Question, context: GradingContext): GeneratedValue | undefined {
  if (question.kind === "numeric") return { value: question.answer, unit: question.unit };
  if (question.kind === "generated") {
    const generated = generatedContext(context, question.id);
    return computeGeneratedKey(question, drawQuestionInputs(question, generated.variantSeed), generated.generators);
  }
  return undefined;
}

export function gradeAttempt(
  questions: readonly Question[],
  answers: Readonly<AttemptAnswers>,
  context: GradingContext = {},
): AttemptResult {
  const results = questions.map((question): QuestionResult => {
    const answer = Object.hasOwn(answers, question.id) ? answers[question.id] : undefined;
    const grade = answer ? gradeAnswer(question, answer, context) : WRONG;
    const expected = expectedKey(question, context);
    return {
      questionId: question.id,
      kind: question.kind,
      topic: question.topic,
      answered: answer !== undefined,
      points: question.points,
      earnedPoints: grade.score * question.points,
      ...grade,
      ...(expected ? { expected } : {}),
    };
  });
  const earnedPoints = results.reduce((sum, result) => sum + result.earnedPoints, 0);
  const possiblePoints = results.reduce((sum, result) => sum + result.points, 0);
  const topicsToRevisit = [...new Set(results.filter((result) => !result.correct).map((result) => result.topic))];
  return {
    results,
    earnedPoints,
    possiblePoints,
    percent: possiblePoints > 0 ? (100 * earnedPoints) / possiblePoints : 0,
    topicsToRevisit,
  };
}

/** Pass mark check; the bank's passingPercent is inclusive (70 % needs ≥ 70). */
export function hasPassed(attempt: AttemptResult, passingPercent: number): boolean {
  // Round away float noise such as 69.99999999999999 from summing partial credit.
  return Math.round(attempt.percent * 1e9) / 1e9 >= passingPercent;
}
