import type { Metadata } from "next";
import Link from "next/link";
import { AttemptHistory, STATUS_TONE } from "@/components/placements/attempt-history";
import { BriefContent } from "@/components/placements/brief-content";
import { ReviewEditor } from "@/components/placements/review-editor";
import { Badge } from "@/components/ui/badge";
import { SUBMISSION_STATUS_WORDS } from "@/lib/dto/placements";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { getReviewView } from "@/lib/server/reviews";
import { finalizeAction, saveDraftAction } from "../actions";

export const metadata: Metadata = { title: "Review a placement" };

export default async function ReviewPage({ params }: { params: Promise<{ submissionId: string }> }) {
  const { submissionId } = await params;
  const viewer = await requirePageViewer(`/teach/reviews/${submissionId}`, "instructor");
  const { view } = pageData(await getReviewView(viewer, submissionId));
  const { submission, brief } = view;
  const current = { submissionId: submission.id, attempt: submission.attempt, status: submission.status, submittedAt: submission.submittedAt, reviewedAt: submission.reviewedAt, photos: view.photos, review: view.review };
  return (
    <div className="flex flex-col gap-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/teach">Classes you teach</Link> <span aria-hidden="true">›</span> <Link href="/teach/reviews">Review queue</Link> <span aria-hidden="true">›</span> <span aria-current="page">{submission.apprenticeName}</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">
          {brief.title}: {submission.apprenticeName}
        </h1>
        <p className="flex flex-wrap items-center gap-2 text-body-sm">
          <Badge tone={STATUS_TONE[submission.status]} withIcon>
            {SUBMISSION_STATUS_WORDS[submission.status]}
          </Badge>
          <span className="text-ink-muted">
            Attempt {submission.attempt} · {submission.className} · sent {submission.submittedAt.slice(0, 16).replace("T", " ")} UTC
          </span>
        </p>
      </header>
      {submission.status === "submitted" ? (
        <ReviewEditor view={view} actions={{ saveDraft: saveDraftAction, finalize: finalizeAction }} />
      ) : (
        <section aria-labelledby="done" className="flex flex-col gap-3">
          <h2 id="done" className="text-xl font-semibold">
            Reviewed
          </h2>
          <AttemptHistory attempts={[current]} rubric={brief.rubric} />
        </section>
      )}
      {view.earlier.length > 0 && (
        <section aria-labelledby="earlier" className="flex flex-col gap-3">
          <h2 id="earlier" className="text-xl font-semibold">
            Earlier attempts
          </h2>
          <AttemptHistory attempts={view.earlier} rubric={brief.rubric} />
        </section>
      )}
      <details className="rounded-card border border-rule bg-surface-raised p-4">
        <summary className="cursor-pointer font-semibold">The brief as the apprentice read it</summary>
        <div className="mt-4">
          <BriefContent brief={brief} />
        </div>
      </details>
    </div>
  );
}
