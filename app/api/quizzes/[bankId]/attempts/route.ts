// POST /api/quizzes/:bankId/attempts: starts an attempt (or resumes the open one) for an enrolled apprentice.
import { handleRoute } from "@/lib/server/unavailable";
import { startAttempt } from "@/lib/server/attempts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request, { params }: { params: Promise<{ bankId: string }> }) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const { bankId } = await params;
  return respond(await startAttempt(await getViewer(), { bankId }));
});
