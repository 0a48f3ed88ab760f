"use client";
// "Your progress" on the apprentice home: each course with a seat, its modules, and where to resume.
import Link from "next/link";
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";
import { ProgressBar } from "@/components/ui/progress-bar";
import { useProgress } from "./use-progress";

export function ProgressSection() {
  const { data, isLoading, error } = useProgress();
  return (
    <section aria-labelledby="your-progress" className="space-y-3" data-testid="progress-section">
      <h2 id="your-progress" className="text-xl font-semibold">
        Your progress
      </h2>
      {isLoading ? (
        <LoadingRegion label="Loading your progress">
          <Skeleton className="h-24" />
        </LoadingRegion>
      ) : error ? (
        <p className="text-ink-muted">Your progress could not be loaded just now. Reload the page to try again.</p>
      ) : !data || data.courses.length === 0 ? (
        <p className="rounded-xl border border-dashed border-border p-6 text-ink-muted">
          No course seats yet. When your school enrols you, your courses and progress appear here. Meanwhile, the <Link href="/courses">free preview lessons</Link> are open to everyone.
        </p>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {data.courses.map((course) => (
            <li key={course.courseSlug} className="space-y-4 rounded-xl border border-rule bg-surface-raised p-5" data-course={course.courseSlug}>
              <h3 className="text-lg font-semibold">
                <Link href={course.href} className="text-ink">
                  {course.title}
                </Link>
              </h3>
              <ProgressBar
                label={
                  <>
                    <span className="sr-only">{course.title}: </span>Lessons completed
                  </>
                }
                valueNow={course.percent}
                valueText={`${course.percent}% · ${course.completedLessons} of ${course.totalLessons} lessons`}
              />
              <details className="text-body-sm">
                <summary className="cursor-pointer font-semibold text-ink">Modules</summary>
                <ul className="mt-2 space-y-1">
                  {course.modules.map((m) => (
                    <li key={m.slug} className="flex justify-between gap-3">
                      <span>{m.title}</span>
                      <span className="font-mono text-ink-muted tabular-nums">
                        {m.completedLessons}/{m.totalLessons} · {m.percent}%
                      </span>
                    </li>
                  ))}
                </ul>
              </details>
              {course.continueLesson ? (
                <p>
                  <Link href={course.continueLesson.href} className="font-semibold" data-testid="continue-link">
                    Continue: {course.continueLesson.title}
                  </Link>
                </p>
              ) : (
                <p className="font-semibold text-success">Every lesson completed.</p>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
