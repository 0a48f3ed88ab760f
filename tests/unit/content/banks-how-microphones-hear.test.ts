import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import {
  HYPERCARDIOID_A,
  micOutputVolts,
  micSensitivityDbv,
  patternFigures,
  patternLevelDb,
  PHANTOM_SUPPLIES,
  phantomAtMic,
  PICKUP_PATTERNS,
  proximityBoostDb,
  SUBCARDIOID_A,
  SUPERCARDIOID_A,
  voltsToDbu,
  voltsToDbv,
} from "@/lib/acoustics";
import {
  acousticsGenerators,
  ANSWER_KEY_FIELDS,
  computeGeneratedKey,
  convertUnit,
  drawInputs,
  drawQuestionInputs,
  gradeAnswer,
  gradeAttempt,
  questionBankSchema,
  renderGeneratedPrompt,
  toClientQuestion,
  unitsOfSameQuantity,
  type Answer,
  type AttemptAnswers,
  type Question,
  type QuestionBank,
  type QuestionKind,
  type QuestionOfKind,
} from "@/lib/assessment";
import { DIAGRAMS, isDiagramName } from "@/components/diagrams/registry";

// Question banks of the course how-microphones-hear (content/banks/how-microphones-hear/*.json):
// shape, coverage, hotspot geometry, generated ranges, client views, and every computed key
// checked against lib/acoustics with the source of the value beside it.

const COURSE_SLUG = "how-microphones-hear";
const BANK_DIR = path.resolve(import.meta.dirname, "../../../content/banks", COURSE_SLUG);
const COURSE_FILE = path.resolve(import.meta.dirname, "../../../content/courses", COURSE_SLUG, "course.json");

/** Speed of sound pinned for the proximity figures, as the lessons state (REFERENCES.md §2 and §3). */
const SPEED_OF_SOUND_MS = 343.0;
const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
const FIGURE8_A = PICKUP_PATTERNS.figure8.a;
const CM_PER_M = 100;

const ALL_KINDS: readonly QuestionKind[] = ["single", "multiple", "numeric", "generated", "ordering", "matching", "hotspot"];
const GENERATED_SEEDS = Array.from({ length: 20 }, (_, index) => index * 7919 + 1);
const CLIENT_SEEDS = [1, 42, 2024];

interface CourseFile {
  id: string;
  modules: { id: string; slug: string }[];
}

const course = JSON.parse(readFileSync(COURSE_FILE, "utf8")) as CourseFile;

function loadBank(fileName: string): QuestionBank {
  return questionBankSchema.parse(JSON.parse(readFileSync(path.join(BANK_DIR, fileName), "utf8")));
}

const bankFiles = readdirSync(BANK_DIR).filter((name) => name.endsWith(".json"));
const banks = new Map(bankFiles.map((name) => [name.replace(/\.json$/, ""), loadBank(name)]));

function allQuestions(): { bankSlug: string; question: Question }[] {
  return [...banks.entries()].flatMap(([bankSlug, bank]) => bank.questions.map((question) => ({ bankSlug, question })));
}

function questionsOfKind<K extends QuestionKind>(kind: K): { bankSlug: string; question: QuestionOfKind<K> }[] {
  return allQuestions().filter((entry): entry is { bankSlug: string; question: QuestionOfKind<K> } => entry.question.kind === kind);
}

function firstNullDeg(a: number): number {
  return patternFigures({ a }).nullAnglesDeg[0];
}

