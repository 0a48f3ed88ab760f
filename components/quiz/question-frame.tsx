// Every question is a fieldset whose legend is its number and prompt (WCAG 1.3.1), with a line
// saying how to answer it (WCAG 3.3.2).
import type { ReactNode } from "react";
import type { AnswerOfKind, ClientQuestion } from "@/lib/assessment";

export type AnswerKind = ClientQuestion["kind"];

export type QuestionProps<K extends AnswerKind> = {
  question: Extract<ClientQuestion, { kind: K }>;
  answer: AnswerOfKind<K> | undefined;
  /** `debounceMs`: how long to wait for more changes before saving (typing waits longer than a click). */
  onAnswer: (answer: AnswerOfKind<K>, options?: { debounceMs?: number }) => void;
  disabled: boolean;
  number: number;
  total: number;
};

export function QuestionFrame({
  question,
  number,
  total,
  instructions,
  children,
}: {
  question: ClientQuestion;
  number: number;
  total: number;
  instructions: ReactNode;
  children: ReactNode;
}) {
  const base = `question-${question.id}`;
  return (
    <fieldset
      id={base}
      aria-describedby={`${base}-how`}
      data-kind={question.kind}
      className="scroll-mt-32 flex min-w-0 flex-col gap-4 rounded-card border border-rule bg-surface-raised p-5 shadow-raised"
    >
      <legend className="float-left mb-1 w-full">
        <span className="block text-caption font-semibold tracking-wide text-ink-muted uppercase">
          Question {number} of {total}
          <span className="font-normal normal-case"> · {question.points === 1 ? "1 point" : `${question.points} points`}</span>
        </span>
        <span className="mt-1 block text-lead font-semibold text-ink">{question.prompt}</span>
      </legend>
      <p id={`${base}-how`} className="text-body-sm text-ink-muted">
        {instructions}
      </p>
      {children}
    </fieldset>
  );
}
