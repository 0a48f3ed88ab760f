// PUT /api/attempts/:attemptId/answers/:questionId {answer, seq}: the quiz player's autosave.
import { diagramBounds } from "@/components/quiz/diagram-bounds";
import { saveAnswer } from "@/lib/server/attempts";
import { crossSiteFailure, readInput, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export async function PUT(request: Request, { params }: { params: Promise<{ attemptId: string; questionId: string }> }) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const { attemptId, questionId } = await params;
  const body = await readInput(request);
  // The drawings' sizes come from here: a clicked point must lie inside its picture.
  return respond(await saveAnswer(await getViewer(), { ...body, attemptId, questionId }, { diagramBounds }));
}
