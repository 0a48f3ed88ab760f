// An apprentice's attempts at a brief, newest first: status, the final review (decision, total,
// each criterion's level, the comment) and the photos with the review's pins on them.
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { SUBMISSION_STATUS_WORDS, type AttemptDto, type RubricCriterionDto, type SubmissionStatus } from "@/lib/dto/placements";
import { PinnedPhoto } from "./pinned-photo";

export const STATUS_TONE: Record<SubmissionStatus, BadgeTone> = { submitted: "note", redo_requested: "caution", approved: "success" };

const utc = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;

function ReviewSummary({ attempt, rubric }: { attempt: AttemptDto; rubric: RubricCriterionDto[] }) {
  const review = attempt.review;
  if (!review) return <p className="text-body-sm text-ink-muted">Not reviewed yet.</p>;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-body">
        <strong>{review.decision === "approve" ? "Approved" : "Redo requested"}</strong> by {review.reviewerName}: {review.totalPoints} of {review.maxPoints} points.
      </p>
      {review.comment && <p className="max-w-reading whitespace-pre-line rounded-card border border-rule bg-surface-sunken p-3 text-body">{review.comment}</p>}
      <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-body-sm">
        {rubric.map((c) => {
          const points = review.scores[c.id];
          const level = c.levels.find((l) => l.points === points);
          return (
            <div key={c.id} className="contents">
              <dt>{c.title}</dt>
              <dd className="text-right tabular-nums">{level ? `${level.label}, ${points} of ${c.levels[0].points}` : "–"}</dd>
            </div>
          );
        })}
      </dl>
    </div>
  );
}

export function AttemptHistory({ attempts, rubric, headingLevel = 3 }: { attempts: AttemptDto[]; rubric: RubricCriterionDto[]; headingLevel?: 2 | 3 }) {
  const Heading = headingLevel === 2 ? "h2" : "h3";
  return (
    <ol className="flex flex-col gap-6">
      {attempts.map((a) => {
        let counted = 0;
        return (
          <li key={a.submissionId} className="flex flex-col gap-3 rounded-card border border-rule bg-surface-raised p-4" data-attempt={a.attempt}>
            <div className="flex flex-wrap items-center gap-2">
              <Heading className="text-lg font-semibold">Attempt {a.attempt}</Heading>
              <Badge tone={STATUS_TONE[a.status]} withIcon>
                {SUBMISSION_STATUS_WORDS[a.status]}
              </Badge>
              <span className="text-body-sm text-ink-muted">Sent {utc(a.submittedAt)}</span>
            </div>
            <ReviewSummary attempt={a} rubric={rubric} />
            <div className="grid gap-4 md:grid-cols-2">
              {a.photos.map((p, i) => {
                const pins = a.review?.pins.filter((pin) => pin.photoId === p.id) ?? [];
                const from = counted;
                counted += pins.length;
                return <PinnedPhoto key={p.id} photo={p} pins={pins} numberFrom={from} index={i} />;
              })}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
