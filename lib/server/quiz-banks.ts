import "server-only";
// Question banks (content/banks/<course-slug>/<module-slug>.json and final.json): read and
// zod-parsed once per process, and the bank-side views of an attempt: the questions in the
// attempt's order, the client view without keys (in the attempt's presented ids), and answers
// and keys in words for a result.
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import {
  acousticsGenerators,
  computeGeneratedKey,
  drawQuestionInputs,
  formatQuantity,
  GENERATOR_CATALOG,
  questionBankSchema,
  questionOrder,
  regionOfPick,
  renderGeneratedPrompt,
  toClientQuestion,
  UNITS,
  type Answer,
  type ClientQuestion,
  type Presenter,
  type Question,
  type QuestionBank,
  type Tolerance,
  type UnitId,
} from "@/lib/assessment";
import { decimalsOf } from "@/lib/assessment/random";
import { getCourse } from "@/lib/content";
import type { QuestionOutcome, QuestionResultDto, QuizResultDto } from "@/lib/dto/quiz";

export type { QuestionOutcome, QuestionResultDto, QuizResultDto } from "@/lib/dto/quiz";

export type BankEntry = {
  bank: QuestionBank;
  /** The folder name under content/banks, which is the course's slug. */
  courseSlug: string;
  /** The file name without .json: a module slug, or "final". */
  fileSlug: string;
  questionsById: ReadonlyMap<string, Question>;
};

type BankIndex = { byId: Map<string, BankEntry>; loadedAtMs: number };

let cached: Promise<BankIndex> | undefined;
// In development, bank edits should show up without a restart; a short reuse window keeps one
// request from parsing every bank several times.
const DEV_REUSE_MS = 2_000;

function banksRoot(): string {
  return path.join(process.cwd(), "content", "banks");
}

async function readBankFile(file: string, courseSlug: string): Promise<BankEntry | null> {
  const parsed = questionBankSchema.safeParse(JSON.parse(await readFile(file, "utf8")));
  if (!parsed.success) {
    // A half-written or broken bank must not take every other quiz down; the content check reports it in full.
    console.error(`[quiz-banks] ${file} is not a valid bank: ${parsed.error.issues.slice(0, 3).map((i) => `${i.path.join(".")} ${i.message}`).join("; ")}`);
    return null;
  }
  const bank = parsed.data;
  return {
    bank,
    courseSlug,
    fileSlug: path.basename(file, ".json"),
    questionsById: new Map(bank.questions.map((q) => [q.id, q])),
  };
}

async function readAllBanks(): Promise<BankIndex> {
  const byId = new Map<string, BankEntry>();
  const root = banksRoot();
  const courses = await readdir(root, { withFileTypes: true }).catch(() => []);
  for (const dir of courses.filter((d) => d.isDirectory()).sort((a, b) => a.name.localeCompare(b.name))) {
    const files = (await readdir(path.join(root, dir.name))).filter((f) => f.endsWith(".json")).sort();
    for (const file of files) {
      const entry = await readBankFile(path.join(root, dir.name, file), dir.name).catch((err: Error) => {
        console.error(`[quiz-banks] ${dir.name}/${file}: ${err.message}`);
        return null;
      });
      if (entry && !byId.has(entry.bank.id)) byId.set(entry.bank.id, entry);
    }
  }
  return { byId, loadedAtMs: Date.now() };
}

async function bankIndex(): Promise<BankIndex> {
  const stale = process.env.NODE_ENV === "development" && cached && Date.now() - (await cached).loadedAtMs > DEV_REUSE_MS;
  if (!cached || stale) {
    cached = readAllBanks();
    cached.catch(() => {
      cached = undefined;
    });
  }
  return cached;
}

export async function getBankEntry(bankId: string): Promise<BankEntry | null> {
  return (await bankIndex()).byId.get(bankId) ?? null;
}

export async function allBankEntries(): Promise<BankEntry[]> {
  return [...(await bankIndex()).byId.values()];
}

export type BankSummaryDto = {
  bankId: string;
  title: string;
  courseSlug: string;
  courseTitle: string;
  /** null for the course's final quiz. */
  moduleTitle: string | null;
  questionCount: number;
  passingPercent: number;
  attemptsAllowed: number;
  timeLimitMinutes: number | null;
};

