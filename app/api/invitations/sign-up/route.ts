import { signUpFromInvitation } from "@/lib/server/invitation-claims";
import { crossSiteFailure, requestContext, respond } from "@/lib/server/http";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { sessionCookie } from "@/lib/server/session-cookie";
import { handleRoute } from "@/lib/server/unavailable";

// POST { token, name, password }: a newcomer creates the account the invitation's address proves,
// takes the seat, and is signed in (the session cookie, never the token in the body).
export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.accountForm);
  if (!body.ok) return respond(body);
  const result = await signUpFromInvitation(body.data, requestContext(request));
  const response = respond(result, { omit: ["sessionToken", "userId", "maxAgeSeconds"], headers: { "cache-control": "private, no-store" } });
  if (result.ok) {
    const c = sessionCookie(result.sessionToken, result.maxAgeSeconds);
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
});
