import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { questionSchema, toClientQuestion, type ClientQuestion, type Question } from "@/lib/assessment";
import { secretPresenter } from "@/lib/server/attempt-presenter";
import { uniformityAtAlpha001 } from "../../support/chi-square";
import { anyQuestion } from "./arbitraries";
import { choiceIds } from "../../support/choice-ids";

// What the browser is shown must say nothing about the key: option, item, region and pair ids
// are minted per attempt, and the order is drawn from a secret the browser never sees.

/** The client view of `question` in attempt number `attempt` (each attempt has its own 256-bit secret). */
function viewFor(question: Question, attempt: number): ClientQuestion {
  const secret = createHash("sha256").update(`attempt secret ${attempt}`).digest("base64url");
  return toClientQuestion(question, { presenter: secretPresenter(secret), variantSeed: attempt });
}


/** Ids the view hands the browser for its choices. */
function presentedIds(view: ClientQuestion): string[] {
  switch (view.kind) {
    case "single":
    case "multiple":
      return view.options.map((o) => o.id);
    case "ordering":
      return view.items.map((i) => i.id);
    case "matching":
      return [...view.left, ...view.right].map((c) => c.id);
    case "hotspot":
      return view.regions.map((r) => r.id);
    default:
      return [];
  }
}

// Fields that hold people's words or fixed vocabulary (unit ids, the diagram's name), not ids.
const WORDING_FIELDS = new Set(["text", "prompt", "topic", "label", "kind", "unit", "acceptedUnits", "diagram"]);

/** Every string in the view outside the wording fields (the question's own id excepted). */
function machineStrings(value: unknown, key = "", depth = 0, out: string[] = []): string[] {
  if (typeof value === "string") {
    if (!WORDING_FIELDS.has(key) && !(depth === 1 && key === "id")) out.push(value);
  } else if (Array.isArray(value)) {
    for (const item of value) machineStrings(item, key, depth, out);
  } else if (value !== null && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) if (!WORDING_FIELDS.has(k)) machineStrings(v, k, depth + 1, out);
  }
  return out;
}

/** The same question with another choice as its key (null for kinds whose view may depend on the key). */
function withAnotherKey(question: Question): Question | null {
  switch (question.kind) {
    case "single": {
      const other = question.options.find((o) => o.id !== question.correctOptionId)!;
      return { ...question, correctOptionId: other.id };
    }
    case "multiple": {
      const others = question.options.filter((o) => !question.correctOptionIds.includes(o.id)).map((o) => o.id);
      return { ...question, correctOptionIds: others.length > 0 ? others : [question.options[0].id] };
    }
    case "matching": {
      const rights = question.right.map((r) => r.id);
      const pairs = Object.fromEntries(Object.entries(question.correctPairs).map(([left, right]) => [left, rights[(rights.indexOf(right) + 1) % rights.length]]));
      return { ...question, correctPairs: pairs };
    }
    case "hotspot":
      return { ...question, correctRegionIds: question.regions.filter((r) => !question.correctRegionIds.includes(r.id)).slice(0, 1).map((r) => r.id) };
    default:
      // An ordering view is never the key's order (client-view.ts), and numbers have no choices.
      return null;
  }
}

/** Ways an id could be hidden in plain sight: itself, base64url, hex, and inside a decoded id. */
function encodes(presented: string, authored: string): boolean {
  if (presented === authored) return true;
  const bytes = Buffer.from(authored, "utf8");
  const forms = [authored, bytes.toString("base64url"), bytes.toString("hex")].filter((form) => form.length >= 4);
  if (forms.some((form) => presented.includes(form))) return true;
  if (authored.length < 3) return false;
  return [presented, presented.slice(1)].some((text) => Buffer.from(text, "base64url").toString("latin1").includes(authored));
}

describe("presented ids", () => {
  it("no field of a client view equals or encodes an authored id or where the key is, and no two attempts share an id", () => {
    fc.assert(
      fc.property(anyQuestion, fc.integer(), fc.integer(), (question, first, second) => {
        fc.pre(first !== second);
        const authored = choiceIds(question);
        const view = viewFor(question, first);
        for (const text of machineStrings(view)) {
          for (const id of authored) expect(encodes(text, id), `"${text}" gives away "${id}"`).toBe(false);
        }
        const again = new Set(presentedIds(viewFor(question, second)));
        expect(presentedIds(view).filter((id) => again.has(id))).toEqual([]);
        // Neither an id nor a position follows the key: another key gives the very same view.
        const rekeyed = withAnotherKey(question);
        if (rekeyed && (rekeyed.kind !== "hotspot" || rekeyed.correctRegionIds.length > 0)) expect(viewFor(rekeyed, first)).toEqual(view);
      }),
    );
  });

  it("over 1,000 attempts the key's presented position and the rank of its id are uniform (chi-square, α = 0.01)", () => {
    // Authored as banks usually are: options lettered a to d, the key first.
    const question = questionSchema.parse({
      kind: "single",
      id: "q-key-first",
      topic: "pickup patterns",
      prompt: "Where is a cardioid's null?",
      explanation: "Straight behind the capsule, at 180°.",
      options: [
        { id: "a", text: "At 180°" },
        { id: "b", text: "At 90°" },
        { id: "c", text: "At 0°" },
        { id: "d", text: "Nowhere" },
      ],
      correctOptionId: "a",
    });
    const byPosition = [0, 0, 0, 0];
    const byRank = [0, 0, 0, 0];
    for (let attempt = 0; attempt < 1000; attempt++) {
      const view = viewFor(question, attempt);
      if (view.kind !== "single") throw new Error("not a single-choice view");
      const keyText = "At 180°";
      const keyIndex = view.options.findIndex((o) => o.text === keyText);
      byPosition[keyIndex] += 1;
      const sorted = view.options.map((o) => o.id).sort();
      byRank[sorted.indexOf(view.options[keyIndex].id)] += 1;
    }
    const position = uniformityAtAlpha001(byPosition);
    const rank = uniformityAtAlpha001(byRank);
    expect(position.statistic, `position counts ${position.counts.join("/")}`).toBeLessThan(position.critical);
    expect(rank.statistic, `rank-of-id counts ${rank.counts.join("/")}`).toBeLessThan(rank.critical);
  });
});
