import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Badge } from "@/components/ui/badge";
import { getCourse, listCourses } from "@/lib/content";
import { BuyCoursePanel } from "@/components/purchase/buy-course-panel";
import { formatMoney, quoteSelfPurchase } from "@/lib/pricing/prices";
import { CourseProgressPanel, LessonDoneMark, ModuleProgressNote } from "../_player/course-progress";
import { buyCourseAction } from "./actions";
import { formatMinutes, LEVEL_LABEL, plural, SAFETY_LABEL } from "../_player/format";

export const dynamicParams = false;

export async function generateStaticParams() {
  return (await listCourses()).map((c) => ({ course: c.slug }));
}

type Params = { params: Promise<{ course: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const course = await getCourse((await params).course);
  if (!course) return {};
  return { title: course.title, description: course.summary, alternates: { canonical: `/courses/${course.slug}` } };
}

export default async function CoursePage({ params }: Params) {
  const course = await getCourse((await params).course);
  if (!course) notFound();
  const price = quoteSelfPurchase(course.slug);
  return (
    <div className="space-y-10">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/courses">Courses</Link> <span aria-hidden="true">›</span> <span aria-current="page">{course.title}</span>
      </nav>
      <header className="grid gap-8 lg:grid-cols-[1fr_20rem]">
        <div className="max-w-reading space-y-4">
          <Badge tone="accent">{LEVEL_LABEL[course.level]}</Badge>
          <h1 className="text-title-1">{course.title}</h1>
          <p className="text-lead text-ink-muted">{course.summary}</p>
          <p className="font-mono text-body-sm text-ink-muted">
            {plural(course.modules.length, "module")} · {plural(course.lessonCount, "lesson")} · {formatMinutes(course.minutes)} ·{" "}
            {plural(course.previewCount, "free preview")}
          </p>
        </div>
        <div className="space-y-4">
          <CourseProgressPanel courseSlug={course.slug} />
          {price.ok ? <BuyCoursePanel courseSlug={course.slug} courseTitle={course.title} priceLabel={formatMoney(price.amountTotal)} action={buyCourseAction} /> : null}
        </div>
      </header>

      <section aria-labelledby="outcomes" className="max-w-reading space-y-3">
        <h2 id="outcomes" className="text-title-2">
          After this course you can
        </h2>
        <ul className="list-disc space-y-1.5 pl-6 marker:text-accent-line">
          {course.outcomes.map((o) => (
            <li key={o}>{o}</li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="syllabus" className="space-y-6">
        <div className="space-y-1">
          <h2 id="syllabus" className="text-title-2">
            Syllabus
          </h2>
          <p className="text-ink-muted">Lessons marked “Free preview” are open to everyone. The others need a seat on the course, from your school or bought here.</p>
        </div>
        <ol className="space-y-6">
          {course.modules.map((m) => (
            <li key={m.slug} className="rounded-card border border-rule bg-surface-raised p-5" data-module={m.slug}>
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h3 className="text-title-3">
                  <span className="font-mono text-body-sm text-ink-muted">Module {m.order} · </span>
                  {m.title}
                </h3>
                <ModuleProgressNote courseSlug={course.slug} moduleSlug={m.slug} />
              </div>
              <p className="mt-1 text-body-sm text-ink-muted">{m.summary}</p>
              <ol className="mt-4 divide-y divide-rule border-t border-rule">
                {m.lessons.map((l) => (
                  <li key={l.id} className="grid gap-x-6 gap-y-2 py-3 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-center" data-lesson={l.id}>
                    <div className="min-w-0 space-y-0.5">
                      <Link href={l.href} className="font-semibold">
                        {l.title}
                      </Link>
                      <p className="text-body-sm text-ink-muted">{l.summary}</p>
                      {l.safety.length > 0 ? (
                        <p className="text-caption text-ink-muted">Safety: {l.safety.map((s) => SAFETY_LABEL[s]).join(", ")}</p>
                      ) : null}
                    </div>
                    <div className="flex flex-wrap items-center gap-2 sm:justify-end">
                      <LessonDoneMark courseSlug={course.slug} lessonId={l.id} />
                      {l.preview ? <Badge tone="success">Free preview</Badge> : <Badge>Seat needed</Badge>}
                      <span className="font-mono text-body-sm text-ink-muted">{l.minutes} min</span>
                    </div>
                  </li>
                ))}
              </ol>
            </li>
          ))}
        </ol>
      </section>
    </div>
  );
}
