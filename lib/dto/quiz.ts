// Client-safe DTOs of quiz attempts and results (lib/server/attempts.ts and quiz-banks.ts build
// them; the quiz player and the result view in components/quiz read them).
import type { Answer, ClientQuestion, Question } from "@/lib/assessment";

export type AttemptStatus = "in_progress" | "submitted" | "timed_out";
export type SavedAnswerDto = { answer: Answer; seq: number; savedAt: string };

export type QuestionOutcome = "correct" | "partly correct" | "incorrect" | "not answered";

export type QuestionResultDto = {
  number: number;
  questionId: string;
  kind: Question["kind"];
  topic: string;
  prompt: string;
  points: number;
  earnedPoints: number;
  /** Fraction of the points earned, 0…1. */
  score: number;
  outcome: QuestionOutcome;
  yourAnswer: string | null;
  /** null until the review policy allows it (ReviewDto in lib/server/quiz-banks.ts). */
  correctAnswer: string | null;
  /** null until the review policy allows it: an explanation usually gives the answer away. */
  explanation: string | null;
};

export type QuizResultDto = {
  attemptId: string;
  bankId: string;
  title: string;
  submittedAt: string;
  percent: number;
  passed: boolean;
  passingPercent: number;
  earnedPoints: number;
  possiblePoints: number;
  timedOut: boolean;
  /** Correct answers and explanations are in `questions` (see ReviewDto). */
  answersShown: boolean;
  /** When they are not: a sentence saying when they will be (or that this quiz never shows them). */
  answersNote: string | null;
  topicsToRevisit: string[];
  questions: QuestionResultDto[];
};

export type AttemptViewDto = {
  attemptId: string;
  bankId: string;
  title: string;
  courseSlug: string;
  status: AttemptStatus;
  startedAt: string;
  deadlineAt: string | null;
  submittedAt: string | null;
  /** The server's clock when the view was built, so the browser's timer can correct its own. */
  serverNow: string;
  passingPercent: number;
  timeLimitMinutes: number | null;
  attemptsAllowed: number;
  /** Client views only (no keys, no explanations), in the attempt's presented ids. */
  questions: ClientQuestion[];
  /** Saved answers, in the same presented ids. */
  answers: Record<string, SavedAnswerDto>;
  /** Only once submitted. */
  result: QuizResultDto | null;
};
