"use client";
// Numeric and generated questions: a number typed as text (a decimal comma is accepted) and a
// unit chosen from the units of the same quantity; the server converts before comparing.
import { useId, useState } from "react";
import { FieldErrorMessage } from "@/components/ui/field-message";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import type { AnswerOfKind, ClientGeneratedQuestion, ClientNumericQuestion } from "@/lib/assessment";
import { UNITS, type UnitId } from "@/lib/assessment/units";
import { parseTypedNumber } from "./format";
import { QuestionFrame, type QuestionProps } from "./question-frame";

type NumericAnswer = AnswerOfKind<"numeric"> | AnswerOfKind<"generated">;

type NumericProps = Omit<QuestionProps<"numeric">, "question" | "answer" | "onAnswer"> & {
  question: ClientNumericQuestion | ClientGeneratedQuestion;
  answer: NumericAnswer | undefined;
  onAnswer: (answer: NumericAnswer, options?: { debounceMs?: number }) => void;
};

export function NumericQuestion({ question, answer, onAnswer, disabled, number, total }: NumericProps) {
  const base = `numeric-${useId()}`;
  const [text, setText] = useState(answer ? String(answer.value) : "");
  const [unit, setUnit] = useState<UnitId>(answer?.unit ?? question.unit);
  const typed = parseTypedNumber(text);
  const invalid = text.trim() !== "" && typed === null;

  function save(value: number | null, chosenUnit: UnitId, debounceMs: number) {
    if (value === null) return;
    onAnswer({ kind: question.kind, value, unit: chosenUnit }, { debounceMs });
  }

  return (
    <QuestionFrame
      question={question}
      number={number}
      total={total}
      instructions={`Type a number and choose its unit; any unit of the same quantity is accepted. ${question.kind === "generated" ? "The numbers in this question were drawn for your attempt." : ""}`}
    >
      <div className="flex flex-wrap items-start gap-4">
        <div className="flex min-w-40 flex-1 flex-col gap-1.5 sm:max-w-60">
          <label htmlFor={`${base}-value`} className="text-body font-semibold">
            Your answer
          </label>
          <Input
            id={`${base}-value`}
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            value={text}
            disabled={disabled}
            aria-invalid={invalid || undefined}
            aria-describedby={invalid ? `${base}-error` : undefined}
            onChange={(e) => {
              setText(e.currentTarget.value);
              save(parseTypedNumber(e.currentTarget.value), unit, 800);
            }}
            onBlur={() => save(typed, unit, 0)}
          />
          {invalid && <FieldErrorMessage id={`${base}-error`} error="Enter a number, for example 2.9 or 171.5." />}
        </div>
        <div className="flex w-32 flex-col gap-1.5">
          <label htmlFor={`${base}-unit`} className="text-body font-semibold">
            Unit
          </label>
          <Select
            id={`${base}-unit`}
            value={unit}
            disabled={disabled}
            onChange={(e) => {
              const next = e.currentTarget.value as UnitId;
              setUnit(next);
              save(typed, next, 150);
            }}
          >
            {question.acceptedUnits.map((u) => (
              <option key={u} value={u}>
                {UNITS[u].symbol}
              </option>
            ))}
          </Select>
        </div>
      </div>
    </QuestionFrame>
  );
}
