// The content check's rules across question banks (scripts/content-check.ts runs them on every
// bank under content/banks). Pure: banks come in parsed. They look for surface features that
// give a key away, items repeated between banks, and ordering items that ask for the lesson's
// wording rather than an order the physics or the safety reason fixes.
import type { Question, QuestionBank } from "@/lib/assessment/question-schema";

/** A bank fails when the key is the longest option in more than this share of its single-choice items. */
export const MAX_KEY_LONGEST_SHARE = 0.35;
/** Two items whose normalised words overlap this much (Jaccard index) are one item asked twice. */
export const DUPLICATE_SIMILARITY = 0.7;
/** At most this many generated items in one bank may share a generator. */
export const MAX_ITEMS_PER_GENERATOR = 3;

export type BankProblem = { bankId: string; questionId?: string; message: string };

type Single = Extract<Question, { kind: "single" }>;

const singles = (bank: QuestionBank): Single[] => bank.questions.filter((q): q is Single => q.kind === "single");

/** The key is at least as long as every other option (a tie counts: it still gives nothing away to read the longest). */
export function keyIsLongest(question: Single): boolean {
  const key = question.options.find((o) => o.id === question.correctOptionId);
  if (!key) return false;
  return question.options.every((o) => o.text.trim().length <= key.text.trim().length);
}

/** Authored position (0-based) of the key among the options. */
export function keyPosition(question: Single): number {
  return question.options.findIndex((o) => o.id === question.correctOptionId);
}

/**
 * The most items a position may hold the key in: its expected count if keys sat at random
 * (each item with n options gives every one of its positions 1/n), rounded up.
 */
export function fairShare(bank: QuestionBank, position: number): number {
  const expected = singles(bank).reduce((sum, q) => sum + (q.options.length > position ? 1 / q.options.length : 0), 0);
  return Math.ceil(expected - 1e-9);
}

export function keyCues(bank: QuestionBank): BankProblem[] {
  const items = singles(bank);
  if (items.length === 0) return [];
  const problems: BankProblem[] = [];
  const longest = items.filter(keyIsLongest);
  if (longest.length / items.length > MAX_KEY_LONGEST_SHARE) {
    problems.push({
      bankId: bank.id,
      message: `the key is the longest option in ${longest.length} of ${items.length} single-choice items (at most ${Math.floor(items.length * MAX_KEY_LONGEST_SHARE)}): ${longest.map((q) => q.id).join(", ")}`,
    });
  }
  const counts = new Map<number, string[]>();
  for (const q of items) counts.set(keyPosition(q), [...(counts.get(keyPosition(q)) ?? []), q.id]);
  for (const [position, ids] of counts) {
    const share = fairShare(bank, position);
    if (ids.length > share) {
      problems.push({ bankId: bank.id, message: `the key is option ${position + 1} in ${ids.length} single-choice items, more than its fair share of ${share}: ${ids.join(", ")}` });
    }
  }
  return problems;
}

export function generatorSpread(bank: QuestionBank): BankProblem[] {
  const counts = new Map<string, string[]>();
  for (const q of bank.questions) if (q.kind === "generated") counts.set(q.generator, [...(counts.get(q.generator) ?? []), q.id]);
  return [...counts]
    .filter(([, ids]) => ids.length > MAX_ITEMS_PER_GENERATOR)
    .map(([generator, ids]) => ({ bankId: bank.id, message: `${ids.length} items use the ${generator} generator (at most ${MAX_ITEMS_PER_GENERATOR}): ${ids.join(", ")}` }));
}

// An ordering item must ask for an order the physics or the safety reason fixes, stated in the
// prompt, not for "the order the lesson gives".
const LESSON_WORDING = /\b(the|this|that) (lesson|course|module)\b|\b(recommends?|according to)\b/i;

export function orderingPrompts(bank: QuestionBank): BankProblem[] {
  return bank.questions
    .filter((q) => q.kind === "ordering" && LESSON_WORDING.test(q.prompt))
    .map((q) => ({ bankId: bank.id, questionId: q.id, message: "an ordering item asks for the lesson's order: ask for the order the physics or the safety reason fixes, and say which" }));
}

/** Every word a learner reads in an item, lower-cased, without punctuation or {placeholders}. */
export function itemWords(question: Question): Set<string> {
  const parts: string[] = [question.prompt];
  if ("options" in question) parts.push(...question.options.map((o) => o.text));
  if ("items" in question) parts.push(...question.items.map((o) => o.text));
  if ("left" in question) parts.push(...question.left.map((o) => o.text), ...question.right.map((o) => o.text));
  if ("regions" in question) parts.push(...question.regions.map((r) => r.label));
  const words = parts
    .join(" ")
    .toLowerCase()
    .replace(/\{[a-z0-9_]+\}/gi, " ")
    .replace(/[^\p{L}\p{N}.]+/gu, " ")
    .split(/\s+/)
    .map((w) => w.replace(/^\.+|\.+$/g, ""))
    .filter((w) => w.length > 1);
  return new Set(words);
}

export function similarity(a: ReadonlySet<string>, b: ReadonlySet<string>): number {
  let shared = 0;
  for (const word of a) if (b.has(word)) shared += 1;
  const union = a.size + b.size - shared;
  return union === 0 ? 1 : shared / union;
}

/** Pairs of items, in any banks, that are the same item asked twice. */
export function duplicateItems(banks: readonly QuestionBank[]): BankProblem[] {
  const all = banks.flatMap((bank) => bank.questions.map((q) => ({ bank: bank.id, q, words: itemWords(q) })));
  const problems: BankProblem[] = [];
  for (let i = 0; i < all.length; i += 1) {
    for (let j = i + 1; j < all.length; j += 1) {
      const s = similarity(all[i].words, all[j].words);
      if (s >= DUPLICATE_SIMILARITY) {
        problems.push({
          bankId: all[i].bank,
          questionId: all[i].q.id,
          message: `repeats ${all[j].bank} ${all[j].q.id} (${Math.round(s * 100)} % of the words shared): ask something else`,
        });
      }
    }
  }
  return problems;
}

export function checkBanks(banks: readonly QuestionBank[]): BankProblem[] {
  return [...banks.flatMap((bank) => [...keyCues(bank), ...generatorSpread(bank), ...orderingPrompts(bank)]), ...duplicateItems(banks)];
}