function cardioidBoostAt100HzDb(distanceM: number): number {
  return proximityBoostDb({ a: CARDIOID_A, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

/**
 * Every numeric key, recomputed with lib/acoustics, in the question's own unit.
 * Keyed "<bank>/<question id>" because question ids are unique only within a bank.
 */
const NUMERIC_KEYS: Record<string, number> = {
  // IEC 61938 P48 feed network: the mic sees the two 6.81 kΩ resistors in parallel, R/2 = 3.405 kΩ (REFERENCES.md §7)
  "transducers/q-transducers-06": PHANTOM_SUPPLIES.P48.feedResistorPerLegOhms / 2,
  // IEC 61938: V_mic = V − I·R/2; 24.17 V at 7 mA from 48 V (REFERENCES.md §7 [derived])
  "transducers/q-transducers-07": phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 7 }).voltsAtMic,
  // REFERENCES.md §6: 2 mV/Pa → −53.98 dB re 1 V/Pa (sengpielaudio; IEC 60268-4 V/Pa)
  "transducers/q-transducers-11": micSensitivityDbv({ mvPerPa: 2 }),
  // REFERENCES.md §6: output at SPL V = S·10^((L − 94)/20); 12 mV/Pa at 134 dB SPL → 1.2 V [derived]
  "transducers/q-transducers-12": micOutputVolts({ mvPerPa: 12, splDb: 134, assume94DbIs1Pa: true }),
  // REFERENCES.md §6: 0 dBu = 0.7746 V; 2 mV → −51.76 dBu [derived]
  "transducers/q-transducers-13": voltsToDbu(micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true })),

  // Eargle, The Microphone Book, Table 6-1 (DF 3) and REFERENCES.md §1: cardioid DSF 1.732; 30 cm × DSF
  "pickup-patterns/q-pickup-patterns-04": 0.3 * patternFigures({ a: CARDIOID_A }).distanceFactor * CM_PER_M,
  // Eargle Table 6-1 (RE 0.25) and REFERENCES.md §1: hypercardioid ambient rejection −6.02 dB
  "pickup-patterns/q-pickup-patterns-05": patternFigures({ a: HYPERCARDIOID_A }).ambientRejectionDb,
  // REFERENCES.md §1: supercardioid (exact optimum, Heller 2011) at 90° → −8.730 dB
  "pickup-patterns/q-pickup-patterns-06": patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 90 }),
  // Eargle ch. 5, r(θ) = A + B·cos θ, at the hypercardioid's 109.47° null (REFERENCES.md §1 formulas [derived]): −16.21 dB
  "pickup-patterns/q-pickup-patterns-07": patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: firstNullDeg(HYPERCARDIOID_A) }),
  // REFERENCES.md §2: figure-8 at 10 cm, 100 Hz, c = 343 → 14.886 dB (= cardioid at 5 cm)
  "pickup-patterns/q-pickup-patterns-13": proximityBoostDb({ a: FIGURE8_A, distanceM: 0.1, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS }),

  // REFERENCES.md §7: 26.98 V at 5 mA from a 44 V supply [derived]
  "final/q-final-04": phantomAtMic({ supply: "P48", supplyV: 44, currentMa: 5 }).voltsAtMic,
  // REFERENCES.md §6: 20 mV/Pa → −33.98 dB re 1 V/Pa
  "final/q-final-05": micSensitivityDbv({ mvPerPa: 20 }),
  // REFERENCES.md §6: V = S·10^((L − 94)/20) → 0.2 V; 0 dBu = 0.7746 V → −11.76 dBu [derived]
  "final/q-final-06": voltsToDbu(micOutputVolts({ mvPerPa: 2, splDb: 134, assume94DbIs1Pa: true })),
  // Eargle Table 6-1 (DF 4) and REFERENCES.md §1: hypercardioid DSF 2.000; 25 cm × DSF
  "final/q-final-10": 0.25 * patternFigures({ a: HYPERCARDIOID_A }).distanceFactor * CM_PER_M,
  // REFERENCES.md §1 (HyperPhysics prints −12 at 90°): hypercardioid 90° → −12.041 dB
  "final/q-final-11": patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: 90 }),
  // Eargle ch. 5 formula at 109.47° (REFERENCES.md §1 [derived]): cardioid → 20·log10(1/3) = −9.54 dB
  "final/q-final-12": patternLevelDb({ a: CARDIOID_A, angleDeg: firstNullDeg(HYPERCARDIOID_A) }),
  // REFERENCES.md §2: figure-8 at 5 cm, 100 Hz, c = 343 → 20.799 dB
  "final/q-final-15": proximityBoostDb({ a: FIGURE8_A, distanceM: 0.05, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS }),
  // REFERENCES.md §2 model (c = 343, 100 Hz): 2 cm 22.72 dB [derived] minus 30 cm 2.619 dB
  "final/q-final-16": cardioidBoostAt100HzDb(0.02) - cardioidBoostAt100HzDb(0.3),
};

