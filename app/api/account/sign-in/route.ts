import { signInWithPassword } from "@/lib/server/accounts";
import { crossSiteFailure, readInput, requestContext, respond } from "@/lib/server/http";
import { sessionCookie } from "@/lib/server/session-cookie";

export async function POST(request: Request) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const result = await signInWithPassword(await readInput(request), requestContext(request));
  const response = respond(result, { omit: ["sessionToken", "userId", "maxAgeSeconds"] });
  if (result.ok) {
    const c = sessionCookie(result.sessionToken, result.maxAgeSeconds);
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
}
