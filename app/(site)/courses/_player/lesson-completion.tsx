"use client";
// "Mark lesson complete" for an apprentice with a seat on the course; nothing for anyone else.
import { useState, useTransition } from "react";
import { PROGRESS_KEY, useCourseProgress } from "@/components/home/use-progress";
import { mutateRemote } from "@/lib/client/remote-data";
import { Button } from "@/components/ui/button";
import { CheckIcon } from "@/components/ui/icons";
import { markLessonCompleteAction } from "../[course]/[lesson]/actions";

export function LessonCompletion({ courseSlug, lessonId }: { courseSlug: string; lessonId: string }) {
  const { course } = useCourseProgress(courseSlug);
  const [pending, startTransition] = useTransition();
  const [problem, setProblem] = useState<string | null>(null);
  if (!course) return null;
  const done = course.completedLessonIds.includes(lessonId);

  const toggle = () =>
    startTransition(async () => {
      setProblem(null);
      const result = await markLessonCompleteAction({ courseSlug, lessonId, completed: !done });
      if (!result.ok) setProblem(result.message);
      await mutateRemote(PROGRESS_KEY);
    });

  return (
    <section aria-labelledby="lesson-done-heading" className="mt-10 rounded-card border border-rule bg-surface-raised p-5 print:hidden" data-testid="lesson-completion">
      <h2 id="lesson-done-heading" className="sr-only">
        Your progress on this lesson
      </h2>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p role="status" className={done ? "flex items-center gap-2 font-semibold text-success" : "text-ink"}>
          {done ? (
            <>
              <CheckIcon /> You have completed this lesson.
            </>
          ) : (
            "Finished reading? Mark the lesson complete to keep your place in the course."
          )}
        </p>
        <Button variant={done ? "secondary" : "primary"} onClick={toggle} loading={pending} loadingText="saving">
          {done ? "Mark as not done" : "Mark lesson complete"}
        </Button>
      </div>
      {problem ? (
        <p role="alert" className="mt-2 text-danger">
          {problem}
        </p>
      ) : null}
    </section>
  );
}
