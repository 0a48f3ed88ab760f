import type { Metadata } from "next";
import Link from "next/link";
import { formatUtc } from "@/components/quiz/format";
import { QuizPlayer } from "@/components/quiz/quiz-player";
import { getAttemptView } from "@/lib/server/attempts";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Quiz" };

export default async function QuizAttemptPage({ params }: { params: Promise<{ attemptId: string }> }) {
  const { attemptId } = await params;
  const viewer = await requirePageViewer(`/learn/quizzes/${attemptId}`, "apprentice");
  // Someone else's attempt and no attempt are both not_found (a 404), so ids can't be probed.
  const { view } = pageData(await getAttemptView(viewer, attemptId));
  return (
    <div className="mx-auto flex w-full max-w-3xl flex-col gap-6">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/learn/quizzes">Quizzes</Link> <span aria-hidden="true">›</span> <span aria-current="page">{view.title}</span>
      </nav>
      <header className="flex flex-col gap-1">
        <h1 className="text-3xl font-bold">{view.title}</h1>
        <p className="text-ink-muted">
          {view.questions.length} questions · pass mark {view.passingPercent} %{view.timeLimitMinutes !== null ? ` · ${view.timeLimitMinutes} minutes` : " · untimed"} · started {formatUtc(view.startedAt)}
        </p>
      </header>
      <QuizPlayer view={view} />
    </div>
  );
}
