"use client";
import { useId } from "react";
import { cx } from "@/components/ui/cx";
import { toggleBoxClassName } from "@/components/ui/checkbox";
import { QuestionFrame, type QuestionProps } from "./question-frame";

/** One answer from several: native radios (arrow keys move and choose). */
export function SingleQuestion({ question, answer, onAnswer, disabled, number, total }: QuestionProps<"single">) {
  const name = `single-${useId()}`;
  return (
    <QuestionFrame question={question} number={number} total={total} instructions="Choose one answer.">
      <div className="flex flex-col gap-1">
        {question.options.map((option) => (
          <label key={option.id} className="flex min-h-target cursor-pointer items-start gap-3 rounded-control px-2 py-1.5 hover:bg-surface-sunken">
            <span className="relative mt-0.5 inline-grid shrink-0 place-items-center">
              <input
                type="radio"
                name={name}
                value={option.id}
                checked={answer?.optionId === option.id}
                disabled={disabled}
                onChange={() => onAnswer({ kind: "single", optionId: option.id }, { debounceMs: 150 })}
                className={cx(toggleBoxClassName, "rounded-full")}
              />
              <span aria-hidden="true" className="pointer-events-none absolute hidden size-2.5 rounded-full bg-accent-ink peer-checked:block" />
            </span>
            <span className="text-body text-ink">{option.text}</span>
          </label>
        ))}
      </div>
    </QuestionFrame>
  );
}
