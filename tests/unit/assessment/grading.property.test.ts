import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  convertUnit,
  drawInputs,
  gradeMatching,
  gradeMultiple,
  gradeNumeric,
  gradeOrdering,
  questionSchema,
  unitsOfSameQuantity,
  type Question,
  type UnitId,
} from "@/lib/assessment";
import { matchingQuestionArb, multipleQuestionArb, orderingQuestionArb } from "./arbitraries";

type Of<K extends Question["kind"]> = Extract<Question, { kind: K }>;

describe("ordering grader (property)", () => {
  it("a permutation of the correct order scores 1 exactly when it is the identity", () => {
    fc.assert(
      fc.property(
        orderingQuestionArb.chain((question) =>
          fc.tuple(
            fc.constant(question as Of<"ordering">),
            fc.shuffledSubarray((question as Of<"ordering">).correctOrder, {
              minLength: (question as Of<"ordering">).correctOrder.length,
              maxLength: (question as Of<"ordering">).correctOrder.length,
            }),
          ),
        ),
        ([question, order]) => {
          const { score, correct } = gradeOrdering(question, { kind: "ordering", order });
          const identity = order.every((id, i) => id === question.correctOrder[i]);
          return identity ? score === 1 && correct : score === 0 && !correct;
        },
      ),
    );
  });
});

describe("multiple-choice grader (property)", () => {
  it("scores in [0, 1], full marks only for the exact key, and more right picks never lower the score", () => {
    fc.assert(
      fc.property(
        multipleQuestionArb.chain((question) => {
          const ids = (question as Of<"multiple">).options.map((option) => option.id);
          return fc.tuple(fc.constant(question as Of<"multiple">), fc.subarray(ids));
        }),
        ([question, picks]) => {
          const { score, correct } = gradeMultiple(question, { kind: "multiple", optionIds: picks });
          const key = new Set(question.correctOptionIds);
          const exact = picks.length === key.size && picks.every((id) => key.has(id));
          const missing = question.correctOptionIds.filter((id) => !picks.includes(id));
          const better = gradeMultiple(question, { kind: "multiple", optionIds: [...picks, ...missing.slice(0, 1)] });
          return score >= 0 && score <= 1 && correct === exact && (score === 1) === exact && better.score >= score;
        },
      ),
    );
  });
});

describe("matching grader (property)", () => {
  it("scores the fraction of left items paired as in the key", () => {
    fc.assert(
      fc.property(
        matchingQuestionArb.chain((question) => {
          const q = question as Of<"matching">;
          const rightIds = q.right.map((item) => item.id);
          return fc.tuple(
            fc.constant(q),
            fc.array(fc.constantFrom(...rightIds), { minLength: q.left.length, maxLength: q.left.length }),
          );
        }),
        ([question, chosen]) => {
          const pairs = Object.fromEntries(question.left.map((item, i) => [item.id, chosen[i]]));
          const expected = question.left.filter((item, i) => question.correctPairs[item.id] === chosen[i]).length;
          const { score, correct } = gradeMatching(question, { kind: "matching", pairs });
          return Math.abs(score - expected / question.left.length) < 1e-12 && correct === (expected === question.left.length);
        },
      ),
    );
  });
});

