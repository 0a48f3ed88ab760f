import { handleRoute } from "@/lib/server/unavailable";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { signInWithLink } from "@/lib/server/accounts";
import { crossSiteFailure, requestContext, respond } from "@/lib/server/http";
import { sessionCookie } from "@/lib/server/session-cookie";

// Only a POST signs in. GET and HEAD of the e-mailed address land on the confirmation page (app/(auth)/sign-in/link).
export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.accountForm);
  if (!body.ok) return respond(body);
  const result = await signInWithLink(body.data, requestContext(request));
  // A first sign-in that cleared a password set before the address was proven goes to choose one.
  const response = respond(result.ok ? { ...result, next: result.mustChoosePassword ? "/account?choose-password=1#password" : undefined } : result, {
    omit: ["sessionToken", "userId", "maxAgeSeconds", "mustChoosePassword"],
  });
  if (result.ok) {
    const c = sessionCookie(result.sessionToken, result.maxAgeSeconds);
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
});
