// GET /api/attempts: the viewer's quiz history, best score per quiz and topics to revisit.
import { handleRoute } from "@/lib/server/unavailable";
import { listMyAttempts } from "@/lib/server/quiz-history";
import { respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async () => {
  const result = await listMyAttempts(await getViewer());
  return respond(result, { headers: { "cache-control": "private, no-store" } });
});
