import { handleRoute } from "@/lib/server/unavailable";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { signUp } from "@/lib/server/accounts";
import { crossSiteFailure, requestContext, respond } from "@/lib/server/http";

export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.accountForm);
  if (!body.ok) return respond(body);
  return respond(await signUp(body.data, requestContext(request)));
});
