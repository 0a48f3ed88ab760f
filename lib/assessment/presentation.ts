/**
 * How one attempt presents a question's choices: the id the browser sees in place of each
 * authored id, and the order of each list. An authored id often names or hints at the key
 * ("a" is the key of most lettered questions, a region called "snare-bottom", pairs such as
 * "card" → "behind"), so the browser only ever sees ids minted for the attempt, and answers
 * come back in those ids and are mapped to authored ids on the server before anything is stored.
 *
 * The attempt's implementation (keyed by a secret that never leaves the server) is in
 * lib/server/attempt-presenter.ts; this module is pure so client code can import its types.
 */
import type { Answer } from "./answer-schema";
import type { Question } from "./question-schema";
import { deriveSeed, seededShuffle } from "./random";

/** Which list of a question an id belongs to. */
export type ChoiceRole = "option" | "item" | "left" | "right" | "region";

export interface Presenter {
  /** The id the browser sees for an authored id of one question (the same for the whole attempt). */
  presentedId(questionId: string, role: ChoiceRole, authoredId: string): string;
  /** A permutation of 0…n−1, fixed for the attempt, per scope (a question or bank id) and purpose. */
  permutation(scope: string, purpose: string, n: number): number[];
}

/** Reorders a list by a permutation of its indexes. */
export function permute<T>(items: readonly T[], order: readonly number[]): T[] {
  if (order.length !== items.length) throw new Error("a permutation must cover the whole list");
  return order.map((index) => items[index]);
}

/**
 * Attempts started before presented ids existed: authored ids as they are, orders from the
 * attempt's 31-bit seed exactly as they were drawn then, so an old attempt reads back unchanged.
 */
export function legacyPresenter(seed: number): Presenter {
  return {
    presentedId: (_questionId, _role, authoredId) => authoredId,
    permutation: (scope, purpose, n) =>
      seededShuffle(
        Array.from({ length: n }, (_, index) => index),
        deriveSeed(seed, scope, purpose),
      ),
  };
}

type Lists = Partial<Record<ChoiceRole, readonly string[]>>;

function authoredLists(question: Question): Lists {
  switch (question.kind) {
    case "single":
    case "multiple":
      return { option: question.options.map((o) => o.id) };
    case "ordering":
      return { item: question.items.map((i) => i.id) };
    case "matching":
      return { left: question.left.map((c) => c.id), right: question.right.map((c) => c.id) };
    case "hotspot":
      return { region: question.regions.map((r) => r.id) };
    case "numeric":
    case "generated":
      return {};
  }
}

type Translate = (role: ChoiceRole, id: string) => string | undefined;

/** Lookups from presented to authored ids and back, for one question of one attempt. */
function translators(question: Question, presenter: Presenter): { toAuthored: Translate; toPresented: Translate } {
  const forward = new Map<string, string>();
  const backward = new Map<string, string>();
  for (const [role, ids] of Object.entries(authoredLists(question)) as [ChoiceRole, readonly string[]][]) {
    for (const authored of ids) {
      const presented = presenter.presentedId(question.id, role, authored);
      // 96-bit ids: a clash is not expected in the life of the product, but must never grade wrongly.
      if (backward.has(`${role}:${presented}`)) throw new Error(`presented id clash in question ${question.id}`);
      forward.set(`${role}:${authored}`, presented);
      backward.set(`${role}:${presented}`, authored);
    }
  }
  return { toAuthored: (role, id) => backward.get(`${role}:${id}`), toPresented: (role, id) => forward.get(`${role}:${id}`) };
}

function mapAnswer(question: Question, answer: Answer, translate: Translate): Answer | null {
  if (answer.kind !== question.kind) return null;
  const all = (role: ChoiceRole, ids: readonly string[]) => {
    const mapped = ids.map((id) => translate(role, id));
    return mapped.every((id): id is string => id !== undefined) ? mapped : null;
  };
  switch (answer.kind) {
    case "single": {
      const optionId = translate("option", answer.optionId);
      return optionId === undefined ? null : { kind: "single", optionId };
    }
    case "multiple": {
      const optionIds = all("option", answer.optionIds);
      return optionIds && { kind: "multiple", optionIds };
    }
    case "numeric":
    case "generated":
      return answer;
    case "ordering": {
      const order = all("item", answer.order);
      return order && { kind: "ordering", order };
    }
    case "matching": {
      const pairs: Record<string, string> = {};
      for (const [left, right] of Object.entries(answer.pairs)) {
        const l = translate("left", left);
        const r = translate("right", right);
        if (l === undefined || r === undefined) return null;
        pairs[l] = r;
      }
      return { kind: "matching", pairs };
    }
    case "hotspot": {
      if (answer.pick.by === "point") return answer;
      const regionId = translate("region", answer.pick.regionId);
      return regionId === undefined ? null : { kind: "hotspot", pick: { by: "region", regionId } };
    }
  }
}

/** An answer given in the ids the attempt showed, in authored ids; null if it names anything not shown. */
export function toAuthoredAnswer(question: Question, answer: Answer, presenter: Presenter): Answer | null {
  return mapAnswer(question, answer, translators(question, presenter).toAuthored);
}

/** A stored (authored) answer in the ids the attempt shows; null if it names anything the question no longer has. */
export function toPresentedAnswer(question: Question, answer: Answer, presenter: Presenter): Answer | null {
  return mapAnswer(question, answer, translators(question, presenter).toPresented);
}