/** A course's banks in syllabus order: the module quizzes in module order, then the final. */
export async function listCourseBanks(courseSlug: string): Promise<BankSummaryDto[]> {
  const course = await getCourse(courseSlug);
  const entries = (await allBankEntries()).filter((e) => e.courseSlug === courseSlug);
  const moduleOrder = (e: BankEntry) => {
    const index = course?.modules.findIndex((m) => m.id === e.bank.moduleId) ?? -1;
    return e.bank.moduleId === null ? Number.MAX_SAFE_INTEGER : index < 0 ? Number.MAX_SAFE_INTEGER - 1 : index;
  };
  return entries
    .sort((a, b) => moduleOrder(a) - moduleOrder(b) || a.bank.title.localeCompare(b.bank.title))
    .map((e) => summarizeBank(e, course?.title ?? courseSlug, course?.modules.find((m) => m.id === e.bank.moduleId)?.title ?? null));
}

function summarizeBank(entry: BankEntry, courseTitle: string, moduleTitle: string | null): BankSummaryDto {
  const { bank } = entry;
  return {
    bankId: bank.id,
    title: bank.title,
    courseSlug: entry.courseSlug,
    courseTitle,
    moduleTitle,
    questionCount: bank.questions.length,
    passingPercent: bank.settings.passingPercent,
    attemptsAllowed: bank.settings.attemptsAllowed,
    timeLimitMinutes: bank.settings.timeLimitMinutes,
  };
}

/** The order an attempt shows the questions in: the attempt's own when the bank shuffles. */
export function questionOrderFor(bank: QuestionBank, presenter: Presenter): string[] {
  return questionOrder(bank, presenter).map((q) => q.id);
}

/** The attempt's questions that are still in the bank, in the attempt's order. */
export function attemptQuestions(entry: BankEntry, questionOrder: readonly string[]): Question[] {
  return questionOrder.map((id) => entry.questionsById.get(id)).filter((q): q is Question => q !== undefined);
}

/** What the browser gets before submission: no keys, no explanations, presented ids (lib/assessment/client-view). */
export function clientQuestionsFor(entry: BankEntry, order: readonly string[], presenter: Presenter, variantSeed: number): ClientQuestion[] {
  return attemptQuestions(entry, order).map((q) => toClientQuestion(q, { presenter, variantSeed }));
}

/** The prompt as the apprentice saw it (generated questions have their numbers filled in). */
export function promptFor(question: Question, seed: number): string {
  return question.kind === "generated" ? renderGeneratedPrompt(question, drawQuestionInputs(question, seed)) : question.prompt;
}

function unitSymbol(unit: UnitId | string | undefined): string {
  return unit && unit in UNITS ? UNITS[unit as UnitId].symbol : (unit ?? "");
}

function toleranceWords(tolerance: Tolerance, unit: UnitId): string {
  return tolerance.type === "absolute" ? `± ${tolerance.amount} ${unitSymbol(unit)}` : `± ${tolerance.percent} %`;
}

function textOf(choices: readonly { id: string; text: string }[], id: string): string {
  return choices.find((c) => c.id === id)?.text ?? "(not one of the options)";
}

/** The apprentice's answer in the bank's own words, for the result page. */
export function describeAnswer(question: Question, answer: Answer | undefined): string | null {
  if (!answer || answer.kind !== question.kind) return null;
  switch (question.kind) {
    case "single":
      return answer.kind === "single" ? textOf(question.options, answer.optionId) : null;
    case "multiple":
      if (answer.kind !== "multiple") return null;
      return answer.optionIds.length === 0 ? "Nothing ticked" : answer.optionIds.map((id) => textOf(question.options, id)).join("; ");
    case "numeric":
    case "generated":
      return answer.kind === "numeric" || answer.kind === "generated" ? `${answer.value} ${unitSymbol(answer.unit ?? keyUnit(question))}`.trim() : null;
    case "ordering":
      return answer.kind === "ordering" ? answer.order.map((id, i) => `${i + 1}. ${textOf(question.items, id)}`).join(" → ") : null;
    case "matching":
      if (answer.kind !== "matching") return null;
      return question.left.map((l) => `${l.text}: ${answer.pairs[l.id] ? textOf(question.right, answer.pairs[l.id]) : "no choice"}`).join("; ");
    case "hotspot": {
      if (answer.kind !== "hotspot") return null;
      const regionId = regionOfPick(question, answer.pick);
      return regionId ? (question.regions.find((r) => r.id === regionId)?.label ?? regionId) : "Outside every marked position";
    }
  }
}

