"use client";
// The quiz player: every question on one page, answers autosaved as they change, a timer when
// the quiz has a limit, a confirmed submit (WCAG 3.3.4) and the result announced when it comes.
// Grading happens only on the server; this component never sees a key before submission.
import { useCallback, useEffect, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Dialog, DialogClose, DialogContent, DialogFooter, DialogTrigger } from "@/components/ui/dialog";
import { Notice } from "@/components/ui/notice";
import type { Answer } from "@/lib/assessment";
import type { AttemptViewDto, QuizResultDto } from "@/lib/dto/quiz";
import { formatPercent } from "./format";
import { QuestionView } from "./question-view";
import { QuizResult } from "./quiz-result";
import { QuizTimer } from "./quiz-timer";
import { SaveStatus } from "./save-status";
import { useAnswerSaver } from "./use-answer-saver";

type Phase = "answering" | "submitting" | "done";
type SubmitReason = "button" | "timer" | "closed";

function announce(result: QuizResultDto): string {
  return `Submitted. You scored ${formatPercent(result.percent)}: ${result.passed ? "passed" : "not passed yet"} (pass mark ${result.passingPercent} %).`;
}

/** Keeps focused controls clear of the sticky status bar (WCAG 2.2 SC 2.4.11) via the root's scroll padding. */
function useStickyOffset() {
  const bar = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const element = bar.current;
    if (!element) return;
    const root = document.documentElement;
    const observer = new ResizeObserver(() => root.style.setProperty("--sticky-header-height", `${element.offsetHeight + 8}px`));
    observer.observe(element);
    return () => {
      observer.disconnect();
      root.style.removeProperty("--sticky-header-height");
    };
  }, []);
  return bar;
}

