// The ids of what a person chooses among in a question (options, items, matching columns,
// hotspot regions), alike for the bank's question and the client view the browser is shown.
import type { ClientQuestion, Question } from "@/lib/assessment";

export function choiceIds(question: Question | ClientQuestion): string[] {
  switch (question.kind) {
    case "single":
    case "multiple":
      return question.options.map((o) => o.id);
    case "ordering":
      return question.items.map((i) => i.id);
    case "matching":
      return [...question.left, ...question.right].map((c) => c.id);
    case "hotspot":
      return question.regions.map((r) => r.id);
    default:
      return [];
  }
}