/** Decimals written in the bank's key, so the library value must round to the printed key. */
function writtenDecimals(value: number): number {
  const text = String(value);
  const dot = text.indexOf(".");
  return dot < 0 ? 0 : text.length - dot - 1;
}

const GRADING_SEED = 20250401;

function keyAnswer(question: Question, variantSeed: number): Answer {
  switch (question.kind) {
    case "single":
      return { kind: "single", optionId: question.correctOptionId };
    case "multiple":
      return { kind: "multiple", optionIds: [...question.correctOptionIds] };
    case "numeric":
      return { kind: "numeric", value: question.answer, unit: question.unit };
    case "generated": {
      const key = computeGeneratedKey(question, drawQuestionInputs(question, variantSeed), acousticsGenerators);
      return { kind: "generated", value: key.value, unit: key.unit };
    }
    case "ordering":
      return { kind: "ordering", order: [...question.correctOrder] };
    case "matching":
      return { kind: "matching", pairs: { ...question.correctPairs } };
    case "hotspot":
      return { kind: "hotspot", pick: { by: "region", regionId: question.correctRegionIds[0] } };
  }
}

function textFields(bank: QuestionBank): string[] {
  const texts = [bank.title];
  for (const question of bank.questions) {
    texts.push(question.topic, question.prompt, question.explanation);
    if (question.kind === "single" || question.kind === "multiple") texts.push(...question.options.map((o) => o.text));
    if (question.kind === "ordering") texts.push(...question.items.map((item) => item.text));
    if (question.kind === "matching") texts.push(...question.left.map((l) => l.text), ...question.right.map((r) => r.text));
    if (question.kind === "hotspot") texts.push(...question.regions.map((region) => region.label));
  }
  return texts;
}

