// PUT /api/attempts/:attemptId/answers/:questionId {answer, seq}: the quiz player's autosave.
import { handleRoute } from "@/lib/server/unavailable";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { diagramBounds } from "@/components/quiz/diagram-bounds";
import { saveAnswer } from "@/lib/server/attempts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export const PUT = handleRoute(async (request: Request, { params }: { params: Promise<{ attemptId: string; questionId: string }> }) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const { attemptId, questionId } = await params;
  const body = await readBody(request, BODY_LIMITS.answer);
  if (!body.ok) return respond(body);
  // The drawings' sizes come from here: a clicked point must lie inside its picture.
  return respond(await saveAnswer(await getViewer(), { ...body.data, attemptId, questionId }, { diagramBounds }));
});
