// GET /api/attempts/:attemptId: the owner's view of an attempt (no keys before submission).
import { handleRoute } from "@/lib/server/unavailable";
import { getAttemptView } from "@/lib/server/attempts";
import { respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (_request: Request, { params }: { params: Promise<{ attemptId: string }> }) => {
  const { attemptId } = await params;
  const result = await getAttemptView(await getViewer(), attemptId);
  return respond(result, { headers: { "cache-control": "private, no-store" } });
});
