import { handleRoute } from "@/lib/server/unavailable";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { signInWithPassword } from "@/lib/server/accounts";
import { crossSiteFailure, requestContext, respond } from "@/lib/server/http";
import { sessionCookie } from "@/lib/server/session-cookie";

export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.accountForm);
  if (!body.ok) return respond(body);
  const result = await signInWithPassword(body.data, requestContext(request));
  const response = respond(result, { omit: ["sessionToken", "userId", "maxAgeSeconds"] });
  if (result.ok) {
    const c = sessionCookie(result.sessionToken, result.maxAgeSeconds);
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
});
