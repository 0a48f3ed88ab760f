/** fast-check generators of valid questions of every kind, for the property tests. */
import fc from "fast-check";
import { GENERATOR_CATALOG, GENERATOR_NAMES, questionSchema, type Question, type QuestionInput } from "@/lib/assessment";

export const slug = fc.stringMatching(/^[a-z][a-z0-9-]{0,8}$/);
export const uniqueSlugs = (min: number, max: number) =>
  fc.uniqueArray(slug, { minLength: min, maxLength: max });
// Braces are left out: "{A}" in random text would be a placeholder a generated question's
// generator does not have, which the schema rightly rejects.
const text = fc.string({ minLength: 1, maxLength: 20 }).map((value) => `t ${value.replace(/[{}]/g, "")}`);

/** Explanations carry a marker so a test can prove they never reach a client view. */
export const EXPLANATION_MARKER = "EXPLANATION-MARKER";

const common = fc.record({
  id: slug,
  topic: text,
  prompt: text,
  explanation: text.map((value) => `${EXPLANATION_MARKER} ${value}`),
  points: fc.integer({ min: 1, max: 5 }),
});

const choices = (min: number, max: number) =>
  uniqueSlugs(min, max).chain((ids) => fc.tuple(fc.constant(ids), fc.array(text, { minLength: ids.length, maxLength: ids.length })));

const single = fc.tuple(common, choices(2, 6), fc.nat(), fc.option(fc.boolean(), { nil: undefined })).map(
  ([base, [ids, texts], pick, shuffle]): QuestionInput => ({
    ...base,
    kind: "single",
    options: ids.map((id, i) => ({ id, text: texts[i] })),
    correctOptionId: ids[pick % ids.length],
    ...(shuffle === undefined ? {} : { shuffle }),
  }),
);

const multiple = fc.tuple(common, choices(2, 6), fc.array(fc.boolean(), { minLength: 6, maxLength: 6 })).map(
  ([base, [ids, texts], marks]): QuestionInput => {
    const correct = ids.filter((_, i) => marks[i]);
    return {
      ...base,
      kind: "multiple",
      options: ids.map((id, i) => ({ id, text: texts[i] })),
      correctOptionIds: correct.length > 0 ? correct : [ids[0]],
    };
  },
);

const unitIds = ["m", "ms", "Hz", "dB", "degC", "V", "ohm"] as const;
const numeric = fc
  .tuple(common, fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.constantFrom(...unitIds), fc.double({ min: 0, max: 10, noNaN: true }))
  .map(([base, answer, unit, amount]): QuestionInput => ({
    ...base,
    kind: "numeric",
    answer,
    unit,
    tolerance: { type: "absolute", amount },
  }));

const generated = fc.tuple(common, fc.constantFrom(...GENERATOR_NAMES)).map(([base, generator]): QuestionInput => {
  // Ranges span each input's whole domain in four steps, ends included.
  const domain: Readonly<Record<string, readonly [number, number]>> = GENERATOR_CATALOG[generator].domain;
  const ranges = Object.fromEntries(
    GENERATOR_CATALOG[generator].inputs.map((input) => {
      const [min, max] = domain[input];
      return [input, { min, max, step: (max - min) / 4 }];
    }),
  );
  const placeholders = GENERATOR_CATALOG[generator].inputs.map((input) => `{${input}}`).join(", ");
  return { ...base, prompt: `${base.prompt} ${placeholders}`, kind: "generated", generator, ranges, tolerance: { type: "relative", percent: 1 } };
});

const ordering = fc
  .tuple(common, choices(2, 7))
  .chain(([base, [ids, texts]]) =>
    fc.shuffledSubarray(ids, { minLength: ids.length, maxLength: ids.length }).map(
      (correctOrder): QuestionInput => ({
        ...base,
        kind: "ordering",
        items: ids.map((id, i) => ({ id, text: texts[i] })),
        correctOrder,
      }),
    ),
  );

const matching = fc
  .tuple(common, choices(2, 5), choices(2, 6), fc.array(fc.nat(), { minLength: 5, maxLength: 5 }))
  .map(([base, [leftIds, leftTexts], [rightIds, rightTexts], picks]): QuestionInput => ({
    ...base,
    kind: "matching",
    left: leftIds.map((id, i) => ({ id, text: leftTexts[i] })),
    right: rightIds.map((id, i) => ({ id, text: rightTexts[i] })),
    correctPairs: Object.fromEntries(leftIds.map((id, i) => [id, rightIds[picks[i] % rightIds.length]])),
  }));

const hotspot = fc.tuple(common, choices(2, 5), fc.nat()).map(([base, [ids, labels], pick]): QuestionInput => ({
  ...base,
  kind: "hotspot",
  diagram: "polar-cardioid",
  regions: ids.map((id, i) => ({
    id,
    label: labels[i],
    shape: i % 2 === 0 ? { type: "circle", cx: 20 * i, cy: 10, r: 5 } : { type: "rect", x: 20 * i, y: 0, w: 8, h: 8 },
  })),
  correctRegionIds: [ids[pick % ids.length]],
}));

export const anyQuestionInput = fc.oneof(single, multiple, numeric, generated, ordering, matching, hotspot);
export const anyQuestion: fc.Arbitrary<Question> = anyQuestionInput.map((input) => questionSchema.parse(input));
export const orderingQuestionArb = ordering.map((input) => questionSchema.parse(input));
export const multipleQuestionArb = multiple.map((input) => questionSchema.parse(input));
export const matchingQuestionArb = matching.map((input) => questionSchema.parse(input));