describe(`${COURSE_SLUG} question banks: files and settings`, () => {
  it("has one bank per module plus a final, and nothing else", () => {
    const expected = [...course.modules.map((module) => module.slug), "final"].sort();
    expect([...banks.keys()].sort()).toEqual(expected);
  });

  it.each(course.modules.map((module) => [module.slug, module.id] as const))(
    "module bank %s: ids, ≥ 15 questions, every kind, quiz settings",
    (slug, moduleId) => {
      const bank = banks.get(slug)!;
      expect(bank.id).toBe(`bank-${COURSE_SLUG}-${slug}`);
      expect(bank.moduleId).toBe(moduleId);
      expect(bank.courseId).toBe(course.id);
      expect(bank.settings).toEqual({
        passingPercent: 70,
        attemptsAllowed: 3,
        timeLimitMinutes: null,
        showCorrectAnswers: true,
        shuffleQuestions: true,
      });
      expect(bank.questions.length).toBeGreaterThanOrEqual(15);
      const kinds = new Set(bank.questions.map((question) => question.kind));
      for (const kind of ALL_KINDS) expect(kinds, `${slug} lacks a ${kind} question`).toContain(kind);
      for (const question of bank.questions) expect(question.id).toMatch(new RegExp(`^q-${slug}-\\d{2}$`));
    },
  );

  it("final bank: ids, ≥ 20 questions, final settings", () => {
    const bank = banks.get("final")!;
    expect(bank.id).toBe(`bank-${COURSE_SLUG}-final`);
    expect(bank.moduleId).toBeNull();
    expect(bank.courseId).toBe(course.id);
    expect(bank.settings).toEqual({
      passingPercent: 75,
      attemptsAllowed: 2,
      timeLimitMinutes: 40,
      showCorrectAnswers: true,
      shuffleQuestions: true,
    });
    expect(bank.questions.length).toBeGreaterThanOrEqual(20);
    for (const question of bank.questions) expect(question.id).toMatch(/^q-final-\d{2}$/);
  });

  it("explanations are 2–4 sentences", () => {
    for (const { bankSlug, question } of allQuestions()) {
      const sentences = question.explanation.match(/[.!?](?=\s|$)/g) ?? [];
      expect(sentences.length, `${bankSlug}/${question.id}`).toBeGreaterThanOrEqual(2);
      expect(sentences.length, `${bankSlug}/${question.id}`).toBeLessThanOrEqual(4);
    }
  });

  it("no text looks like a product model number (letters followed by digits)", () => {
    // P48 is the IEC 61938 name of the 48 V phantom supply and log10 the base-10 logarithm; neither is a product.
    const allowed = new Set(["P48", "log10"]);
    for (const bank of banks.values()) {
      for (const text of textFields(bank)) {
        const suspects = (text.match(/\b[A-Za-z]{1,4}-?\d{2,}[A-Za-z]*\b/g) ?? []).filter((token) => !allowed.has(token));
        expect(suspects, text).toEqual([]);
      }
    }
  });
});

describe(`${COURSE_SLUG} question banks: keys grade as correct`, () => {
  it.each([...banks.keys()])("%s: every key scores 1, and the whole key scores 100 %%", (slug) => {
    const bank = banks.get(slug)!;
    const context = { generators: acousticsGenerators, variantSeed: GRADING_SEED };
    const answers: AttemptAnswers = {};
    for (const question of bank.questions) {
      const answer = keyAnswer(question, GRADING_SEED);
      answers[question.id] = answer;
      expect(gradeAnswer(question, answer, context), `${slug}/${question.id}`).toEqual({ score: 1, correct: true });
    }
    const attempt = gradeAttempt(bank.questions, answers, context);
    expect(attempt.percent).toBe(100);
    expect(attempt.topicsToRevisit).toEqual([]);
  });

  it("numeric keys are also accepted in every other unit of the same quantity", () => {
    for (const { bankSlug, question } of questionsOfKind("numeric")) {
      for (const unit of unitsOfSameQuantity(question.unit)) {
        const value = convertUnit(question.answer, question.unit, unit);
        expect(gradeAnswer(question, { kind: "numeric", value, unit }).score, `${bankSlug}/${question.id} in ${unit}`).toBe(1);
      }
    }
  });
});

describe(`${COURSE_SLUG} question banks: numeric keys match lib/acoustics`, () => {
  it("every numeric question has a recorded library value, and every record has a question", () => {
    const numericIds = questionsOfKind("numeric").map(({ bankSlug, question }) => `${bankSlug}/${question.id}`);
    expect(numericIds.sort()).toEqual(Object.keys(NUMERIC_KEYS).sort());
  });

  it.each(Object.entries(NUMERIC_KEYS))("%s equals the library value to the digits written", (bankAndId, libraryValue) => {
    const [bankSlug, questionId] = bankAndId.split("/");
    const question = banks.get(bankSlug)!.questions.find((q) => q.id === questionId);
    if (question?.kind !== "numeric") throw new Error(`${bankAndId} is not a numeric question`);
    expect(Number.isFinite(libraryValue)).toBe(true);
    expect(question.answer).toBeCloseTo(libraryValue, writtenDecimals(question.answer));
    // The unrounded library value must itself be graded correct.
    expect(gradeAnswer(question, { kind: "numeric", value: libraryValue, unit: question.unit }).score).toBe(1);
  });
});

