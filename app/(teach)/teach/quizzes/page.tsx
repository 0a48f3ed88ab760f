import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { listStatsBanks } from "@/lib/server/quiz-stats";

export const metadata: Metadata = { title: "Quiz statistics" };

export default async function TeachQuizzesPage() {
  const viewer = await requirePageViewer("/teach/quizzes", "instructor");
  const { banks } = pageData(await listStatsBanks(viewer));
  return (
    <div className="flex flex-col gap-6">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/teach">Classes you teach</Link> <span aria-hidden="true">›</span> <span aria-current="page">Quiz statistics</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Quiz statistics</h1>
        <p className="max-w-reading text-ink-muted">The quizzes of the courses you teach, counted over the submitted attempts of your classes&apos; apprentices. Open one for its item analysis.</p>
      </header>
      {banks.length === 0 ? (
        <EmptyState title="No quizzes to show" description="When a school office adds you to a class, the quizzes of its course appear here." />
      ) : (
        <Table caption="Quizzes of your courses with their submitted attempts" data-testid="stats-banks">
          <TableHead>
            <TableRow>
              <TableHeaderCell>Quiz</TableHeaderCell>
              <TableHeaderCell>Course</TableHeaderCell>
              <TableHeaderCell numeric>Questions</TableHeaderCell>
              <TableHeaderCell numeric>Submitted attempts</TableHeaderCell>
              <TableHeaderCell numeric>Apprentices</TableHeaderCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {banks.map((b) => (
              <TableRow key={b.bankId}>
                <TableHeaderCell scope="row">
                  <Link href={`/teach/quizzes/${b.bankId}`}>{b.title}</Link>
                </TableHeaderCell>
                <TableCell>{b.courseTitle}</TableCell>
                <TableCell numeric>{b.questionCount}</TableCell>
                <TableCell numeric>{b.submittedAttempts}</TableCell>
                <TableCell numeric>{b.apprentices}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </div>
  );
}
