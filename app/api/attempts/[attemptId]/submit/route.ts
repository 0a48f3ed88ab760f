// POST /api/attempts/:attemptId/submit: grades the saved answers once; a retry returns the same result.
import { handleRoute } from "@/lib/server/unavailable";
import { submitAttempt } from "@/lib/server/attempts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request, { params }: { params: Promise<{ attemptId: string }> }) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const { attemptId } = await params;
  return respond(await submitAttempt(await getViewer(), { attemptId }));
});