describe(`${COURSE_SLUG} question banks: computed keys of other kinds match lib/acoustics`, () => {
  const patternA = {
    cardioid: CARDIOID_A,
    supercardioid: SUPERCARDIOID_A,
    hypercardioid: HYPERCARDIOID_A,
    figure8: FIGURE8_A,
    omni: PICKUP_PATTERNS.omni.a,
    subcardioid: SUBCARDIOID_A,
  } as const;

  function question<K extends QuestionKind>(bankSlug: string, id: string, kind: K): QuestionOfKind<K> {
    const found = banks.get(bankSlug)!.questions.find((q) => q.id === id);
    if (found?.kind !== kind) throw new Error(`${bankSlug}/${id} is not a ${kind} question`);
    return found as QuestionOfKind<K>;
  }

  it("null-angle matching agrees with θ₀ = arccos(−A/B)", () => {
    // REFERENCES.md §1 / Eargle ch. 5: nulls 180°, 125.26°, 109.47°, 90°, none for omni
    const match = question("pickup-patterns", "q-pickup-patterns-03", "matching");
    const rightDeg: Record<string, number | null> = { deg180: 180, deg125: 125, deg110: 109.5, deg90: 90, none: null, deg150: 150, deg70: 70 };
    for (const [patternId, rightId] of Object.entries(match.correctPairs)) {
      const nulls = patternFigures({ a: patternA[patternId as keyof typeof patternA] }).nullAnglesDeg;
      const expected = rightDeg[rightId];
      if (expected === null) expect(nulls).toEqual([]);
      else expect(Math.abs(nulls[0] - expected)).toBeLessThan(1);
    }
    // The distractor angles are no pattern's null (so they are unambiguously wrong).
    for (const a of Object.values(patternA)) {
      const nulls = patternFigures({ a }).nullAnglesDeg;
      for (const distractorDeg of [150, 70]) expect(nulls.every((deg) => Math.abs(deg - distractorDeg) > 5)).toBe(true);
    }
  });

  it("side-rejection ordering agrees with 20·log10 A at 90°", () => {
    // REFERENCES.md §1: 90° levels −6.021, −8.730, −12.041, −∞ dB
    const ordering = question("pickup-patterns", "q-pickup-patterns-10", "ordering");
    const levels = ordering.correctOrder.map((id) => patternLevelDb({ a: patternA[id as keyof typeof patternA], angleDeg: 90 }));
    for (let index = 1; index < levels.length; index++) expect(levels[index]).toBeLessThan(levels[index - 1]);
  });

  it("the pattern loudest at 180° among cardioid, super and hyper is the hypercardioid", () => {
    // REFERENCES.md §1: 180° levels −∞, −11.439, −6.021 dB
    const single = question("pickup-patterns", "q-pickup-patterns-08", "single");
    const ids = single.options.map((option) => option.id as keyof typeof patternA);
    const loudest = ids.reduce((best, id) =>
      patternLevelDb({ a: patternA[id], angleDeg: 180 }) > patternLevelDb({ a: patternA[best], angleDeg: 180 }) ? id : best,
    );
    expect(single.correctOptionId).toBe(loudest);
  });

  it("random-energy-efficiency matching agrees with REE = A² + B²/3", () => {
    // Eargle Table 6-1 and REFERENCES.md §1: REE 1, 0.52, 1/3, 1/3, 0.268, 0.25
    const match = question("final", "q-final-09", "matching");
    const rightValue: Record<string, number> = { one: 1, half: 0.52, third: 1 / 3, p27: 0.27, quarter: 0.25, zero: 0 };
    for (const [patternId, rightId] of Object.entries(match.correctPairs)) {
      const ree = patternFigures({ a: patternA[patternId as keyof typeof patternA] }).randomEnergyEfficiency;
      expect(Math.abs(ree - rightValue[rightId])).toBeLessThan(0.005);
    }
  });

  it("the least diffuse pickup belongs to the hypercardioid", () => {
    // Eargle Table 6-1: the hypercardioid has the lowest RE (0.25) of the first-order family
    const single = question("final", "q-final-14", "single");
    expect(single.correctOptionId).toBe("hyper");
    const lowest = Object.entries(patternA).reduce((best, entry) =>
      patternFigures({ a: entry[1] }).randomEnergyEfficiency < patternFigures({ a: best[1] }).randomEnergyEfficiency ? entry : best,
    );
    expect(lowest[0]).toBe("hypercardioid");
  });

  it("20 dB more pressure is ten times the voltage", () => {
    // common practice: a level difference is 20·log10 of the voltage ratio (REFERENCES.md §6)
    expect(question("final", "q-final-07", "single").correctOptionId).toBe("x10");
    expect(voltsToDbv(10)).toBeCloseTo(20, 9);
  });
});

