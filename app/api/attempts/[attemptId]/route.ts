// GET /api/attempts/:attemptId: the owner's view of an attempt (no keys before submission).
import { getAttemptView } from "@/lib/server/attempts";
import { respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export async function GET(_request: Request, { params }: { params: Promise<{ attemptId: string }> }) {
  const { attemptId } = await params;
  const result = await getAttemptView(await getViewer(), attemptId);
  return respond(result, { headers: { "cache-control": "private, no-store" } });
}
