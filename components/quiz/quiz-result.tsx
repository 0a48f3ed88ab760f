// The result of a submitted attempt: score, pass or not, topics to revisit and, per question,
// the outcome in words and glyph (never colour alone, WCAG 1.4.1) and the answer given. The
// correct answers and explanations come only once the apprentice has no attempt left (and the
// bank allows them); until then a sentence says when they will be shown.
import type { Ref } from "react";
import Link from "next/link";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { Notice } from "@/components/ui/notice";
import type { QuestionOutcome, QuizResultDto } from "@/lib/dto/quiz";
import { formatPercent, formatUtc } from "./format";

const OUTCOME: Record<QuestionOutcome, { glyph: string; tone: BadgeTone; word: string }> = {
  correct: { glyph: "✓", tone: "success", word: "Correct" },
  "partly correct": { glyph: "◐", tone: "caution", word: "Partly correct" },
  incorrect: { glyph: "✗", tone: "danger", word: "Incorrect" },
  "not answered": { glyph: "–", tone: "neutral", word: "Not answered" },
};

function points(n: number): string {
  const rounded = Math.round(n * 100) / 100;
  return `${rounded} ${rounded === 1 ? "point" : "points"}`;
}

export function QuizResult({ result, headingRef }: { result: QuizResultDto; headingRef?: Ref<HTMLHeadingElement> }) {
  return (
    <section aria-labelledby="quiz-result-heading" className="flex flex-col gap-6" data-testid="quiz-result">
      <h2 id="quiz-result-heading" ref={headingRef} tabIndex={-1} className="text-title-2">
        Your result
      </h2>
      <div className="flex flex-wrap items-center gap-x-6 gap-y-3 rounded-card border border-rule bg-surface-raised p-5 shadow-raised">
        <p className="text-display font-bold tabular-nums" data-testid="result-percent">
          {formatPercent(result.percent)}
        </p>
        <div className="flex flex-col gap-1">
          <Badge tone={result.passed ? "success" : "danger"} withIcon className="self-start text-body-sm">
            {result.passed ? "Passed" : "Not passed yet"}
          </Badge>
          <p className="text-body-sm text-ink-muted">
            {points(result.earnedPoints)} of {points(result.possiblePoints)} · pass mark {result.passingPercent} % · submitted {formatUtc(result.submittedAt)}
          </p>
        </div>
      </div>
      {result.timedOut && (
        <Notice tone="caution" title="The time limit ran out">
          <p>The answers saved before the limit were graded.</p>
        </Notice>
      )}
      {result.answersNote && (
        <Notice tone="note" title="Correct answers and explanations">
          <p data-testid="answers-note">{result.answersNote}</p>
        </Notice>
      )}
      {result.topicsToRevisit.length > 0 && (
        <section aria-labelledby="topics-heading" className="flex flex-col gap-2">
          <h3 id="topics-heading" className="text-title-3">
            Topics to revisit
          </h3>
          <ul className="flex flex-wrap gap-2">
            {result.topicsToRevisit.map((topic) => (
              <li key={topic}>
                <Badge tone="note">{topic}</Badge>
              </li>
            ))}
          </ul>
        </section>
      )}
      <ol className="flex flex-col gap-4" aria-label="Question by question">
        {result.questions.map((q) => {
          const o = OUTCOME[q.outcome];
          return (
            <li key={q.questionId} className="flex flex-col gap-3 rounded-card border border-rule bg-surface-raised p-5">
              <h3 className="flex flex-wrap items-center gap-3 text-body font-semibold">
                <span>Question {q.number}</span>
                <Badge tone={o.tone}>
                  <span aria-hidden="true">{o.glyph}</span> {o.word}
                </Badge>
                <span className="text-body-sm font-normal text-ink-muted">
                  {points(q.earnedPoints)} of {points(q.points)}
                </span>
              </h3>
              <p className="text-body">{q.prompt}</p>
              <dl className="grid gap-x-4 gap-y-1 text-body-sm sm:grid-cols-[10rem_1fr]">
                <dt className="font-semibold">Your answer</dt>
                <dd>{q.yourAnswer ?? "No answer"}</dd>
                {q.correctAnswer !== null && (
                  <>
                    <dt className="font-semibold">Correct answer</dt>
                    <dd>{q.correctAnswer}</dd>
                  </>
                )}
              </dl>
              {q.explanation !== null && (
                <p className="border-l-4 border-note pl-3 text-body-sm">
                  <span className="font-semibold">Why: </span>
                  {q.explanation}
                </p>
              )}
            </li>
          );
        })}
      </ol>
      <p>
        <Link href="/learn/quizzes">Back to your quizzes</Link>
      </p>
    </section>
  );
}
