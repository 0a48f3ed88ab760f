// GET /api/quizzes/:bankId/stats.csv?class=<id>: the item table as CSV, with the same authorization as the page.
// A refusal is the usual JSON failure (status and sentence from lib/server/errors.ts).
import { handleRoute } from "@/lib/server/unavailable";
import { respond } from "@/lib/server/http";
import { getBankStatistics, statsCsv } from "@/lib/server/quiz-stats";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (request: Request, { params }: { params: Promise<{ bankId: string }> }) => {
  const { bankId } = await params;
  const classId = new URL(request.url).searchParams.get("class");
  const result = await getBankStatistics(await getViewer(), { bankId, classId });
  if (!result.ok) return respond(result, { headers: { "cache-control": "private, no-store" } });
  const { stats } = result;
  const fileName = `${stats.bankId}${stats.scope.classId ? "-class" : ""}-item-statistics.csv`;
  return new Response(statsCsv(stats), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "private, no-store",
    },
  });
});
