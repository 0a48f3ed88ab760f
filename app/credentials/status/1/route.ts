// GET /credentials/status/1: the revocation list of every certificate's credential, a
// BitstringStatusListCredential (W3C Bitstring Status List v1.0) signed as a VC-JWT.
import { respond } from "@/lib/server/http";
import { handleRoute } from "@/lib/server/unavailable";
import { statusListCredential } from "@/lib/server/verification";

export const GET = handleRoute(async () => {
  const result = await statusListCredential();
  if (!result.ok) return respond(result);
  return new Response(result.jwt, { headers: { "content-type": "application/jwt", "cache-control": "no-cache" } });
});
