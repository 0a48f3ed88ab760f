// Numbers as the lessons print them, read from the lesson files, for the lesson-number tests
// (tests/unit/content/lesson-numbers-*.test.ts). A check names a short passage of the lesson with
// `{}` where the number stands:
//
//   const lesson = await loadLessons(); // once per file
//   expectQuoted(noiseDose(...).dosePercent, lesson("les-ssp-exposure-limits").quote("Under NIOSH that is 2 ÷ 1 plus 6 ÷ 8, a dose of {} %"));
//
// The passage is matched against the lesson's plain text as lib/content reads it (markup such as
// <Term> and emphasis removed; table cells on lines of their own). In a passage, any run of
// spaces matches any run of white space (line breaks, no-break spaces), and " | " stands for the
// boundary between two table cells. Every other character must be in the lesson as written, so
// changing a quoted number, or the input beside it, fails the check; so does rewording the passage
// (the message names the lesson and the passage to look at again).
import { expect } from "vitest";
import { listAllLessons } from "@/lib/content";

/** A number as the lesson prints it. */
export type Quoted = {
  lessonId: string;
  /** The passage asked for, with `{}` where the number stands. */
  passage: string;
  /** The number as printed ("−11.8", "3¼"). */
  printed: string;
  value: number;
  /** Decimal places printed (0 for "15", 1 for "−11.8"). */
  decimals: number;
  /** The lesson's text around the number, for messages. */
  context: string;
};

const NUMBER = String.raw`[+\-\u2212]?\d+(?:\.\d+)?[¼½¾]?`;
const FRACTIONS: Record<string, number> = { "¼": 0.25, "½": 0.5, "¾": 0.75 };
const SPACE = String.raw`[\s\u00a0\u202f\u2009]`;

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

/** The passage as a regular expression: `{}` captures a number, " | " a cell boundary, spaces any white space. */
function passageRegExp(passage: string): RegExp {
  const parts = passage.split("{}").map((literal) =>
    literal
      .split(/\s+\|\s+/)
      .map((cell) =>
        cell
          .split(/\s+/)
          .map(escapeRegExp)
          .join(`${SPACE}+`),
      )
      .join(`${SPACE}*\\n${SPACE}*`),
  );
  // A passage that starts with a number must not match the tail of a longer one ("10 cm" in "110 cm").
  const start = /^\d/.test(passage) ? String.raw`(?<![\d.])` : "";
  // A number that ends the passage must be whole: "about {}" is not "about 1" of "about 1.5".
  const end = /\{\}$/.test(passage) ? String.raw`(?![\d.]*\d)` : "";
  return new RegExp(start + parts.join(`(${NUMBER})`) + end, "gu");
}

function parseNumber(printed: string): { value: number; decimals: number } {
  const fraction = FRACTIONS[printed.slice(-1)] ?? 0;
  const digits = fraction ? printed.slice(0, -1) : printed;
  const normalised = digits.replace("\u2212", "-");
  const whole = Number(normalised);
  if (!Number.isFinite(whole)) throw new Error(`"${printed}" is not a number`);
  const decimals = normalised.includes(".") ? normalised.split(".")[1].length : 0;
  return { value: whole + Math.sign(whole || 1) * fraction, decimals };
}

export class LessonQuotes {
  constructor(
    readonly lessonId: string,
    readonly file: string,
    private readonly text: string,
  ) {}

  /** Every number of the passage, in order; all places the passage occurs must print the same numbers. */
  quotes(passage: string): Quoted[] {
    const matches = [...this.text.matchAll(passageRegExp(passage))];
    if (matches.length === 0) {
      throw new Error(`${this.file} (${this.lessonId}) no longer says "${passage}": read the lesson again and update the check (its number, input and source)`);
    }
    const printed = matches.map((m) => m.slice(1).join(" "));
    if (new Set(printed).size > 1) {
      throw new Error(`"${passage}" occurs in ${this.file} with different numbers (${printed.join(" / ")}): make the passage longer`);
    }
    const [match] = matches;
    const context = this.text.slice(Math.max(0, match.index - 40), match.index + match[0].length + 40).replace(/\s+/g, " ");
    return match.slice(1).map((text) => ({ lessonId: this.lessonId, passage, printed: text, ...parseNumber(text), context }));
  }

  /** The one number of a passage with a single `{}`. */
  quote(passage: string): Quoted {
    const found = this.quotes(passage);
    if (found.length !== 1) throw new Error(`"${passage}" must have exactly one {} (it has ${found.length})`);
    return found[0];
  }

  /** The value of the one number of a passage (for a lesson's stated input, such as a distance or a level). */
  value(passage: string): number {
    return this.quote(passage).value;
  }

  /** Asserts that the lesson says this, word for word (for claims in words: "one third", "a thousandth"). */
  says(passage: string): void {
    if (passage.includes("{}")) throw new Error("says() takes a passage without {}; use quote()");
    this.quotes(passage);
  }
}

/**
 * Reads every lesson's text through lib/content (the loader the site uses) and returns a lookup by
 * lesson id. Parsing the MDX takes seconds: call it once, at the top of a test file
 * (`const lesson = await loadLessons();` then `lesson("les-…")` in each test).
 */
export async function loadLessons(): Promise<(lessonId: string) => LessonQuotes> {
  const all = await listAllLessons();
  const byId = new Map(all.map((l) => [l.id, new LessonQuotes(l.id, l.file, l.text)]));
  return (lessonId) => {
    const found = byId.get(lessonId);
    if (!found) throw new Error(`no lesson ${lessonId} in content/courses`);
    return found;
  };
}

/**
 * The computed value rounds to what the lesson prints: |actual − printed| ≤ half a unit of the
 * last printed digit ("11.8" → ±0.05, "15" → ±0.5), or half of `step` when the lesson rounds more
 * coarsely than its digits show ("near 860 Hz", rounded to tens: step 10).
 */
export function expectQuoted(actual: number, quoted: Quoted, { step }: { step?: number } = {}): void {
  const halfStep = (step ?? 10 ** -quoted.decimals) / 2 + 1e-9;
  expect(Number.isFinite(actual), `${quoted.lessonId} "${quoted.passage}": the computed value is ${actual}`).toBe(true);
  expect(
    Math.abs(actual - quoted.value),
    `${quoted.lessonId} prints ${quoted.printed} in "…${quoted.context}…"; lib/acoustics gives ${actual}, which does not round to it (±${halfStep.toPrecision(2)})`,
  ).toBeLessThanOrEqual(halfStep);
}
