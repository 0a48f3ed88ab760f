// The fully correct answer to a question, as a learner would send it: what the tests grade
// to prove a key scores 1. Generated keys are drawn for `variantSeed` with `generators`.
import {
  acousticsGenerators,
  computeGeneratedKey,
  drawQuestionInputs,
  type Answer,
  type GeneratorRegistry,
  type Question,
} from "@/lib/assessment";

export function keyAnswer(question: Question, variantSeed: number, generators: GeneratorRegistry = acousticsGenerators): Answer {
  switch (question.kind) {
    case "single":
      return { kind: "single", optionId: question.correctOptionId };
    case "multiple":
      return { kind: "multiple", optionIds: [...question.correctOptionIds] };
    case "numeric":
      return { kind: "numeric", value: question.answer, unit: question.unit };
    case "generated": {
      const key = computeGeneratedKey(question, drawQuestionInputs(question, variantSeed), generators);
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
