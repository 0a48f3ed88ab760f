import { acceptInvitation } from "@/lib/server/invitation-claims";
import { crossSiteFailure, requestContext, respond } from "@/lib/server/http";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { handleRoute } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

// POST { token }: the signed-in apprentice takes the seat their invitation holds. GET of the
// e-mailed address is the confirmation page (app/(auth)/invitations/[token]); it consumes nothing.
export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.accountForm);
  if (!body.ok) return respond(body);
  return respond(await acceptInvitation(await getViewer(), body.data, requestContext(request)), { headers: { "cache-control": "private, no-store" } });
});
