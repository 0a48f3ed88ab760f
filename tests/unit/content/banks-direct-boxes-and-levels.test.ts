import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import {
  combNotchesHz,
  dbuToDbv,
  dbuToVolts,
  dbvToDbu,
  dbvToVolts,
  distanceForDelayM,
  micOutputVolts,
  phantomAtMic,
  reflectedImpedanceOhms,
  splDbFromPa,
  transformer,
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

// Question banks of the course direct-boxes-and-levels (content/banks/direct-boxes-and-levels/*.json):
// shape, coverage, hotspot geometry, generated ranges, client views, and every computed key
// checked against lib/acoustics with the source of the value beside it.

const COURSE_SLUG = "direct-boxes-and-levels";
const BANK_DIR = path.resolve(import.meta.dirname, "../../../content/banks", COURSE_SLUG);
const COURSE_FILE = path.resolve(import.meta.dirname, "../../../content/courses", COURSE_SLUG, "course.json");

/** Speed of sound pinned where a time offset is turned into notch frequencies (REFERENCES.md §3 and §4). */
const SPEED_OF_SOUND_MS = 343.0;
const OHMS_PER_KOHM = 1000;

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

/** Lowest comb notch of a signal summed with a copy delayed by delayMs: f = 1/(2τ) (REFERENCES.md §4). */
function firstNotchForDelayHz(delayMs: number): number {
  const pathDifferenceM = distanceForDelayM({ delayMs, speedOfSoundMs: SPEED_OF_SOUND_MS });
  return combNotchesHz({ pathDifferenceM, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 1 })[0];
}

/** Voltage of a power into a resistance, V = √(P·R) (common practice: P = V²/R). */
function voltsForPowerIntoLoad(powerW: number, loadOhms: number): number {
  return Math.sqrt(powerW * loadOhms);
}

/**
 * Every numeric key, recomputed with lib/acoustics, in the question's own unit.
 * Keyed "<bank>/<question id>" because question ids are unique only within a bank.
 */
const NUMERIC_KEYS: Record<string, number> = {
  // REFERENCES.md §6 (STx manual table "+4 dBu = 1.2276 V"; ITU-R V.574): +4 dBu → 1.22765 V
  "levels-and-lines/q-levels-and-lines-03": dbuToVolts(4),
  // REFERENCES.md §6 (ControlBooth "0.316 V"): −10 dBV → 0.316228 V
  "levels-and-lines/q-levels-and-lines-04": dbvToVolts(-10),
  // REFERENCES.md §6 (ControlBooth "11.78 dB"): +4 dBu vs −10 dBV → 11.7815 dB
  "levels-and-lines/q-levels-and-lines-05": 4 - dbvToDbu(-10),
  // REFERENCES.md §6: 0 dBV in dBu → +2.2185 dBu
  "levels-and-lines/q-levels-and-lines-06": dbvToDbu(0),
  // REFERENCES.md §6: 2 mV/Pa at 94 dB SPL → 2 mV = −51.76 dBu [derived]; gain to +4 dBu = 55.76 dB
  "levels-and-lines/q-levels-and-lines-07": 4 - voltsToDbu(micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true })),
  // REFERENCES.md §6 (ISO 1683:2015, 20 µPa): 1 Pa → 93.979 dB SPL
  "levels-and-lines/q-levels-and-lines-08": splDbFromPa(1),
  // common practice: voltage divider load/(source + load), as a level via 20·log10 (voltsToDbv of the ratio); REFERENCES.md §8 impedances
  "levels-and-lines/q-levels-and-lines-11": voltsToDbv(1500 / (150 + 1500)),

  // REFERENCES.md §8 (Ballou, Handbook for Sound Engineers, audio transformers): 12:1 → −21.58 dB
  "direct-boxes/q-direct-boxes-02": transformer({ turnsRatio: 12 }).voltageChangeDb,
  // REFERENCES.md §8: Z_p = N²·Z_s; 10:1 into 1.5 kΩ → 150 kΩ [derived]
  "direct-boxes/q-direct-boxes-03": reflectedImpedanceOhms({ turnsRatio: 10, loadOhms: 1500 }) / OHMS_PER_KOHM,
  // REFERENCES.md §8 with §6: +4 dBu − 21.58 dB → −17.58 dBu [derived]
  "direct-boxes/q-direct-boxes-04": 4 + transformer({ turnsRatio: 12 }).voltageChangeDb,
  // IEC 61938, REFERENCES.md §7: P48 at 48 V, 5 mA → 30.98 V
  "direct-boxes/q-direct-boxes-05": phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 }).voltsAtMic,
  // common practice P = V²/R (100 W, 8 Ω → 28.28 V), then REFERENCES.md §6 0 dBu = 0.7746 V → +31.25 dBu
  "direct-boxes/q-direct-boxes-14": voltsToDbu(voltsForPowerIntoLoad(100, 8)),
  // common practice: two identical signals sum to twice the voltage, 20·log10 2 = 6.02 dB (REFERENCES.md §4 peak +6.021 dB at a = 1)
  "direct-boxes/q-direct-boxes-15": voltsToDbv(2),
  // REFERENCES.md §4: notches at (2n − 1)/(2τ); τ = 2 ms → 250 Hz [derived]
  "direct-boxes/q-direct-boxes-16": firstNotchForDelayHz(2),

  // REFERENCES.md §6: −10 dBV = −7.7815 dBu
  "final/q-final-02": dbvToDbu(-10),
  // REFERENCES.md §6: +4 dBu = +1.78151 dBV
  "final/q-final-03": dbuToDbv(4),
  // REFERENCES.md §8: 10:1 → −20.00 dB
  "final/q-final-08": transformer({ turnsRatio: 10 }).voltageChangeDb,
  // REFERENCES.md §8: a 12:1 DI into 2 kΩ → 288 kΩ
  "final/q-final-09": reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 2000 }) / OHMS_PER_KOHM,
  // REFERENCES.md §6 and §8: −7.78 dBu − 20 dB → −27.78 dBu [derived]
  "final/q-final-10": dbvToDbu(-10) + transformer({ turnsRatio: 10 }).voltageChangeDb,
  // REFERENCES.md §8: 15:1 → −23.52 dB
  "final/q-final-11": transformer({ turnsRatio: 15 }).voltageChangeDb,
  // REFERENCES.md §4: τ = 0.5 ms → first notch 1000 Hz [derived]
  "final/q-final-17": firstNotchForDelayHz(0.5),
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
  function question<K extends QuestionKind>(bankSlug: string, id: string, kind: K): QuestionOfKind<K> {
    const found = banks.get(bankSlug)!.questions.find((q) => q.id === id);
    if (found?.kind !== kind) throw new Error(`${bankSlug}/${id} is not a ${kind} question`);
    return found as QuestionOfKind<K>;
  }

  /** Nominal voltages of the stage's signal bands, volts rms. */
  const nominalVolts: Record<string, number> = {
    // REFERENCES.md §6: 2 mV/Pa at 94 dB SPL (1 Pa) → 2 mV
    mic: micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true }),
    // REFERENCES.md §6: −10 dBV → 0.316 V
    consumer: dbvToVolts(-10),
    // REFERENCES.md §6: +4 dBu → 1.228 V
    pro: dbuToVolts(4),
    // common practice P = V²/R: 100 W into 8 Ω → 28.3 V
    speaker: voltsForPowerIntoLoad(100, 8),
  };

  it("level ordering agrees with the library's voltages", () => {
    const ordering = question("levels-and-lines", "q-levels-and-lines-09", "ordering");
    const volts = ordering.correctOrder.map((id) => nominalVolts[id]);
    for (let index = 1; index < volts.length; index++) expect(volts[index]).toBeGreaterThan(volts[index - 1]);
  });

  it("level matching agrees with the library's voltages", () => {
    const match = question("final", "q-final-23", "matching");
    const rightVolts: Record<string, number> = { v002: 0.002, v0316: 0.316, v1228: 1.228, v28: 28, v0775: 0.000775 };
    for (const [leftId, rightId] of Object.entries(match.correctPairs)) {
      expect(Math.abs(nominalVolts[leftId] - rightVolts[rightId]) / rightVolts[rightId]).toBeLessThan(0.02);
    }
    // The distractor is no band's nominal voltage.
    for (const volts of Object.values(nominalVolts)) expect(Math.abs(volts - rightVolts.v0775) / volts).toBeGreaterThan(0.5);
  });

  it("60 dB of common-mode rejection is one thousandth of the voltage", () => {
    // common practice: 20·log10 of a voltage ratio (REFERENCES.md §6)
    expect(question("levels-and-lines", "q-levels-and-lines-15", "single").correctOptionId).toBe("thousandth");
    expect(voltsToDbv(1 / 1000)).toBeCloseTo(-60, 9);
  });

  it("the dBu reference is the voltage of 1 mW into 600 Ω", () => {
    // REFERENCES.md §6: 0 dBu = √(1 mW × 600 Ω) = 0.7746 V
    expect(question("levels-and-lines", "q-levels-and-lines-01", "single").correctOptionId).toBe("milliwatt");
    expect(dbuToVolts(0)).toBeCloseTo(Math.sqrt(0.001 * 600), 12);
  });

  it("a thru jack's two 1 MΩ loads in parallel make about 0.5 MΩ", () => {
    // common practice: equal resistances in parallel give half of one
    expect(question("final", "q-final-15", "single").correctOptionId).toBe("half");
    const oneMegohm = 1e6;
    expect((oneMegohm * oneMegohm) / (oneMegohm + oneMegohm)).toBe(0.5e6);
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
