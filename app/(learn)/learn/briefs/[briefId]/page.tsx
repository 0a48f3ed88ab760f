import type { Metadata } from "next";
import Link from "next/link";
import { AttemptHistory, STATUS_TONE } from "@/components/placements/attempt-history";
import { BriefContent } from "@/components/placements/brief-content";
import { PhotoUploader } from "@/components/placements/photo-uploader";
import { Badge } from "@/components/ui/badge";
import { Notice } from "@/components/ui/notice";
import { BRIEF_STATE_WORDS } from "@/lib/dto/placements";
import { getMyBrief } from "@/lib/server/briefs";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { submitPhotosAction } from "../actions";

export const metadata: Metadata = { title: "Placement brief" };

export default async function BriefPage({ params }: { params: Promise<{ briefId: string }> }) {
  const { briefId } = await params;
  const viewer = await requirePageViewer(`/learn/briefs/${briefId}`, "apprentice");
  const { detail } = pageData(await getMyBrief(viewer, briefId));
  const { brief, state } = detail;
  return (
    <div className="flex flex-col gap-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/learn">My classes</Link> <span aria-hidden="true">›</span> <Link href="/learn/briefs">Placement briefs</Link> <span aria-hidden="true">›</span> <span aria-current="page">{brief.title}</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">{brief.title}</h1>
        <p className="flex flex-wrap items-center gap-2 text-body-sm">
          {state === "not_started" ? <Badge>{BRIEF_STATE_WORDS[state]}</Badge> : <Badge tone={STATUS_TONE[state]} withIcon>{BRIEF_STATE_WORDS[state]}</Badge>}
          <span className="text-ink-muted">
            {brief.courseTitle} · lesson <Link href={`/courses/${brief.courseSlug}/${brief.lessonId}`}>{brief.lessonTitle}</Link>
          </span>
        </p>
        <p className="max-w-reading text-lg">{brief.summary}</p>
      </header>
      <BriefContent brief={brief} />
      <section aria-labelledby="send" className="flex flex-col gap-3">
        <h2 id="send" className="text-xl font-semibold">
          {!detail.canSubmit ? "Where it stands" : detail.attempts.length === 0 ? "Send your photos" : "Send a new attempt"}
        </h2>
        {detail.canSubmit ? (
          <>
            {detail.className && <p className="text-body-sm text-ink-muted">Reviewed by the instructors of {detail.className}.</p>}
            <PhotoUploader briefId={brief.id} min={brief.photos.min} max={brief.photos.max} submit={submitPhotosAction} />
          </>
        ) : state === "approved" ? (
          <Notice tone="success">Approved: this brief counts toward your course.</Notice>
        ) : state === "submitted" ? (
          <Notice tone="note">Your photos are waiting for review. You can send new ones if a redo is asked for.</Notice>
        ) : (
          <Notice tone="caution">You are not in a class on this course, so nobody can review new photos.</Notice>
        )}
      </section>
      {detail.attempts.length > 0 && (
        <section aria-labelledby="history" className="flex flex-col gap-3">
          <h2 id="history" className="text-xl font-semibold">
            Your attempts
          </h2>
          <AttemptHistory attempts={detail.attempts} rubric={brief.rubric} />
        </section>
      )}
    </div>
  );
}
