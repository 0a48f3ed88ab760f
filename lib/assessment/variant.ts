/**
 * The per-attempt variant of a generated question: which inputs were drawn, the prompt the
 * learner saw, and the key. Both the client view and the grader derive it from the attempt
 * seed, so they always agree and the browser never sends numbers back to be trusted.
 */
import { fillTemplate, type GeneratedValue, type GeneratorRegistry } from "./generated";
import type { QuestionOfKind } from "./question-schema";
import { deriveSeed, drawInputs, rangeDecimals } from "./random";

type GeneratedQuestion = QuestionOfKind<"generated">;

export function drawQuestionInputs(question: GeneratedQuestion, attemptSeed: number): Record<string, number> {
  return drawInputs(deriveSeed(attemptSeed, question.id, "variant"), question.ranges);
}

/** The prompt with each placeholder written with the decimals of its range's grid. */
export function renderGeneratedPrompt(question: GeneratedQuestion, inputs: Readonly<Record<string, number>>): string {
  const formatted: Record<string, string> = {};
  for (const [name, range] of Object.entries(question.ranges)) {
    if (typeof inputs[name] === "number") formatted[name] = inputs[name].toFixed(rangeDecimals(range));
  }
  return fillTemplate(question.prompt, formatted);
}

export function computeGeneratedKey(
  question: GeneratedQuestion,
  inputs: Readonly<Record<string, number>>,
  generators: GeneratorRegistry,
): GeneratedValue {
  return generators[question.generator].compute(inputs);
}
