// GET /api/quizzes/:bankId/stats?class=<id>: item statistics as JSON (instructors of the class, admins).
import { handleRoute } from "@/lib/server/unavailable";
import { respond } from "@/lib/server/http";
import { getBankStatistics } from "@/lib/server/quiz-stats";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (request: Request, { params }: { params: Promise<{ bankId: string }> }) => {
  const { bankId } = await params;
  const classId = new URL(request.url).searchParams.get("class");
  return respond(await getBankStatistics(await getViewer(), { bankId, classId }), { headers: { "cache-control": "private, no-store" } });
});
