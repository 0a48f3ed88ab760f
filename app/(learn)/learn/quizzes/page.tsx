import type { Metadata } from "next";
import Link from "next/link";
import { formatPercent, formatUtc } from "@/components/quiz/format";
import { StartQuizForm } from "@/components/quiz/start-quiz-form";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { LinkButton } from "@/components/ui/link-button";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import type { AttemptStatus } from "@/lib/server/attempts";
import { listAvailableQuizzes, listMyAttempts, type AvailableQuizDto, type TopicToRevisitDto } from "@/lib/server/quiz-history";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { startQuizAction } from "./actions";

export const metadata: Metadata = { title: "Quizzes" };

const STATUS_WORDS: Record<AttemptStatus, string> = { in_progress: "In progress", submitted: "Submitted", timed_out: "Time ran out" };

function QuizCard({ quiz }: { quiz: AvailableQuizDto }) {
  const left = quiz.attemptsAllowed - quiz.attemptsUsed;
  return (
    <li className="flex flex-col gap-3 rounded-card border border-rule bg-surface-raised p-5" data-bank={quiz.bankId}>
      <div className="flex flex-col gap-1">
        <h3 className="text-title-3">{quiz.title}</h3>
        <p className="text-body-sm text-ink-muted">
          {quiz.moduleTitle ? `Module: ${quiz.moduleTitle}` : "Final quiz of the course"} · {quiz.questionCount} questions · pass mark {quiz.passingPercent} %
          {quiz.timeLimitMinutes !== null ? ` · ${quiz.timeLimitMinutes} minutes` : " · untimed"}
        </p>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-body-sm">
        <dt className="text-ink-muted">Attempts</dt>
        <dd>
          {quiz.attemptsUsed} of {quiz.attemptsAllowed} used
        </dd>
        <dt className="text-ink-muted">Best score</dt>
        <dd className="flex items-center gap-2">
          {quiz.bestPercent === null ? "None yet" : formatPercent(quiz.bestPercent)}
          {quiz.passed && (
            <Badge tone="success" withIcon>
              Passed
            </Badge>
          )}
        </dd>
      </dl>
      {quiz.openAttemptId ? (
        <StartQuizForm action={startQuizAction} bankId={quiz.bankId} quizTitle={quiz.title} resume />
      ) : left > 0 ? (
        <StartQuizForm action={startQuizAction} bankId={quiz.bankId} quizTitle={quiz.title} resume={false} />
      ) : (
        <p className="text-body-sm text-ink-muted">No attempts left.</p>
      )}
    </li>
  );
}

function groupTopics(topics: TopicToRevisitDto[]) {
  const groups = new Map<string, { bankId: string; bankTitle: string; courseSlug: string; topics: string[] }>();
  for (const t of topics) {
    const group = groups.get(t.bankId) ?? { bankId: t.bankId, bankTitle: t.bankTitle, courseSlug: t.courseSlug, topics: [] };
    group.topics.push(t.topic);
    groups.set(t.bankId, group);
  }
  return [...groups.values()];
}

export default async function QuizzesPage() {
  const viewer = await requirePageViewer("/learn/quizzes", "apprentice");
  const [available, mine] = await Promise.all([listAvailableQuizzes(viewer).then(pageData), listMyAttempts(viewer).then(pageData)]);
  return (
    <div className="flex flex-col gap-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/learn">My classes</Link> <span aria-hidden="true">›</span> <span aria-current="page">Quizzes</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Quizzes</h1>
        <p className="max-w-reading text-ink-muted">Each module of your courses ends with a quiz, and each course with a final one. Answers save as you go, so you can stop and come back.</p>
      </header>

      {mine.topicsToRevisit.length > 0 && (
        <section aria-labelledby="revisit" className="flex flex-col gap-3">
          <h2 id="revisit" className="text-xl font-semibold">
            Topics to revisit
          </h2>
          <p className="text-body-sm text-ink-muted">From your latest attempt at each quiz: the topics of the questions that were not fully right.</p>
          <ul className="flex flex-col gap-3">
            {groupTopics(mine.topicsToRevisit).map((group) => (
              <li key={group.bankId} className="flex flex-col gap-1.5">
                <span className="text-body font-semibold">
                  {group.bankTitle} · <Link href={`/courses/${group.courseSlug}`}>open the course</Link>
                </span>
                <ul className="flex flex-wrap gap-2" aria-label={`Topics from ${group.bankTitle}`}>
                  {group.topics.map((topic) => (
                    <li key={topic}>
                      <Badge tone="note">{topic}</Badge>
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
        </section>
      )}

      <section aria-labelledby="available" className="flex flex-col gap-4">
        <h2 id="available" className="text-xl font-semibold">
          Quizzes in your courses
        </h2>
        {available.courses.length === 0 ? (
          <EmptyState title="No quizzes yet" description="When your school gives you a seat on a course, its quizzes appear here." action={<LinkButton href="/courses">Browse the courses</LinkButton>} />
        ) : (
          available.courses.map((course) => (
            <section key={course.courseSlug} aria-labelledby={`course-${course.courseSlug}`} className="flex flex-col gap-3">
              <h3 id={`course-${course.courseSlug}`} className="text-lg font-semibold">
                {course.courseTitle}
              </h3>
              <ul className="grid gap-4 md:grid-cols-2">
                {course.quizzes.map((quiz) => (
                  <QuizCard key={quiz.bankId} quiz={quiz} />
                ))}
              </ul>
            </section>
          ))
        )}
      </section>

      <section aria-labelledby="history" className="flex flex-col gap-3">
        <h2 id="history" className="text-xl font-semibold">
          Your attempts
        </h2>
        {mine.attempts.length === 0 ? (
          <p className="text-ink-muted">No attempts yet.</p>
        ) : (
          <Table caption="Your quiz attempts, newest first" captionHidden>
            <TableHead>
              <TableRow>
                <TableHeaderCell>Quiz</TableHeaderCell>
                <TableHeaderCell>Started (UTC)</TableHeaderCell>
                <TableHeaderCell>Status</TableHeaderCell>
                <TableHeaderCell numeric>Score</TableHeaderCell>
                <TableHeaderCell>Result</TableHeaderCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {mine.attempts.map((a) => (
                <TableRow key={a.attemptId}>
                  <TableHeaderCell scope="row">
                    <Link href={`/learn/quizzes/${a.attemptId}`}>{a.title}</Link>
                  </TableHeaderCell>
                  <TableCell>{formatUtc(a.startedAt)}</TableCell>
                  <TableCell>{STATUS_WORDS[a.status]}</TableCell>
                  <TableCell numeric>{a.percent === null ? "–" : formatPercent(a.percent)}</TableCell>
                  <TableCell>{a.passed === null ? "–" : a.passed ? "Passed" : "Not passed"}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        )}
      </section>
    </div>
  );
}