describe(`${COURSE_SLUG} question banks: generated questions`, () => {
  it.each(questionsOfKind("generated").map(({ bankSlug, question }) => [`${bankSlug}/${question.id}`, question] as const))(
    "%s: 20 seeds draw inputs inside the ranges and give a finite key",
    (_label, question) => {
      const generator = acousticsGenerators[question.generator];
      for (const input of generator.inputs) expect(question.prompt).toContain(`{${input}}`);
      for (const seed of GENERATED_SEEDS) {
        const inputs = drawInputs(seed, question.ranges);
        for (const [name, range] of Object.entries(question.ranges)) {
          expect(inputs[name]).toBeGreaterThanOrEqual(range.min);
          expect(inputs[name]).toBeLessThanOrEqual(range.max);
          const steps = (inputs[name] - range.min) / range.step;
          expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-6);
        }
        expect(Number.isFinite(generator.compute(inputs).value)).toBe(true);
        expect(renderGeneratedPrompt(question, drawQuestionInputs(question, seed))).not.toMatch(/\{[A-Za-z]/);
        const key = computeGeneratedKey(question, drawQuestionInputs(question, seed), acousticsGenerators);
        const context = { generators: acousticsGenerators, variantSeed: seed };
        expect(gradeAnswer(question, { kind: "generated", value: key.value, unit: key.unit }, context).score).toBe(1);
      }
    },
  );
});

describe(`${COURSE_SLUG} question banks: hotspots`, () => {
  it.each(questionsOfKind("hotspot").map(({ bankSlug, question }) => [`${bankSlug}/${question.id}`, question] as const))(
    "%s: regions are exactly the diagram's positions, and a click on each correct mark scores 1",
    (_label, question) => {
      expect(isDiagramName(question.diagram)).toBe(true);
      if (!isDiagramName(question.diagram)) return;
      const positions = DIAGRAMS[question.diagram].positions;
      expect(question.regions).toEqual(
        positions.map((position) => ({
          id: position.id,
          label: position.label,
          shape: { type: "circle", cx: position.x, cy: position.y, r: position.r },
        })),
      );
      for (const position of positions) {
        const pick = { kind: "hotspot", pick: { by: "point", x: position.x, y: position.y } } as const;
        const expected = question.correctRegionIds.includes(position.id) ? 1 : 0;
        expect(gradeAnswer(question, pick).score, position.id).toBe(expected);
      }
    },
  );
});

describe(`${COURSE_SLUG} question banks: client views carry no key`, () => {
  it("toClientQuestion never includes an answer-key field", () => {
    for (const { bankSlug, question } of allQuestions()) {
      for (const shuffleSeed of CLIENT_SEEDS) {
        const json = JSON.stringify(toClientQuestion(question, { shuffleSeed }));
        for (const field of ANSWER_KEY_FIELDS) expect(json, `${bankSlug}/${question.id}`).not.toContain(`"${field}":`);
      }
    }
  });
});
