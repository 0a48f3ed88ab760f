// POST /api/quizzes/:bankId/extensions {userId, extraMinutes}: an instructor gives one apprentice extra time.
import { handleRoute } from "@/lib/server/unavailable";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { grantExtension } from "@/lib/server/quiz-extensions";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request, { params }: { params: Promise<{ bankId: string }> }) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.command);
  if (!body.ok) return respond(body);
  const { bankId } = await params;
  return respond(await grantExtension(await getViewer(), { ...body.data, bankId }));
});
