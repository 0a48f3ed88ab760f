import type { Metadata } from "next";
import Link from "next/link";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { listClassProgress, type ClassProgressDto } from "@/lib/server/progress";

export const metadata: Metadata = { title: "Class progress" };

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

async function load(classId: string, path: string): Promise<ClassProgressDto> {
  const viewer = await requirePageViewer(path, "instructor");
  // Someone else's class, or no such class: the same not_found (a 404), so ids can't be probed.
  return pageData(await listClassProgress(viewer, classId)).progress;
}

export default async function ClassProgressPage({ params }: { params: Promise<{ classId: string }> }) {
  const { classId } = await params;
  const klass = await load(classId, `/teach/classes/${classId}`);
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/teach">Classes you teach</Link> <span aria-hidden="true">›</span> <span aria-current="page">{klass.name}</span>
      </nav>
      <header className="space-y-1">
        <h1 className="text-3xl font-bold">{klass.name}</h1>
        <p className="text-ink-muted">
          {klass.term} · Course: <Link href={`/courses/${klass.courseSlug}`}>{klass.courseTitle}</Link>
        </p>
      </header>
      {klass.apprentices.length === 0 ? (
        <p className="rounded-xl border border-dashed border-border p-6 text-ink-muted">No apprentices in this class yet.</p>
      ) : (
        <Table caption={`Progress of each apprentice in ${klass.name}`} data-testid="class-progress">
          <TableHead>
            <TableRow>
              <TableHeaderCell>Apprentice</TableHeaderCell>
              <TableHeaderCell numeric>Course</TableHeaderCell>
              {klass.modules.map((m) => (
                <TableHeaderCell key={m.slug} numeric>
                  {m.title}
                </TableHeaderCell>
              ))}
              <TableHeaderCell>Last opened (UTC)</TableHeaderCell>
              <TableHeaderCell>Next lesson</TableHeaderCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {klass.apprentices.map((a) => (
              <TableRow key={a.userId}>
                <TableHeaderCell scope="row">{a.name}</TableHeaderCell>
                <TableCell numeric>
                  {a.percent}% <span className="text-ink-muted">({a.completedLessons}/{a.totalLessons})</span>
                </TableCell>
                {klass.modules.map((m) => (
                  <TableCell key={m.slug} numeric>
                    {a.modulePercents[m.slug] ?? 0}%
                  </TableCell>
                ))}
                <TableCell>{a.lastViewedAt ? dateFormat.format(new Date(a.lastViewedAt)) : "Not yet"}</TableCell>
                <TableCell>{a.continueLesson ? a.continueLesson.title : "All done"}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </div>
  );
}