export function QuizPlayer({ view }: { view: AttemptViewDto }) {
  const router = useRouter();
  const [answers, setAnswers] = useState<Record<string, Answer>>(() => Object.fromEntries(Object.entries(view.answers).map(([id, saved]) => [id, saved.answer])));
  const [result, setResult] = useState<QuizResultDto | null>(view.result);
  const [phase, setPhase] = useState<Phase>(view.result ? "done" : "answering");
  const [submitError, setSubmitError] = useState<string | null>(null);
  const [announcement, setAnnouncement] = useState("");
  const [confirmOpen, setConfirmOpen] = useState(false);
  const submitting = useRef(false);
  const resultHeading = useRef<HTMLHeadingElement>(null);
  const statusBar = useStickyOffset();
  const initialSeq = Math.max(0, ...Object.values(view.answers).map((a) => a.seq));

  const showResult = useCallback((next: QuizResultDto) => {
    setResult(next);
    setPhase("done");
    setAnnouncement(announce(next));
  }, []);

  // Move focus to the result once it is on screen, and after the confirmation dialog has handed
  // focus back to its (now gone) trigger; a frame is not always enough for both.
  useEffect(() => {
    if (phase !== "done") return;
    const timer = setTimeout(() => resultHeading.current?.focus(), 80);
    return () => clearTimeout(timer);
  }, [phase]);

  const submitRef = useRef<(reason: SubmitReason) => Promise<void>>(async () => undefined);
  const { saver, snapshot } = useAnswerSaver(view.attemptId, initialSeq, () => void submitRef.current("closed"));

  const submit = useCallback(
    async (reason: SubmitReason) => {
      if (submitting.current) return;
      submitting.current = true;
      setPhase("submitting");
      setSubmitError(null);
      const flushed = reason === "closed" ? true : await saver.flush();
      if (!flushed && reason === "button") {
        setSubmitError("Some answers are not saved yet. They are being retried; submit again once the status says Saved.");
        setPhase("answering");
        submitting.current = false;
        return;
      }
      try {
        const response = await fetch(`/api/attempts/${view.attemptId}/submit`, { method: "POST", credentials: "same-origin" });
        const body = (await response.json()) as { result?: QuizResultDto; message?: string };
        if (response.ok && body.result) return showResult(body.result);
        if (response.status === 409) {
          // Too late: the server graded what it had. Its result is one request away.
          const late = await fetch(`/api/attempts/${view.attemptId}/result`, { credentials: "same-origin" });
          const lateBody = (await late.json()) as { result?: QuizResultDto };
          if (late.ok && lateBody.result) return showResult(lateBody.result);
          return router.refresh();
        }
        setSubmitError(body.message ?? "The quiz could not be submitted. Try again.");
      } catch {
        setSubmitError("We couldn't reach the server. Your saved answers are safe; try again in a moment.");
      }
      setPhase("answering");
      submitting.current = false;
    },
    [saver, showResult, router, view.attemptId],
  );
  useEffect(() => {
    submitRef.current = submit;
  }, [submit]);

  const unsaved = snapshot.unsavedQuestionIds.length > 0;
  useEffect(() => {
    if (!unsaved || phase === "done") return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [unsaved, phase]);

  function change(questionId: string, answer: Answer, options?: { debounceMs?: number }) {
    setAnswers((current) => ({ ...current, [questionId]: answer }));
    saver.change(questionId, answer, options?.debounceMs);
  }

  const onExpire = useCallback(() => void submit("timer"), [submit]);
  const total = view.questions.length;
  const answered = view.questions.filter((q) => answers[q.id] !== undefined).length;
  const locked = phase !== "answering";

  return (
    <div className="flex flex-col gap-6">
      <p role="status" className="sr-only">
        {announcement}
      </p>
      {result ? (
        <QuizResult result={result} headingRef={resultHeading} />
      ) : (
        <>
          <div ref={statusBar} className="sticky top-0 z-10 -mx-4 flex flex-wrap items-center justify-between gap-x-6 gap-y-2 border-b border-rule bg-surface/95 px-4 py-3 backdrop-blur">
            <SaveStatus snapshot={snapshot} />
            <p className="text-body-sm">
              <span className="font-semibold">Answered:</span> <span className="font-mono tabular-nums">{answered}</span> of {total}
            </p>
            {view.deadlineAt && <QuizTimer deadlineAt={view.deadlineAt} serverNow={view.serverNow} onExpire={onExpire} />}
          </div>
          {view.deadlineAt && (
            <Notice tone="note" title="This quiz is timed">
              <p>When the time runs out, the answers saved by then are submitted for you. If you need more time, ask your instructor before you start: they can give you extra minutes.</p>
            </Notice>
          )}
          {/* Not a <form>: Enter in a number field must never start the submission. */}
          <div className="flex flex-col gap-6">
            {view.questions.map((question, index) => (
              <QuestionView key={question.id} question={question} answer={answers[question.id]} onAnswer={change} disabled={locked} number={index + 1} total={total} />
            ))}
            <div className="flex flex-col gap-3 rounded-card border border-rule bg-surface-raised p-5">
              <p className="text-body-sm text-ink-muted">
                You have answered {answered} of {total} questions. Unanswered questions score nothing. Once submitted, answers can&apos;t be changed.
              </p>
              {submitError && (
                <Notice tone="danger" announce label="Not submitted">
                  <p>{submitError}</p>
                </Notice>
              )}
              <Dialog open={confirmOpen} onOpenChange={setConfirmOpen}>
                <DialogTrigger asChild>
                  <Button className="self-start" loading={phase === "submitting"} loadingText="submitting">
                    Submit answers…
                  </Button>
                </DialogTrigger>
                <DialogContent title="Submit your answers?" description={`You have answered ${answered} of ${total} questions.`}>
                  <p className="text-body">
                    After you submit, your answers can&apos;t be changed{answered < total ? ", and the questions left unanswered score nothing" : ""}.
                  </p>
                  <DialogFooter>
                    <DialogClose asChild>
                      <Button variant="secondary">Keep working</Button>
                    </DialogClose>
                    <Button
                      onClick={() => {
                        setConfirmOpen(false);
                        void submit("button");
                      }}
                    >
                      Submit now
                    </Button>
                  </DialogFooter>
                </DialogContent>
              </Dialog>
            </div>
          </div>
        </>
      )}
    </div>
  );
}
