import type { Metadata } from "next";
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { listCourses } from "@/lib/content";
import { formatMinutes, LEVEL_LABEL, plural } from "./_player/format";

export const metadata: Metadata = {
  title: "Courses",
  description: "Axisline's courses for live-sound technicians: how microphones hear, direct boxes and levels, miking a band, and safe stage practice.",
};

export default async function CatalogPage() {
  const courses = await listCourses();
  return (
    <div className="space-y-8">
      <header className="max-w-reading space-y-3">
        <h1 className="text-title-1">Courses</h1>
        <p className="text-lead text-ink-muted">
          Four courses for the stage side of live sound. The first lesson of every course is a free preview; the rest open with a seat from your school.
        </p>
      </header>
      <ul className="grid gap-6 md:grid-cols-2" aria-label="Courses">
        {courses.map((course) => (
          <li key={course.slug} className="flex flex-col gap-4 rounded-card border border-rule bg-surface-raised p-6 shadow-raised" data-course={course.slug}>
            <div className="flex flex-wrap items-center gap-2">
              <Badge tone="accent">{LEVEL_LABEL[course.level]}</Badge>
              {course.previewCount > 0 ? <Badge tone="success">{plural(course.previewCount, "free preview lesson")}</Badge> : null}
            </div>
            <h2 className="text-title-2">
              <Link href={`/courses/${course.slug}`} className="text-ink">
                {course.title}
              </Link>
            </h2>
            <p className="text-ink-muted">{course.summary}</p>
            <dl className="mt-auto grid grid-cols-3 gap-3 border-t border-rule pt-4 text-body-sm">
              <div>
                <dt className="text-ink-muted">Lessons</dt>
                <dd className="font-mono text-ink">{course.lessonCount}</dd>
              </div>
              <div>
                <dt className="text-ink-muted">Modules</dt>
                <dd className="font-mono text-ink">{course.modules.length}</dd>
              </div>
              <div>
                <dt className="text-ink-muted">Time</dt>
                <dd className="font-mono text-ink">{formatMinutes(course.minutes)}</dd>
              </div>
            </dl>
          </li>
        ))}
      </ul>
    </div>
  );
}
