// The checks every course's question banks must pass, run over each folder of content/banks:
// files and quiz settings, coverage of the seven kinds, wording rules, every key grading as
// correct (in any unit of its quantity), generated draws, hotspot geometry and key-free client
// views. Each course's own file (banks-<course>.test.ts) recomputes its numeric keys and the
// numbers its questions quote with lib/acoustics, each beside its source.
import { describe, expect, it } from "vitest";
import {
  ANSWER_KEY_FIELDS,
  acousticsGenerators,
  computeGeneratedKey,
  convertUnit,
  drawInputs,
  drawQuestionInputs,
  gradeAnswer,
  gradeAttempt,
  renderGeneratedPrompt,
  templatePlaceholders,
  toClientQuestion,
  unitsOfSameQuantity,
  type Answer,
  type AttemptAnswers,
} from "@/lib/assessment";
import { DIAGRAMS, isDiagramName } from "@/components/diagrams/registry";
import { positionLetter } from "@/components/diagrams/diagram-frame";
import { secretPresenter } from "@/lib/server/attempt-presenter";
import { ALL_KINDS, BANK_COURSE_SLUGS, keyAnswer, loadCourseBanks, visibleTexts } from "./course-banks";

const MODULE_MIN_QUESTIONS = 15;
const FINAL_MIN_QUESTIONS = 20;
const MODULE_SETTINGS = { passingPercent: 70, attemptsAllowed: 3, timeLimitMinutes: null, showCorrectAnswers: true, shuffleQuestions: true };
const FINAL_SETTINGS = { passingPercent: 75, attemptsAllowed: 2, timeLimitMinutes: 40, showCorrectAnswers: true, shuffleQuestions: true };
const SEEDS = Array.from({ length: 20 }, (_, index) => index * 7919 + 1);
const CLIENT_SEEDS = [1, 42, 2024];
// rules: no brand or model names. "log10" is the base-10 logarithm and P48 the IEC 61938 name of
// the 48 V phantom supply; neither is a product.
const MODEL_LIKE = /\b[A-Za-z]{1,4}-?\d{2,}[A-Za-z]*\b/g;
const NOT_MODELS = new Set(["log10", "P48"]);

it("every course with banks is checked", () => {
  expect(BANK_COURSE_SLUGS.length).toBeGreaterThanOrEqual(4);
});

