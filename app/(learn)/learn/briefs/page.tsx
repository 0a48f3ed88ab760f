import type { Metadata } from "next";
import Link from "next/link";
import { STATUS_TONE } from "@/components/placements/attempt-history";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { LinkButton } from "@/components/ui/link-button";
import { BRIEF_STATE_WORDS } from "@/lib/dto/placements";
import { listMyBriefs } from "@/lib/server/briefs";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Placement briefs" };

export default async function BriefsPage() {
  const viewer = await requirePageViewer("/learn/briefs", "apprentice");
  const { courses } = pageData(await listMyBriefs(viewer));
  return (
    <div className="flex flex-col gap-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/learn">My classes</Link> <span aria-hidden="true">›</span> <span aria-current="page">Placement briefs</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Placement briefs</h1>
        <p className="max-w-reading text-ink-muted">Set up a placement on a real stage, photograph it with a tape measure in shot, and send it to your instructor. They pin comments on your photos and score it against the rubric.</p>
      </header>
      {courses.length === 0 ? (
        <EmptyState title="No briefs yet" description="When you join a class, the placement briefs of its course appear here." action={<LinkButton href="/courses">Browse the courses</LinkButton>} />
      ) : (
        courses.map((course) => (
          <section key={course.courseSlug} aria-labelledby={`course-${course.courseSlug}`} className="flex flex-col gap-3">
            <h2 id={`course-${course.courseSlug}`} className="text-xl font-semibold">
              {course.courseTitle}
            </h2>
            <ul className="grid gap-4 md:grid-cols-2">
              {course.briefs.map((b) => (
                <li key={b.briefId} className="flex flex-col gap-2 rounded-card border border-rule bg-surface-raised p-5" data-brief={b.briefId}>
                  <h3 className="text-title-3">
                    <Link href={`/learn/briefs/${b.briefId}`}>{b.title}</Link>
                  </h3>
                  <p className="text-body-sm text-ink-muted">{b.summary}</p>
                  <p className="flex flex-wrap items-center gap-2 text-body-sm">
                    {b.state === "not_started" ? <Badge>{BRIEF_STATE_WORDS[b.state]}</Badge> : <Badge tone={STATUS_TONE[b.state]} withIcon>{BRIEF_STATE_WORDS[b.state]}</Badge>}
                    {b.attempts > 0 && <span className="text-ink-muted">{b.attempts === 1 ? "1 attempt" : `${b.attempts} attempts`}</span>}
                    <span className="text-ink-muted">Lesson: {b.lessonTitle}</span>
                  </p>
                </li>
              ))}
            </ul>
          </section>
        ))
      )}
    </div>
  );
}
