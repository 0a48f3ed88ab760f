// GET /api/photos/:uploadId/:variant (display | thumb): a processed placement photo, re-encoded and
// stripped, for its owner, admins and the instructors of the owner's classes; 404 to anyone else.
import { handleRoute } from "@/lib/server/unavailable";
import { photoResponse } from "@/lib/server/photo-response";
import { respond } from "@/lib/server/http";
import { readPhoto } from "@/lib/server/uploads";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (_request: Request, { params }: { params: Promise<{ uploadId: string; variant: string }> }) => {
  const result = await readPhoto(await getViewer(), await params);
  if (!result.ok) return respond(result, { headers: { "cache-control": "private, no-store" } });
  return photoResponse(result.photo);
});
