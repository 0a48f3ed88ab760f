// GET /api/certificates/:id/credential: the graduate's Open Badges 3.0 credential, a VC-JWT
// (compact JWS; OB 3.0 §8.2), as a file.
import { getCredentialFile } from "@/lib/server/certificates";
import { respond } from "@/lib/server/http";
import { handleRoute } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (_request: Request, { params }: { params: Promise<{ certificateId: string }> }) => {
  const { certificateId } = await params;
  const result = await getCredentialFile(await getViewer(), { certificateId });
  if (!result.ok) return respond(result, { headers: { "cache-control": "private, no-store" } });
  return new Response(result.jwt, {
    headers: { "content-type": "application/jwt", "content-disposition": `attachment; filename="${result.filename}"`, "cache-control": "private, no-store" },
  });
});
