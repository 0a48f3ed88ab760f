/**
 * What a browser may see of a question: everything needed to answer it, nothing that gives
 * the answer away. Each view is built field by field (never by spreading the question), and
 * its type forbids every answer-key field, so a key cannot reach a client by accident.
 */
import { GENERATOR_CATALOG } from "./generated";
import type { Choice, Question, QuestionBank, QuestionOfKind, RegionShape } from "./question-schema";
import { deriveSeed, seededShuffle } from "./random";
import { unitsOfSameQuantity, type UnitId } from "./units";
import { drawQuestionInputs, renderGeneratedPrompt } from "./variant";

export const ANSWER_KEY_FIELDS = [
  "correctOptionId",
  "correctOptionIds",
  "answer",
  "correctOrder",
  "correctPairs",
  "correctRegionIds",
  "explanation",
] as const;

export type AnswerKeyField = (typeof ANSWER_KEY_FIELDS)[number];

/** Any object carrying one of these keys (with a value) is not assignable to a client view. */
type NoAnswerKeys = { readonly [K in AnswerKeyField]?: never };

interface ClientCommon {
  id: string;
  topic: string;
  prompt: string;
  points: number;
}

export type ClientSingleQuestion = ClientCommon & NoAnswerKeys & { kind: "single"; options: Choice[] };
export type ClientMultipleQuestion = ClientCommon & NoAnswerKeys & { kind: "multiple"; options: Choice[] };
export type ClientNumericQuestion = ClientCommon &
  NoAnswerKeys & { kind: "numeric"; unit: UnitId; acceptedUnits: UnitId[] };
/** `prompt` is already filled in; `inputs` are the drawn values, for figures beside the prompt. */
export type ClientGeneratedQuestion = ClientCommon &
  NoAnswerKeys & { kind: "generated"; unit: UnitId; acceptedUnits: UnitId[]; inputs: Record<string, number> };
export type ClientOrderingQuestion = ClientCommon & NoAnswerKeys & { kind: "ordering"; items: Choice[] };
export type ClientMatchingQuestion = ClientCommon & NoAnswerKeys & { kind: "matching"; left: Choice[]; right: Choice[] };
export type ClientHotspotQuestion = ClientCommon &
  NoAnswerKeys & {
    kind: "hotspot";
    diagram: string;
    regions: { id: string; label: string; shape: RegionShape }[];
  };

export type ClientQuestion =
  | ClientSingleQuestion
  | ClientMultipleQuestion
  | ClientNumericQuestion
  | ClientGeneratedQuestion
  | ClientOrderingQuestion
  | ClientMatchingQuestion
  | ClientHotspotQuestion;

export interface ClientViewOptions {
  /** Attempt seed for option, item and question order. */
  shuffleSeed: number;
  /** Attempt seed for generated numbers; defaults to shuffleSeed. Grade with the same seed. */
  variantSeed?: number;
}

function copyChoices(choices: readonly Choice[]): Choice[] {
  return choices.map((choice) => ({ id: choice.id, text: choice.text }));
}

function maybeShuffle(choices: readonly Choice[], enabled: boolean, seed: number): Choice[] {
  return copyChoices(enabled ? seededShuffle(choices, seed) : choices);
}

/**
 * Items of an ordering question are always shuffled, and never shown already in the correct
 * order: if the shuffle happens to give the key, the list is rotated by one.
 */
function scrambleOrdering(question: QuestionOfKind<"ordering">, seed: number): Choice[] {
  let items = seededShuffle(question.items, seed);
  const isKey = items.every((item, index) => item.id === question.correctOrder[index]);
  if (isKey && items.length > 1) items = [...items.slice(1), items[0]];
  return copyChoices(items);
}

export function toClientQuestion(question: Question, options: ClientViewOptions): ClientQuestion {
  const common: ClientCommon = {
    id: question.id,
    topic: question.topic,
    prompt: question.prompt,
    points: question.points,
  };
  const seed = deriveSeed(options.shuffleSeed, question.id, "shuffle");
  switch (question.kind) {
    case "single":
    case "multiple":
      return { ...common, kind: question.kind, options: maybeShuffle(question.options, question.shuffle ?? true, seed) };
    case "numeric":
      return { ...common, kind: "numeric", unit: question.unit, acceptedUnits: unitsOfSameQuantity(question.unit) };
    case "generated": {
      const inputs = drawQuestionInputs(question, options.variantSeed ?? options.shuffleSeed);
      return {
        ...common,
        kind: "generated",
        prompt: renderGeneratedPrompt(question, inputs),
        unit: unitOfGenerator(question),
        acceptedUnits: unitsOfSameQuantity(unitOfGenerator(question)),
        inputs,
      };
    }
    case "ordering":
      return { ...common, kind: "ordering", items: scrambleOrdering(question, seed) };
    case "matching":
      return {
        ...common,
        kind: "matching",
        left: copyChoices(question.left),
        right: maybeShuffle(question.right, true, seed),
      };
    case "hotspot":
      return {
        ...common,
        kind: "hotspot",
        diagram: question.diagram,
        regions: question.regions.map((region) => ({ id: region.id, label: region.label, shape: { ...region.shape } })),
      };
  }
}

function unitOfGenerator(question: QuestionOfKind<"generated">): UnitId {
  return GENERATOR_CATALOG[question.generator].unit;
}

export interface ClientQuiz {
  id: string;
  title: string;
  passingPercent: number;
  attemptsAllowed: number;
  timeLimitMinutes: number | null;
  questions: ClientQuestion[];
}

/** A whole bank for one attempt: keys stripped, question order shuffled if the bank asks. */
export function toClientQuiz(bank: QuestionBank, options: ClientViewOptions): ClientQuiz {
  const ordered = bank.settings.shuffleQuestions
    ? seededShuffle(bank.questions, deriveSeed(options.shuffleSeed, bank.id, "question-order"))
    : bank.questions;
  return {
    id: bank.id,
    title: bank.title,
    passingPercent: bank.settings.passingPercent,
    attemptsAllowed: bank.settings.attemptsAllowed,
    timeLimitMinutes: bank.settings.timeLimitMinutes,
    questions: ordered.map((question) => toClientQuestion(question, options)),
  };
}
