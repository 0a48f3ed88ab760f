// GET /api/quizzes/:bankId/stats.csv?class=<id>: the item table as CSV, with the same authorization as the page.
import { db } from "@/db/client";
import { AccessError } from "@/lib/server/errors";
import { failureResponse } from "@/lib/server/http";
import { bankStatistics, statsCsv } from "@/lib/server/quiz-stats";
import { getViewer } from "@/lib/server/viewer";

export async function GET(request: Request, { params }: { params: Promise<{ bankId: string }> }) {
  const { bankId } = await params;
  const classId = new URL(request.url).searchParams.get("class");
  try {
    const stats = await bankStatistics(db(), await getViewer(), { bankId, classId });
    const fileName = `${stats.bankId}${stats.scope.classId ? "-class" : ""}-item-statistics.csv`;
    return new Response(statsCsv(stats), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${fileName}"`,
        "cache-control": "private, no-store",
      },
    });
  } catch (err) {
    if (err instanceof AccessError) return failureResponse(err.code);
    throw err;
  }
}
