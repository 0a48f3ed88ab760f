// GET /api/attempts/:attemptId/result: score, per-question result and explanations (after submission only).
import { handleRoute } from "@/lib/server/unavailable";
import { getResult } from "@/lib/server/attempts";
import { respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (_request: Request, { params }: { params: Promise<{ attemptId: string }> }) => {
  const { attemptId } = await params;
  const result = await getResult(await getViewer(), attemptId);
  return respond(result, { headers: { "cache-control": "private, no-store" } });
});
