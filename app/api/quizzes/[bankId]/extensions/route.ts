// POST /api/quizzes/:bankId/extensions {userId, extraMinutes}: an instructor gives one apprentice extra time.
import { grantExtension } from "@/lib/server/quiz-extensions";
import { crossSiteFailure, readInput, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export async function POST(request: Request, { params }: { params: Promise<{ bankId: string }> }) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const { bankId } = await params;
  return respond(await grantExtension(await getViewer(), { ...(await readInput(request)), bankId }));
}
