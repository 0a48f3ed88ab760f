import { changePassword } from "@/lib/server/accounts";
import { crossSiteFailure, readInput, respond } from "@/lib/server/http";
import { sessionCookie } from "@/lib/server/session-cookie";
import { getViewer } from "@/lib/server/viewer";

// Change (or, after a first e-mail-link sign-in, choose) the password. Other sessions end; this one gets a new cookie.
export async function POST(request: Request) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const result = await changePassword(await getViewer(), await readInput(request));
  const response = respond(result, { omit: ["sessionToken", "userId", "maxAgeSeconds"] });
  if (result.ok) {
    const c = sessionCookie(result.sessionToken, result.maxAgeSeconds);
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
}
