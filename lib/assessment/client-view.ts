/**
 * What a browser may see of a question: everything needed to answer it, nothing that gives
 * the answer away. Each view is built field by field (never by spreading the question), and
 * its type forbids every answer-key field, so a key cannot reach a client by accident. Choice
 * ids are the attempt's presented ids and every order is the attempt's (presentation.ts), so
 * neither an id nor a position says which choice is the key.
 */
import { GENERATOR_CATALOG } from "./generated";
import { permute, type ChoiceRole, type Presenter } from "./presentation";
import type { Choice, Question, QuestionBank, QuestionOfKind, RegionShape } from "./question-schema";
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
  /** The attempt's presented ids and orders (lib/server/attempt-presenter.ts on the server). */
  presenter: Presenter;
  /** Attempt seed for the numbers of generated questions. Grade with the same seed. */
  variantSeed: number;
}

/** The purpose under which a question's one shuffled list is ordered (options, items or the right column). */
const SHUFFLE = "shuffle";

function presentChoices(questionId: string, role: ChoiceRole, choices: readonly Choice[], presenter: Presenter): Choice[] {
  return choices.map((choice) => ({ id: presenter.presentedId(questionId, role, choice.id), text: choice.text }));
}

function shuffled(questionId: string, choices: readonly Choice[], presenter: Presenter): Choice[] {
  return permute(choices, presenter.permutation(questionId, SHUFFLE, choices.length));
}

/**
 * Items of an ordering question are always shuffled, and never shown already in the correct
 * order: if the shuffle happens to give the key, the list is rotated by one.
 */
function scrambleOrdering(question: QuestionOfKind<"ordering">, presenter: Presenter): Choice[] {
  let items = shuffled(question.id, question.items, presenter);
  const isKey = items.every((item, index) => item.id === question.correctOrder[index]);
  if (isKey && items.length > 1) items = [...items.slice(1), items[0]];
  return items;
}

export function toClientQuestion(question: Question, options: ClientViewOptions): ClientQuestion {
  const common: ClientCommon = {
    id: question.id,
    topic: question.topic,
    prompt: question.prompt,
    points: question.points,
  };
  const { presenter } = options;
  switch (question.kind) {
    case "single":
    case "multiple": {
      const ordered = (question.shuffle ?? true) ? shuffled(question.id, question.options, presenter) : question.options;
      return { ...common, kind: question.kind, options: presentChoices(question.id, "option", ordered, presenter) };
    }
    case "numeric":
      return { ...common, kind: "numeric", unit: question.unit, acceptedUnits: unitsOfSameQuantity(question.unit) };
    case "generated": {
      const inputs = drawQuestionInputs(question, options.variantSeed);
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
      return { ...common, kind: "ordering", items: presentChoices(question.id, "item", scrambleOrdering(question, presenter), presenter) };
    case "matching":
      return {
        ...common,
        kind: "matching",
        left: presentChoices(question.id, "left", question.left, presenter),
        right: presentChoices(question.id, "right", shuffled(question.id, question.right, presenter), presenter),
      };
    case "hotspot":
      // Regions keep the diagram's order: the drawing letters its positions in that order.
      return {
        ...common,
        kind: "hotspot",
        diagram: question.diagram,
        regions: question.regions.map((region) => ({
          id: presenter.presentedId(question.id, "region", region.id),
          label: region.label,
          shape: { ...region.shape },
        })),
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

/** The order an attempt shows a bank's questions in: the attempt's own when the bank shuffles. */
export function questionOrder(bank: QuestionBank, presenter: Presenter): Question[] {
  return bank.settings.shuffleQuestions ? permute(bank.questions, presenter.permutation(bank.id, "question-order", bank.questions.length)) : bank.questions;
}

/** A whole bank for one attempt: keys stripped, question order shuffled if the bank asks. */
export function toClientQuiz(bank: QuestionBank, options: ClientViewOptions): ClientQuiz {
  const ordered = questionOrder(bank, options.presenter);
  return {
    id: bank.id,
    title: bank.title,
    passingPercent: bank.settings.passingPercent,
    attemptsAllowed: bank.settings.attemptsAllowed,
    timeLimitMinutes: bank.settings.timeLimitMinutes,
    questions: ordered.map((question) => toClientQuestion(question, options)),
  };
}
