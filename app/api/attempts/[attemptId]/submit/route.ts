// POST /api/attempts/:attemptId/submit: grades the saved answers once; a retry returns the same result.
import { submitAttempt } from "@/lib/server/attempts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export async function POST(request: Request, { params }: { params: Promise<{ attemptId: string }> }) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const { attemptId } = await params;
  return respond(await submitAttempt(await getViewer(), { attemptId }));
}
