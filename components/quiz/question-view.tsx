"use client";
import type { Answer, AnswerOfKind, ClientQuestion } from "@/lib/assessment";
import { HotspotQuestion } from "./hotspot-question";
import { MatchingQuestion } from "./matching-question";
import { MultipleQuestion } from "./multiple-question";
import { NumericQuestion } from "./numeric-question";
import { OrderingQuestion } from "./ordering-question";
import { SingleQuestion } from "./single-question";

type Props = {
  question: ClientQuestion;
  answer: Answer | undefined;
  onAnswer: (questionId: string, answer: Answer, options?: { debounceMs?: number }) => void;
  disabled: boolean;
  number: number;
  total: number;
};

/** Picks the interaction for the question's kind; an answer of another kind is ignored. */
export function QuestionView({ question, answer, onAnswer, disabled, number, total }: Props) {
  const common = { disabled, number, total, onAnswer: (a: Answer, o?: { debounceMs?: number }) => onAnswer(question.id, a, o) };
  const mine = <K extends Answer["kind"]>(kind: K) => (answer?.kind === kind ? (answer as AnswerOfKind<K>) : undefined);
  switch (question.kind) {
    case "single":
      return <SingleQuestion question={question} answer={mine("single")} {...common} />;
    case "multiple":
      return <MultipleQuestion question={question} answer={mine("multiple")} {...common} />;
    case "numeric":
      return <NumericQuestion question={question} answer={mine("numeric")} {...common} />;
    case "generated":
      return <NumericQuestion question={question} answer={mine("generated")} {...common} />;
    case "ordering":
      return <OrderingQuestion question={question} answer={mine("ordering")} {...common} />;
    case "matching":
      return <MatchingQuestion question={question} answer={mine("matching")} {...common} />;
    case "hotspot":
      return <HotspotQuestion question={question} answer={mine("hotspot")} {...common} />;
  }
}
