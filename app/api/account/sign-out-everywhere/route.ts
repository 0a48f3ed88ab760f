import { handleRoute } from "@/lib/server/unavailable";
import { signOutEverywhere } from "@/lib/server/accounts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { clearedSessionCookie } from "@/lib/server/session-cookie";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const result = await signOutEverywhere(await getViewer());
  const response = respond(result);
  if (result.ok) {
    const c = clearedSessionCookie();
    response.cookies.set(c.name, c.value, c.options);
  }
  return response;
});
