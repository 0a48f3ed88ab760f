// The fully correct answer to a question as a browser would send it: in the ids of the client
// view the apprentice was shown. The ids there mean nothing, so the key is found the way a person
// who knows the answer finds it: by the words of the options, items and positions.
import {
  acousticsGenerators,
  computeGeneratedKey,
  type Answer,
  type ClientQuestion,
  type GeneratorRegistry,
  type Question,
} from "@/lib/assessment";

type Shown = { id: string; text: string };

function shownIdOf(authored: readonly Shown[], shown: readonly Shown[], authoredId: string): string {
  const text = authored.find((c) => c.id === authoredId)?.text;
  const matches = shown.filter((c) => c.text === text);
  if (text === undefined || matches.length !== 1) throw new Error(`cannot find "${authoredId}" in the view by its words`);
  return matches[0].id;
}

export function keyAnswerForView(question: Question, view: ClientQuestion, generators: GeneratorRegistry = acousticsGenerators): Answer {
  if (view.id !== question.id || view.kind !== question.kind) throw new Error(`view of ${view.id} is not question ${question.id}`);
  switch (question.kind) {
    case "single":
      if (view.kind !== "single") break;
      return { kind: "single", optionId: shownIdOf(question.options, view.options, question.correctOptionId) };
    case "multiple":
      if (view.kind !== "multiple") break;
      return { kind: "multiple", optionIds: question.correctOptionIds.map((id) => shownIdOf(question.options, view.options, id)) };
    case "numeric":
      return { kind: "numeric", value: question.answer, unit: question.unit };
    case "generated": {
      if (view.kind !== "generated") break;
      const key = computeGeneratedKey(question, view.inputs, generators);
      return { kind: "generated", value: key.value, unit: key.unit };
    }
    case "ordering":
      if (view.kind !== "ordering") break;
      return { kind: "ordering", order: question.correctOrder.map((id) => shownIdOf(question.items, view.items, id)) };
    case "matching": {
      if (view.kind !== "matching") break;
      const pairs: Record<string, string> = {};
      for (const [left, right] of Object.entries(question.correctPairs)) {
        pairs[shownIdOf(question.left, view.left, left)] = shownIdOf(question.right, view.right, right);
      }
      return { kind: "matching", pairs };
    }
    case "hotspot": {
      if (view.kind !== "hotspot") break;
      const asShown = (regions: readonly { id: string; label: string }[]) => regions.map((r) => ({ id: r.id, text: r.label }));
      return { kind: "hotspot", pick: { by: "region", regionId: shownIdOf(asShown(question.regions), asShown(view.regions), question.correctRegionIds[0]) } };
    }
  }
  throw new Error(`view of ${question.id} has another kind`);
}
