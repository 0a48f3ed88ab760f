import { handleRoute } from "@/lib/server/unavailable";
import { signOut } from "@/lib/server/accounts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { clearedSessionCookie } from "@/lib/server/session-cookie";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const result = await signOut(await getViewer());
  // Already signed out is as good as signed out: the answer is a success and the cookie goes either way.
  const response = respond(result.ok || result.code === "not_signed_in" ? { ok: true } : result);
  const c = clearedSessionCookie();
  response.cookies.set(c.name, c.value, c.options);
  return response;
});
