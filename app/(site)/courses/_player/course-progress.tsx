"use client";
// The signed-in apprentice's progress on a course page (the page itself is static).
import Link from "next/link";
import { CheckIcon } from "@/components/ui/icons";
import { ProgressBar } from "@/components/ui/progress-bar";
import { useCourseProgress } from "@/components/home/use-progress";

/** Course progress and "Continue: …" for a viewer with a seat; nothing for anyone else. */
export function CourseProgressPanel({ courseSlug }: { courseSlug: string }) {
  const { course } = useCourseProgress(courseSlug);
  if (!course) return null;
  return (
    <section aria-labelledby="course-progress" className="space-y-3 rounded-card border border-rule bg-surface-raised p-5" data-testid="course-progress">
      <h2 id="course-progress" className="text-title-3">
        Your progress
      </h2>
      <ProgressBar label="Course completed" valueNow={course.percent} valueText={`${course.percent}%`} />
      <p className="text-body-sm text-ink-muted">
        {course.completedLessons} of {course.totalLessons} lessons completed
      </p>
      {course.continueLesson ? (
        <p>
          <Link href={course.continueLesson.href} className="font-semibold" data-testid="continue-link">
            Continue: {course.continueLesson.title}
          </Link>
        </p>
      ) : (
        <p className="font-semibold text-success">You have completed every lesson of this course.</p>
      )}
    </section>
  );
}

/** "2 of 3 done · 66%" beside a module heading, for a viewer with a seat. */
export function ModuleProgressNote({ courseSlug, moduleSlug }: { courseSlug: string; moduleSlug: string }) {
  const { course } = useCourseProgress(courseSlug);
  const m = course?.modules.find((x) => x.slug === moduleSlug);
  if (!m) return null;
  return (
    <span className="font-mono text-body-sm text-ink-muted tabular-nums">
      {m.completedLessons} of {m.totalLessons} done · {m.percent}%
    </span>
  );
}

/** A "Completed" mark on a syllabus row once the viewer has completed the lesson. */
export function LessonDoneMark({ courseSlug, lessonId }: { courseSlug: string; lessonId: string }) {
  const { course } = useCourseProgress(courseSlug);
  if (!course?.completedLessonIds.includes(lessonId)) return null;
  return (
    <span className="inline-flex items-center gap-1 text-body-sm font-semibold text-success" data-testid="lesson-done">
      <CheckIcon />
      Completed
    </span>
  );
}
