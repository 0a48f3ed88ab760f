// Loading a course's question banks for the content tests, and the helpers every bank test
// needs: the key of a question as a learner's answer, and the decimals a key is written with.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
export { keyAnswer } from "../../support/key-answer";
import {
  gradeAnswer,
  questionBankSchema,
  type Question,
  type QuestionBank,
  type QuestionKind,
  type QuestionOfKind,
} from "@/lib/assessment";

const CONTENT = path.resolve(import.meta.dirname, "../../../content");

export const ALL_KINDS: readonly QuestionKind[] = ["single", "multiple", "numeric", "generated", "ordering", "matching", "hotspot"];

/** Every course that has banks: content/banks/<course slug>/. */
export const BANK_COURSE_SLUGS: readonly string[] = readdirSync(path.join(CONTENT, "banks"), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name)
  .sort();

export interface CourseModule {
  id: string;
  slug: string;
}

export interface BankedQuestion<Q extends Question = Question> {
  bankSlug: string;
  bank: QuestionBank;
  question: Q;
}

export interface CourseBanks {
  slug: string;
  course: { id: string; modules: CourseModule[] };
  /** File names in content/banks/<slug>/, as they are on disk. */
  files: string[];
  /** By bank slug: the module slug, or "final". */
  banks: Map<string, QuestionBank>;
  questions: BankedQuestion[];
  ofKind<K extends QuestionKind>(kind: K): BankedQuestion<QuestionOfKind<K>>[];
  /** One question by bank slug and id, checked to be of `kind`. */
  question<K extends QuestionKind>(bankSlug: string, id: string, kind: K): QuestionOfKind<K>;
}

export function loadCourseBanks(slug: string): CourseBanks {
  const dir = path.join(CONTENT, "banks", slug);
  const course = JSON.parse(readFileSync(path.join(CONTENT, "courses", slug, "course.json"), "utf8")) as CourseBanks["course"];
  const files = readdirSync(dir).sort();
  const banks = new Map(
    files
      .filter((name) => name.endsWith(".json"))
      .map((name) => [name.replace(/\.json$/, ""), questionBankSchema.parse(JSON.parse(readFileSync(path.join(dir, name), "utf8")))] as const),
  );
  const questions = [...banks.entries()].flatMap(([bankSlug, bank]) => bank.questions.map((question) => ({ bankSlug, bank, question })));
  return {
    slug,
    course,
    files,
    banks,
    questions,
    ofKind: <K extends QuestionKind>(kind: K) =>
      questions.filter((entry): entry is BankedQuestion<QuestionOfKind<K>> => entry.question.kind === kind),
    question: <K extends QuestionKind>(bankSlug: string, id: string, kind: K) => {
      const found = banks.get(bankSlug)?.questions.find((q) => q.id === id);
      if (found?.kind !== kind) throw new Error(`${slug}: ${bankSlug}/${id} is not a ${kind} question`);
      return found as QuestionOfKind<K>;
    },
  };
}

/** Decimals a key is written with, so a library value must round to the printed key. */
export function writtenDecimals(value: number): number {
  const text = String(value);
  const dot = text.indexOf(".");
  return dot < 0 ? 0 : text.length - dot - 1;
}

/** Everything a learner reads: title, topics, prompts, explanations, option, item and region labels. */
export function visibleTexts(bank: QuestionBank): string[] {
  return [
    bank.title,
    ...bank.questions.flatMap((question): string[] => {
      const common = [question.topic, question.prompt, question.explanation];
      switch (question.kind) {
        case "single":
        case "multiple":
          return [...common, ...question.options.map((option) => option.text)];
        case "ordering":
          return [...common, ...question.items.map((item) => item.text)];
        case "matching":
          return [...common, ...question.left.map((item) => item.text), ...question.right.map((item) => item.text)];
        case "hotspot":
          return [...common, ...question.regions.map((region) => region.label)];
        case "numeric":
        case "generated":
          return common;
      }
    }),
  ];
}

/**
 * Registers the check that every numeric key equals its library value, given as
 * "<bank slug>/<question id>" → value in the key's unit: one entry per numeric question, the
 * stored key equal to the value to the digits it is written with, and the unrounded value graded
 * correct.
 */
export function describeNumericKeys(title: string, c: CourseBanks, libraryValues: Readonly<Record<string, number>>): void {
  describe(`${title}: numeric keys match lib/acoustics`, () => {
    it("every numeric question has a recorded library value, and every record has a question", () => {
      const numericIds = c.ofKind("numeric").map((entry) => `${entry.bankSlug}/${entry.question.id}`);
      expect(numericIds.sort()).toEqual(Object.keys(libraryValues).sort());
    });

    it.each(Object.entries(libraryValues))("%s equals the library value to the digits written", (bankAndId, libraryValue) => {
      const [bankSlug, questionId] = bankAndId.split("/");
      const question = c.question(bankSlug, questionId, "numeric");
      expect(Number.isFinite(libraryValue)).toBe(true);
      expect(question.answer).toBeCloseTo(libraryValue, writtenDecimals(question.answer));
      expect(gradeAnswer(question, { kind: "numeric", value: libraryValue, unit: question.unit }).score).toBe(1);
    });
  });
}
