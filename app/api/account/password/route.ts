import { db } from "@/db/client";
import { changePassword } from "@/lib/server/accounts";
import { crossSiteFailure, failureResponse, readInput, respond } from "@/lib/server/http";
import { sessionCookie } from "@/lib/server/session-cookie";
import { getViewer } from "@/lib/server/viewer";

// Change (or, after a first e-mail-link sign-in, choose) the password. Other sessions end; this one gets a new cookie.
export async function POST(request: Request) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const viewer = await getViewer();
  if (!viewer) return failureResponse("not_signed_in");
  const result = await changePassword(db(), viewer, await readInput(request));
  const response = respond(result, { omit: ["sessionToken", "userId", "maxAgeSeconds"] });
  if (result.ok) {
    const c = sessionCookie(result.sessionToken, result.maxAgeSeconds);
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
}