describe("numeric grader (property)", () => {
  const keyUnits: UnitId[] = ["m", "cm", "in", "ft", "s", "ms", "h", "Hz", "kHz", "dB", "degC", "degF", "V", "mV", "ohm", "kohm"];
  const setup = fc.record({
    keyUnit: fc.constantFrom(...keyUnits),
    keyValue: fc.double({ min: 0.01, max: 5000, noNaN: true }),
    negative: fc.boolean(),
    relative: fc.boolean(),
    size: fc.double({ min: 0.001, max: 0.2, noNaN: true }), // tolerance as a fraction of |key|
    answerUnitIndex: fc.nat(),
  });

  const numericQuestion = (keyValue: number, keyUnit: UnitId, relative: boolean, size: number) =>
    questionSchema.parse({
      kind: "numeric",
      id: "q",
      topic: "units",
      prompt: "How much?",
      explanation: "Because.",
      answer: keyValue,
      unit: keyUnit,
      tolerance: relative
        ? { type: "relative", percent: 100 * size }
        : { type: "absolute", amount: size * Math.abs(keyValue) },
    }) as Of<"numeric">;

  it("an answer inside the tolerance passes in every unit of the same quantity", () => {
    fc.assert(
      fc.property(setup, fc.double({ min: -0.999, max: 0.999, noNaN: true }), (s, fraction) => {
        const keyValue = s.negative ? -s.keyValue : s.keyValue;
        const question = numericQuestion(keyValue, s.keyUnit, s.relative, s.size);
        const units = unitsOfSameQuantity(s.keyUnit);
        const answerUnit = units[s.answerUnitIndex % units.length];
        const inKeyUnit = keyValue + fraction * s.size * Math.abs(keyValue);
        const value = convertUnit(inKeyUnit, s.keyUnit, answerUnit);
        return gradeNumeric(question, { kind: "numeric", value, unit: answerUnit }).correct;
      }),
    );
  });

  it("an answer outside the tolerance fails in every unit of the same quantity", () => {
    fc.assert(
      fc.property(setup, fc.double({ min: 1.001, max: 3, noNaN: true }), fc.boolean(), (s, fraction, below) => {
        const keyValue = s.negative ? -s.keyValue : s.keyValue;
        const question = numericQuestion(keyValue, s.keyUnit, s.relative, s.size);
        const units = unitsOfSameQuantity(s.keyUnit);
        const answerUnit = units[s.answerUnitIndex % units.length];
        const inKeyUnit = keyValue + (below ? -1 : 1) * fraction * s.size * Math.abs(keyValue);
        const value = convertUnit(inKeyUnit, s.keyUnit, answerUnit);
        return !gradeNumeric(question, { kind: "numeric", value, unit: answerUnit }).correct;
      }),
    );
  });

  it("unit conversion round-trips", () => {
    fc.assert(
      fc.property(fc.constantFrom(...keyUnits), fc.nat(), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (unit, index, value) => {
        const units = unitsOfSameQuantity(unit);
        const other = units[index % units.length];
        const back = convertUnit(convertUnit(value, unit, other), other, unit);
        return Math.abs(back - value) <= 1e-9 * Math.max(1, Math.abs(value));
      }),
    );
  });
});

describe("drawInputs (property)", () => {
  const ranges = fc.dictionary(
    fc.stringMatching(/^[a-z][A-Za-z]{0,6}$/),
    fc
      .record({
        min: fc.integer({ min: -1000, max: 1000 }).map((v) => v / 10),
        steps: fc.integer({ min: 0, max: 500 }),
        step: fc.constantFrom(0.01, 0.05, 0.1, 0.25, 0.5, 1, 2, 5),
      })
      .map(({ min, steps, step }) => ({ min, max: Number((min + steps * step).toFixed(2)), step })),
    { minKeys: 1, maxKeys: 5 },
  );

  it("is deterministic per seed and stays on each range's grid", () => {
    fc.assert(
      fc.property(fc.integer(), ranges, (seed, inputRanges) => {
        const first = drawInputs(seed, inputRanges);
        const second = drawInputs(seed, { ...inputRanges });
        expect(second).toEqual(first);
        for (const [name, range] of Object.entries(inputRanges)) {
          const value = first[name];
          expect(value).toBeGreaterThanOrEqual(range.min);
          expect(value).toBeLessThanOrEqual(range.max);
          const stepsFromMin = (value - range.min) / range.step;
          expect(Math.abs(stepsFromMin - Math.round(stepsFromMin))).toBeLessThan(1e-6);
        }
      }),
    );
  });

  it("does not depend on the order of the range keys", () => {
    fc.assert(
      fc.property(fc.integer(), ranges, (seed, inputRanges) => {
        const reversed = Object.fromEntries(Object.entries(inputRanges).reverse());
        expect(drawInputs(seed, reversed)).toEqual(drawInputs(seed, inputRanges));
      }),
    );
  });
});
