"use client";
import { Checkbox } from "@/components/ui/checkbox";
import { QuestionFrame, type QuestionProps } from "./question-frame";

/** The partial-credit rule of lib/assessment's gradeMultiple, in words the apprentice reads before answering. */
export const PARTIAL_CREDIT_RULE =
  "Tick every answer that is right. Each right tick earns its share of the points and each wrong tick takes a share away (never below zero), so only the exact set earns full points.";

export function MultipleQuestion({ question, answer, onAnswer, disabled, number, total }: QuestionProps<"multiple">) {
  const picked = new Set(answer?.optionIds ?? []);
  function toggle(optionId: string, on: boolean) {
    const next = question.options.map((o) => o.id).filter((id) => (id === optionId ? on : picked.has(id)));
    onAnswer({ kind: "multiple", optionIds: next }, { debounceMs: 300 });
  }
  return (
    <QuestionFrame question={question} number={number} total={total} instructions={PARTIAL_CREDIT_RULE}>
      <div className="flex flex-col gap-2">
        {question.options.map((option) => (
          <Checkbox key={option.id} label={option.text} checked={picked.has(option.id)} disabled={disabled} onChange={(e) => toggle(option.id, e.currentTarget.checked)} />
        ))}
      </div>
    </QuestionFrame>
  );
}
