import { describe, expect, it } from "vitest";
import { attemptAnswersSchema, matchingAnswerSchema } from "@/lib/assessment";

// What a browser may send is parsed before anything reads it: keys that name an object's
// prototype machinery are refused outright, and lists and maps have a ceiling.

const PROTOTYPE_KEYS = ["__proto__", "constructor", "prototype"];

describe("answer schemas", () => {
  it("refuse __proto__, constructor and prototype as a matching pair's key or a question id", () => {
    for (const key of PROTOTYPE_KEYS) {
      // JSON.parse makes "__proto__" an own key, as a request body would.
      const pairs = JSON.parse(`{"${key}": "behind", "card": "behind"}`) as Record<string, string>;
      expect(matchingAnswerSchema.safeParse({ kind: "matching", pairs }).success, `pairs key ${key}`).toBe(false);
      const answers = JSON.parse(`{"${key}": {"kind": "single", "optionId": "a"}}`) as Record<string, unknown>;
      expect(attemptAnswersSchema.safeParse(answers).success, `question id ${key}`).toBe(false);
    }
  });

  it("refuse a matching answer with more pairs than any question has", () => {
    const pairs = Object.fromEntries(Array.from({ length: 201 }, (_, i) => [`left-${i}`, "right"]));
    expect(matchingAnswerSchema.safeParse({ kind: "matching", pairs }).success).toBe(false);
    const few = Object.fromEntries(Array.from({ length: 5 }, (_, i) => [`left-${i}`, "right"]));
    expect(matchingAnswerSchema.safeParse({ kind: "matching", pairs: few }).success).toBe(true);
  });
});