describe.each(BANK_COURSE_SLUGS)("%s banks", (slug) => {
  const c = loadCourseBanks(slug);
  const label = (entry: { bankSlug: string; question: { id: string } }) => `${entry.bankSlug}/${entry.question.id}`;

  describe("files and settings", () => {
    it("has one bank per module plus a final, and nothing else", () => {
      expect(c.files).toEqual([...c.course.modules.map((module) => `${module.slug}.json`), "final.json"].sort());
    });

    it.each(c.course.modules.map((module) => [module.slug, module.id] as const))(
      "module bank %s: ids, settings, ≥ 15 questions of every kind",
      (moduleSlug, moduleId) => {
        const bank = c.banks.get(moduleSlug)!;
        expect(bank.id).toBe(`bank-${slug}-${moduleSlug}`);
        expect(bank.moduleId).toBe(moduleId);
        expect(bank.courseId).toBe(c.course.id);
        expect(bank.settings).toEqual(MODULE_SETTINGS);
        expect(bank.questions.length).toBeGreaterThanOrEqual(MODULE_MIN_QUESTIONS);
        expect(new Set(bank.questions.map((question) => question.kind))).toEqual(new Set(ALL_KINDS));
        for (const question of bank.questions) expect(question.id).toMatch(new RegExp(`^q-${moduleSlug}-\\d{2}$`));
      },
    );

    it("final bank: ids, settings, ≥ 20 questions", () => {
      const bank = c.banks.get("final")!;
      expect(bank.id).toBe(`bank-${slug}-final`);
      expect(bank.moduleId).toBeNull();
      expect(bank.courseId).toBe(c.course.id);
      expect(bank.settings).toEqual(FINAL_SETTINGS);
      expect(bank.questions.length).toBeGreaterThanOrEqual(FINAL_MIN_QUESTIONS);
      expect(new Set(bank.questions.map((question) => question.topic)).size, "topics of the final").toBeGreaterThanOrEqual(8);
      for (const question of bank.questions) expect(question.id).toMatch(/^q-final-\d{2}$/);
    });
  });

  describe("wording", () => {
    it("explanations are two to four sentences, and topics short labels", () => {
      for (const entry of c.questions) {
        // Sentence ends: ., ! or ? followed by a space or the end (so 0.5 is not an end).
        const sentences = entry.question.explanation.match(/[.!?](?=\s|$)/g) ?? [];
        expect(sentences.length, label(entry)).toBeGreaterThanOrEqual(2);
        expect(sentences.length, label(entry)).toBeLessThanOrEqual(4);
        expect(entry.question.topic.length, label(entry)).toBeLessThanOrEqual(40);
      }
    });

    it("no text a learner reads looks like a product model number (letters and digits run together)", () => {
      for (const bank of c.banks.values()) {
        const found = visibleTexts(bank).flatMap((text) => (text.match(MODEL_LIKE) ?? []).filter((token) => !NOT_MODELS.has(token)));
        expect(found, bank.id).toEqual([]);
      }
    });

    it("single choice offers at least three options; multiple response has a wrong option and more than one right one", () => {
      for (const entry of c.ofKind("single")) expect(entry.question.options.length, label(entry)).toBeGreaterThanOrEqual(3);
      for (const entry of c.ofKind("multiple")) {
        expect(entry.question.options.length, label(entry)).toBeGreaterThan(entry.question.correctOptionIds.length);
      }
      for (const entry of c.ofKind("multiple")) expect(entry.question.correctOptionIds.length, label(entry)).toBeGreaterThan(1);
    });
  });

  describe("keys grade as correct", () => {
    it.each([...c.banks.keys()])("%s: every key scores 1 for 20 seeds, and the whole key scores 100 %%", (bankSlug) => {
      const bank = c.banks.get(bankSlug)!;
      for (const seed of SEEDS) {
        const context = { generators: acousticsGenerators, variantSeed: seed };
        const answers: AttemptAnswers = {};
        for (const question of bank.questions) {
          answers[question.id] = keyAnswer(question, seed);
          expect(gradeAnswer(question, answers[question.id], context), `${bankSlug}/${question.id}`).toEqual({ score: 1, correct: true });
        }
        const attempt = gradeAttempt(bank.questions, answers, context);
        expect(attempt.percent).toBe(100);
        expect(attempt.topicsToRevisit).toEqual([]);
      }
    });

    it("an empty attempt scores 0 and lists every topic to revisit", () => {
      for (const bank of c.banks.values()) {
        const attempt = gradeAttempt(bank.questions, {}, { generators: acousticsGenerators, variantSeed: 1 });
        expect(attempt.percent).toBe(0);
        expect(new Set(attempt.topicsToRevisit)).toEqual(new Set(bank.questions.map((question) => question.topic)));
      }
    });

    it("numeric and generated keys are accepted in every other unit of the same quantity", () => {
      for (const entry of c.ofKind("numeric")) {
        const { question } = entry;
        for (const unit of unitsOfSameQuantity(question.unit)) {
          const value = convertUnit(question.answer, question.unit, unit);
          expect(gradeAnswer(question, { kind: "numeric", value, unit }).score, `${label(entry)} in ${unit}`).toBe(1);
        }
      }
      for (const entry of c.ofKind("generated")) {
        const { question } = entry;
        const context = { generators: acousticsGenerators, variantSeed: 7 };
        const key = computeGeneratedKey(question, drawQuestionInputs(question, 7), acousticsGenerators);
        for (const unit of unitsOfSameQuantity(key.unit)) {
          const value = convertUnit(key.value, key.unit, unit);
          expect(gradeAnswer(question, { kind: "generated", value, unit }, context).score, `${label(entry)} in ${unit}`).toBe(1);
        }
      }
    });
  });

  describe("generated questions", () => {
    it.each(c.ofKind("generated").map((entry) => [label(entry), entry.question] as const))(
      "%s: the prompt shows every input; 20 seeds draw on the grid, fill the prompt and give a finite key",
      (_label, question) => {
        const generator = acousticsGenerators[question.generator];
        expect(new Set(templatePlaceholders(question.prompt))).toEqual(new Set(generator.inputs));
        for (const seed of SEEDS) {
          const inputs = drawInputs(seed, question.ranges);
          for (const [name, range] of Object.entries(question.ranges)) {
            expect(inputs[name], `${name} seed ${seed}`).toBeGreaterThanOrEqual(range.min);
            expect(inputs[name], `${name} seed ${seed}`).toBeLessThanOrEqual(range.max);
            const steps = (inputs[name] - range.min) / range.step;
            expect(Math.abs(steps - Math.round(steps)), `${name} on its grid`).toBeLessThan(1e-6);
          }
          expect(Number.isFinite(generator.compute(inputs).value), `seed ${seed}`).toBe(true);
          expect(renderGeneratedPrompt(question, drawQuestionInputs(question, seed))).not.toMatch(/\{[A-Za-z]/);
        }
      },
    );
  });

  describe("hotspots", () => {
    it.each(c.ofKind("hotspot").map((entry) => [label(entry), entry.question] as const))(
      "%s: regions are the diagram's positions, labelled by letter or by name, and only a correct mark scores",
      (_label, question) => {
        expect(isDiagramName(question.diagram)).toBe(true);
        if (!isDiagramName(question.diagram)) return;
        const positions = DIAGRAMS[question.diagram].positions;
        expect(question.regions.map((region) => ({ id: region.id, shape: region.shape }))).toEqual(
          positions.map((position) => ({ id: position.id, shape: { type: "circle", cx: position.x, cy: position.y, r: position.r } })),
        );
        // The quiz draws letters in position order (hotspot-layer.tsx); a bank labels every region
        // either with that letter or with the position's neutral name, never with anything else.
        const lettered = question.regions.every((region, index) => region.label === `Position ${positionLetter(index)}`);
        if (!lettered) expect(question.regions.map((region) => region.label)).toEqual(positions.map((position) => position.label));
        for (const position of positions) {
          const pick: Answer = { kind: "hotspot", pick: { by: "point", x: position.x, y: position.y } };
          expect(gradeAnswer(question, pick).score, position.id).toBe(question.correctRegionIds.includes(position.id) ? 1 : 0);
        }
      },
    );
  });

  describe("client views", () => {
    it("carry no answer-key field and no explanation, whatever the shuffle", () => {
      for (const entry of c.questions) {
        for (const seed of CLIENT_SEEDS) {
          const presenter = secretPresenter(Buffer.alloc(32, seed).toString("base64url"));
          const json = JSON.stringify(toClientQuestion(entry.question, { presenter, variantSeed: seed }));
          for (const field of ANSWER_KEY_FIELDS) expect(json, `${label(entry)} ${field}`).not.toContain(`"${field}":`);
          expect(json, label(entry)).not.toContain(JSON.stringify(entry.question.explanation).slice(1, -1));
        }
      }
    });
  });
});
