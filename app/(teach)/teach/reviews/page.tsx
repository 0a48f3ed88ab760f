import type { Metadata } from "next";
import Link from "next/link";
import { STATUS_TONE } from "@/components/placements/attempt-history";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Select } from "@/components/ui/select";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import { SUBMISSION_STATUS_WORDS, waitedWords, type SubmissionStatus } from "@/lib/dto/placements";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { listReviewQueue } from "@/lib/server/review-queue";

export const metadata: Metadata = { title: "Review queue" };

const STATUSES: SubmissionStatus[] = ["submitted", "redo_requested", "approved"];

export default async function ReviewQueuePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requirePageViewer("/teach/reviews", "instructor");
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === "string" && v !== "" ? v : undefined);
  const { queue } = pageData(await listReviewQueue(viewer, { classId: one(sp.class), briefId: one(sp.brief), status: one(sp.status) }));
  const { filters } = queue;
  return (
    <div className="flex flex-col gap-6">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/teach">Classes you teach</Link> <span aria-hidden="true">›</span> <span aria-current="page">Review queue</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Review queue</h1>
        <p className="max-w-reading text-ink-muted">Placement photos from the apprentices of your classes, the longest waiting first.</p>
      </header>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="queue-counts">
        {STATUSES.map((s) => (
          <div key={s} className="rounded-card border border-rule bg-surface-raised p-3">
            <dt className="text-body-sm text-ink-muted">{SUBMISSION_STATUS_WORDS[s]}</dt>
            <dd className="text-2xl font-bold tabular-nums">{queue.counts[s]}</dd>
          </div>
        ))}
        <div className="rounded-card border border-rule bg-surface-raised p-3">
          <dt className="text-body-sm text-ink-muted">Oldest waiting</dt>
          <dd className="text-2xl font-bold tabular-nums">{queue.oldestWaitingSeconds === null ? "–" : waitedWords(queue.oldestWaitingSeconds)}</dd>
        </div>
      </dl>
      <form method="get" className="flex flex-col gap-3 sm:flex-row sm:flex-wrap sm:items-end" aria-label="Filter the queue">
        <label className="flex flex-col gap-1 text-body-sm font-semibold">
          Class
          <Select name="class" defaultValue={filters.classId ?? ""}>
            <option value="">All classes</option>
            {queue.classes.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-body-sm font-semibold">
          Brief
          <Select name="brief" defaultValue={filters.briefId ?? ""}>
            <option value="">All briefs</option>
            {queue.briefs.map((b) => (
              <option key={b.id} value={b.id}>
                {b.title}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-body-sm font-semibold">
          State
          <Select name="status" defaultValue={filters.status}>
            {STATUSES.map((s) => (
              <option key={s} value={s}>
                {SUBMISSION_STATUS_WORDS[s]}
              </option>
            ))}
            <option value="all">Any state</option>
          </Select>
        </label>
        <Button type="submit" variant="secondary">
          Show
        </Button>
      </form>
      {queue.items.length === 0 ? (
        <EmptyState title="Nothing here" description={filters.status === "submitted" ? "No placement photos are waiting for review with these filters." : "No submissions match these filters."} />
      ) : (
        <Table caption="Submissions, the longest waiting first" data-testid="review-queue">
          <TableHead>
            <TableRow>
              <TableHeaderCell>Apprentice</TableHeaderCell>
              <TableHeaderCell>Brief</TableHeaderCell>
              <TableHeaderCell>Class</TableHeaderCell>
              <TableHeaderCell numeric>Attempt</TableHeaderCell>
              <TableHeaderCell>State</TableHeaderCell>
              <TableHeaderCell numeric>Waited</TableHeaderCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {queue.items.map((i) => (
              <TableRow key={i.submissionId}>
                <TableHeaderCell scope="row">
                  <Link href={`/teach/reviews/${i.submissionId}`}>
                    {i.apprenticeName}
                    <span className="sr-only">: review {i.briefTitle}</span>
                  </Link>
                </TableHeaderCell>
                <TableCell>{i.briefTitle}</TableCell>
                <TableCell>{i.className}</TableCell>
                <TableCell numeric>{i.attempt}</TableCell>
                <TableCell>
                  <Badge tone={STATUS_TONE[i.status]} withIcon>
                    {SUBMISSION_STATUS_WORDS[i.status]}
                  </Badge>
                  {i.hasDraft && <span className="ml-2 text-body-sm text-ink-muted">draft started</span>}
                </TableCell>
                <TableCell numeric>{waitedWords(i.waitedSeconds)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </div>
  );
}
