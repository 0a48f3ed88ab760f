import type { Metadata } from "next";
import Link from "next/link";
import { ExtensionForm } from "@/components/quiz-stats/extension-form";
import { ItemScatter } from "@/components/quiz-stats/item-scatter";
import { ScoreHistogram } from "@/components/quiz-stats/score-histogram";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Select } from "@/components/ui/select";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { getBankStatistics, listExtensionTargets, type BankStatsDto } from "@/lib/server/quiz-stats";
import { grantExtensionAction } from "./actions";

export const metadata: Metadata = { title: "Item statistics" };

function fixed(value: number | null, digits = 2): string {
  return value === null ? "–" : value.toFixed(digits);
}

function Summary({ stats }: { stats: BankStatsDto }) {
  const rows: [string, string][] = [
    ["Attempts (n)", String(stats.n)],
    ["Questions (k)", String(stats.k)],
    ["Mean score", stats.meanPercent === null ? "–" : `${stats.meanPercent.toFixed(1)} %`],
    ["SD (points)", fixed(stats.sd)],
    ["KR-20", fixed(stats.kr20)],
    ["Cronbach's α", fixed(stats.alpha)],
    ["SEM (points)", fixed(stats.sem)],
  ];
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-7" data-testid="stats-summary">
      {rows.map(([term, value]) => (
        <div key={term} className="rounded-card border border-rule bg-surface-raised p-3">
          <dt className="text-caption text-ink-muted">{term}</dt>
          <dd className="font-mono text-title-3 tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

async function load(bankId: string, classId: string | null) {
  const path = `/teach/quizzes/${bankId}${classId ? `?class=${classId}` : ""}`;
  const viewer = await requirePageViewer(path, "instructor");
  // No such quiz, or a class the instructor doesn't teach: not_found (404); no class on the course: forbidden (403).
  const { stats } = pageData(await getBankStatistics(viewer, { bankId, classId }));
  const targets = stats.timeLimitMinutes !== null ? pageData(await listExtensionTargets(viewer, { bankId, classId })).targets : [];
  return { stats, targets };
}

export default async function ItemStatisticsPage({ params, searchParams }: { params: Promise<{ bankId: string }>; searchParams: Promise<{ class?: string | string[] }> }) {
  const { bankId } = await params;
  const requested = (await searchParams).class;
  const classId = typeof requested === "string" && requested !== "" ? requested : null;
  const { stats, targets } = await load(bankId, classId);
  const csvHref = `/api/quizzes/${stats.bankId}/stats.csv${stats.scope.classId ? `?class=${stats.scope.classId}` : ""}`;

  return (
    <div className="flex flex-col gap-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/teach">Classes you teach</Link> <span aria-hidden="true">›</span> <Link href="/teach/quizzes">Quiz statistics</Link> <span aria-hidden="true">›</span>{" "}
        <span aria-current="page">{stats.title}</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">{stats.title}</h1>
        <p className="text-ink-muted">Item analysis of submitted attempts: {stats.scope.label}.</p>
      </header>

      <form method="get" className="flex flex-wrap items-end gap-3">
        <div className="flex min-w-64 flex-col gap-1.5">
          <label htmlFor="class-filter" className="font-semibold">
            Whose attempts
          </label>
          <Select id="class-filter" name="class" defaultValue={stats.scope.classId ?? ""}>
            <option value="">All your classes</option>
            {stats.classes.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </Select>
        </div>
        <Button type="submit" variant="secondary">
          Show
        </Button>
      </form>

      <Summary stats={stats} />
      {stats.kr20 === null && stats.alpha !== null && (
        <p className="text-body-sm text-ink-muted">KR-20 needs right-or-wrong scoring; some questions here give partial credit, so read Cronbach&apos;s α (which KR-20 equals on right-or-wrong items).</p>
      )}
      {stats.n < 2 && (
        <Notice tone="note" title="Too few attempts">
          <p>Discrimination and reliability need at least two submitted attempts; with under about 30 they are rough guides only.</p>
        </Notice>
      )}
      {stats.excludedAttempts > 0 && <p className="text-body-sm text-ink-muted">{stats.excludedAttempts} older attempts were left out: they predate questions added to the quiz since.</p>}

      <div className="grid gap-4 lg:grid-cols-2">
        <ItemScatter items={stats.items.map((i) => ({ position: i.position, topic: i.topic, p: i.p, d: i.d, flagged: i.flags.length > 0 }))} />
        <ScoreHistogram bins={stats.histogram.map((b) => ({ label: b.label, count: b.count }))} passingPercent={stats.passingPercent} />
      </div>

      <section aria-labelledby="items-heading" className="flex flex-col gap-3">
        <div className="flex flex-wrap items-baseline justify-between gap-3">
          <h2 id="items-heading" className="text-xl font-semibold">
            Items
          </h2>
          <a href={csvHref} download>
            Download the item table (CSV)
          </a>
        </div>
        <p className="max-w-reading text-body-sm text-ink-muted">
          p is the share of points earned; D compares the top and bottom 27 % of attempts; r<sub>pb</sub> correlates the item with the total and corrected r with the total without it. Flags: D below 0.20, p above 0.95, or a negative r<sub>pb</sub>.
        </p>
        <Table caption={`Item statistics of ${stats.title}, ${stats.scope.label}`} captionHidden data-testid="item-table">
          <TableHead>
            <TableRow>
              <TableHeaderCell numeric>#</TableHeaderCell>
              <TableHeaderCell>Question</TableHeaderCell>
              <TableHeaderCell numeric>p</TableHeaderCell>
              <TableHeaderCell numeric>D</TableHeaderCell>
              <TableHeaderCell numeric>r_pb</TableHeaderCell>
              <TableHeaderCell numeric>Corrected r</TableHeaderCell>
              <TableHeaderCell className="min-w-48">Flags</TableHeaderCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {stats.items.map((item) => (
              <TableRow key={item.questionId}>
                <TableCell numeric>{item.position}</TableCell>
                <TableHeaderCell scope="row" className="min-w-72 font-normal">
                  <span className="block font-semibold">
                    {item.topic} <span className="font-normal text-ink-muted">({item.kind})</span>
                  </span>
                  <span className="block text-ink-muted">{item.prompt}</span>
                </TableHeaderCell>
                <TableCell numeric>{fixed(item.p)}</TableCell>
                <TableCell numeric>{fixed(item.d)}</TableCell>
                <TableCell numeric>{fixed(item.rpb)}</TableCell>
                <TableCell numeric>{fixed(item.rCorrected)}</TableCell>
                <TableCell>{item.flagWords.length === 0 ? "None" : <ul className="list-disc pl-4">{item.flagWords.map((w) => <li key={w}>{w}</li>)}</ul>}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </section>

      <section aria-labelledby="extra-time" className="flex flex-col gap-3">
        <h2 id="extra-time" className="text-xl font-semibold">
          Extra time
        </h2>
        {stats.timeLimitMinutes === null ? (
          <p className="text-ink-muted">This quiz has no time limit, so no apprentice needs extra time for it.</p>
        ) : targets.length === 0 ? (
          <p className="text-ink-muted">No apprentices in your classes on this course yet.</p>
        ) : (
          <ExtensionForm action={grantExtensionAction} bankId={stats.bankId} targets={targets} timeLimitMinutes={stats.timeLimitMinutes} />
        )}
      </section>
    </div>
  );
}
