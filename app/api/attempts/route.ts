// GET /api/attempts: the viewer's quiz history, best score per quiz and topics to revisit.
import { db } from "@/db/client";
import { listMyAttempts } from "@/lib/server/quiz-history";
import { respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

export async function GET() {
  const result = await listMyAttempts(db(), await getViewer());
  return respond(result, { headers: { "cache-control": "private, no-store" } });
}
