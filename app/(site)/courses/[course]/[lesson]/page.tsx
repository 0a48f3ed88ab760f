import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { MDX_COMPONENTS } from "@/components/mdx/registry";
import { Badge } from "@/components/ui/badge";
import { getCourse, getLesson, lessonNeighbours, listAllLessons } from "@/lib/content";
import { renderLessonBody } from "@/lib/content/render";
import { SAFETY_LABEL } from "../../_player/format";
import { LessonCompletion } from "../../_player/lesson-completion";
import { LockedLessonBody } from "../../_player/locked-lesson-body";
import { ReadingProgress } from "../../_player/reading-progress";
import { TableOfContents } from "../../_player/table-of-contents";

// Every lesson page is built ahead of time. A locked lesson's page holds only its shell; the
// body is fetched after an access check (see LockedLessonBody).
export const dynamicParams = false;

export async function generateStaticParams() {
  return (await listAllLessons()).map((l) => ({ course: l.courseSlug, lesson: l.id }));
}

type Params = { params: Promise<{ course: string; lesson: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const { course: courseSlug, lesson: lessonId } = await params;
  const [course, lesson] = await Promise.all([getCourse(courseSlug), getLesson(courseSlug, lessonId)]);
  if (!course || !lesson) return {};
  return {
    title: `${lesson.title} (${course.title})`,
    description: lesson.summary,
    alternates: { canonical: lesson.href },
    openGraph: { type: "article", title: lesson.title, description: lesson.summary },
  };
}

const ARTICLE_ID = "lesson-article";

export default async function LessonPage({ params }: Params) {
  const { course: courseSlug, lesson: lessonId } = await params;
  const [course, lesson] = await Promise.all([getCourse(courseSlug), getLesson(courseSlug, lessonId)]);
  if (!course || !lesson) notFound();
  const lessonModule = course.modules.find((m) => m.slug === lesson.moduleSlug);
  const { previous, next } = await lessonNeighbours(courseSlug, lessonId);
  const body = lesson.preview ? await renderLessonBody(lesson, MDX_COMPONENTS) : null;

  return (
    <div className="space-y-6">
      <ReadingProgress targetId={ARTICLE_ID} />
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/courses">Courses</Link> <span aria-hidden="true">›</span> <Link href={`/courses/${course.slug}`}>{course.title}</Link>{" "}
        {/* On a phone the lesson's own title is the next line but two: don't say it twice. */}
        <span className="hidden sm:inline">
          <span aria-hidden="true">›</span> <span aria-current="page">{lesson.title}</span>
        </span>
      </nav>
      <div className="grid gap-10 lg:grid-cols-[minmax(0,1fr)_15rem]">
        <article id={ARTICLE_ID} className="min-w-0 max-w-reading" data-lesson={lesson.id} data-preview={lesson.preview}>
          <header className="space-y-4">
            <p className="font-mono text-body-sm text-ink-muted">
              Module {lessonModule?.order}: {lessonModule?.title} · Lesson {lesson.order}
            </p>
            <h1 className="text-title-1">{lesson.title}</h1>
            <p className="text-lead text-ink-muted">{lesson.summary}</p>
            <div className="flex flex-wrap items-center gap-2 text-body-sm">
              {lesson.preview ? <Badge tone="success">Free preview</Badge> : <Badge>Seat needed</Badge>}
              <span className="font-mono text-ink-muted">{lesson.minutes} min</span>
              {lesson.safety.length > 0 ? (
                <Badge tone="caution" withIcon wraps>
                  Safety: {lesson.safety.map((s) => SAFETY_LABEL[s]).join(", ")}
                </Badge>
              ) : null}
            </div>
            <section aria-labelledby="objectives" className="rounded-card border border-rule bg-surface-raised px-5 py-4">
              <h2 id="objectives" className="text-title-3">
                What you will be able to do
              </h2>
              <ul className="mt-2 list-disc space-y-1 pl-5 marker:text-accent-line">
                {lesson.objectives.map((o) => (
                  <li key={o}>{o}</li>
                ))}
              </ul>
            </section>
          </header>

          <div className="mt-6 lg:hidden">
            <TableOfContents headings={lesson.headings} idSuffix="inline" collapsed />
          </div>

          <div className="mt-8">
            {body ? (
              <div className="prose prose-axisline max-w-none" data-testid="lesson-body">
                {body}
              </div>
            ) : (
              <LockedLessonBody courseSlug={course.slug} lessonId={lesson.id} />
            )}
          </div>

          <LessonCompletion courseSlug={course.slug} lessonId={lesson.id} />

          <nav aria-label="Previous and next lesson" className="mt-10 grid gap-3 border-t border-rule pt-6 sm:grid-cols-2 print:hidden">
            {previous ? (
              <Link href={previous.href} rel="prev" className="rounded-card border border-rule p-4 no-underline hover:border-border">
                <span className="block text-caption text-ink-muted">Previous lesson</span>
                <span className="font-semibold underline">{previous.title}</span>
              </Link>
            ) : (
              <span />
            )}
            {next ? (
              <Link href={next.href} rel="next" className="rounded-card border border-rule p-4 text-right no-underline hover:border-border">
                <span className="block text-caption text-ink-muted">Next lesson</span>
                <span className="font-semibold underline">{next.title}</span>
              </Link>
            ) : (
              <Link href={`/courses/${course.slug}`} className="rounded-card border border-rule p-4 text-right no-underline hover:border-border">
                <span className="block text-caption text-ink-muted">End of the course</span>
                <span className="font-semibold underline">Back to the syllabus</span>
              </Link>
            )}
          </nav>
        </article>
        <div className="hidden lg:block print:hidden">
          <div className="sticky top-6">
            <TableOfContents headings={lesson.headings} idSuffix="side" />
          </div>
        </div>
      </div>
    </div>
  );
}