function keyUnit(question: Question): UnitId | undefined {
  if (question.kind === "numeric") return question.unit;
  if (question.kind === "generated") return GENERATOR_CATALOG[question.generator].unit;
  return undefined;
}

/**
 * Whether a result may show correct answers and explanations: only when the bank allows it
 * (`showCorrectAnswers`) and the apprentice has no attempt left at the bank, so nothing learnt
 * from one result can be used in the next attempt. `note` says in words when they will be shown.
 */
export type ReviewDto = { shown: boolean; note: string | null };

type GradedItem = { questionId: string; answered: boolean; score: number; correct: boolean; points: number; earnedPoints: number };

function outcomeOf(item: GradedItem): QuestionOutcome {
  if (!item.answered) return "not answered";
  if (item.correct) return "correct";
  return item.score > 0 ? "partly correct" : "incorrect";
}

/**
 * A submitted attempt in words: score and outcome per question always; correct answers and
 * explanations only when `review.shown`.
 */
export function buildResultDto(
  entry: BankEntry,
  attempt: { id: string; seed: number; submittedAt: Date; passed: boolean },
  graded: { items: GradedItem[]; percent: number; earnedPoints: number; possiblePoints: number; passingPercent: number; topicsToRevisit: string[]; timedOut: boolean },
  answers: ReadonlyMap<string, Answer>,
  review: ReviewDto,
): QuizResultDto {
  const show = review.shown;
  const questions: QuestionResultDto[] = [];
  for (const item of graded.items) {
    const question = entry.questionsById.get(item.questionId);
    if (!question) continue; // removed from the bank since; its points still count in the stored score
    questions.push({
      number: questions.length + 1,
      questionId: question.id,
      kind: question.kind,
      topic: question.topic,
      prompt: promptFor(question, attempt.seed),
      points: item.points,
      earnedPoints: item.earnedPoints,
      score: item.score,
      outcome: outcomeOf(item),
      yourAnswer: describeAnswer(question, answers.get(question.id)),
      correctAnswer: show ? describeKey(question, attempt.seed) : null,
      explanation: show ? question.explanation : null,
    });
  }
  return {
    attemptId: attempt.id,
    bankId: entry.bank.id,
    title: entry.bank.title,
    submittedAt: attempt.submittedAt.toISOString(),
    percent: graded.percent,
    passed: attempt.passed,
    passingPercent: graded.passingPercent,
    earnedPoints: graded.earnedPoints,
    possiblePoints: graded.possiblePoints,
    timedOut: graded.timedOut,
    answersShown: show,
    answersNote: show ? null : review.note,
    topicsToRevisit: graded.topicsToRevisit,
    questions,
  };
}

/** The key in words (with the accepted tolerance for numbers). Only shown where the bank allows. */
export function describeKey(question: Question, seed: number): string {
  switch (question.kind) {
    case "single":
      return textOf(question.options, question.correctOptionId);
    case "multiple":
      return question.correctOptionIds.map((id) => textOf(question.options, id)).join("; ");
    case "numeric":
      return `${formatQuantity(question.answer, question.unit, decimalsOf(question.answer))} (accepted ${toleranceWords(question.tolerance, question.unit)})`;
    case "generated": {
      const key = computeGeneratedKey(question, drawQuestionInputs(question, seed), acousticsGenerators);
      return `${acousticsGenerators[question.generator].format(key)} (accepted ${toleranceWords(question.tolerance, key.unit)})`;
    }
    case "ordering":
      return question.correctOrder.map((id, i) => `${i + 1}. ${textOf(question.items, id)}`).join(" → ");
    case "matching":
      return question.left.map((l) => `${l.text}: ${textOf(question.right, question.correctPairs[l.id])}`).join("; ");
    case "hotspot":
      return question.correctRegionIds.map((id) => question.regions.find((r) => r.id === id)?.label ?? id).join(" or ");
  }
}
