// POST /api/certificates {courseSlug}: issues the apprentice's certificate once the course is
// complete (403 with what is missing until then); a second call returns the same certificate.
import { issueCertificate } from "@/lib/server/certificates";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { handleRoute } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.command);
  if (!body.ok) return respond(body);
  return respond(await issueCertificate(await getViewer(), body.data), { headers: { "cache-control": "private, no-store" } });
});
