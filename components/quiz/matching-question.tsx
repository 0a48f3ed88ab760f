"use client";
import { useId } from "react";
import { Select } from "@/components/ui/select";
import { QuestionFrame, type QuestionProps } from "./question-frame";

/** One native select per left item; a right item may fit more than one left item. */
export function MatchingQuestion({ question, answer, onAnswer, disabled, number, total }: QuestionProps<"matching">) {
  const base = `matching-${useId()}`;
  const pairs = answer?.pairs ?? {};
  function choose(leftId: string, rightId: string) {
    const next: Record<string, string> = { ...pairs };
    if (rightId) next[leftId] = rightId;
    else delete next[leftId];
    onAnswer({ kind: "matching", pairs: next }, { debounceMs: 300 });
  }
  return (
    <QuestionFrame
      question={question}
      number={number}
      total={total}
      instructions="Choose the match for each item. Each correct match earns its share of the points; an option may fit more than one item, and some fit none."
    >
      <div className="grid gap-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)] sm:items-center">
        {question.left.map((left, index) => (
          <div key={left.id} className="contents">
            <label htmlFor={`${base}-${index}`} className="text-body font-semibold">
              {left.text}
            </label>
            <Select id={`${base}-${index}`} value={pairs[left.id] ?? ""} disabled={disabled} onChange={(e) => choose(left.id, e.currentTarget.value)}>
              <option value="">Choose a match…</option>
              {question.right.map((right) => (
                <option key={right.id} value={right.id}>
                  {right.text}
                </option>
              ))}
            </Select>
          </div>
        ))}
      </div>
    </QuestionFrame>
  );
}
