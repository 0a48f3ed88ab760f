// GET /issuer/jwks.json: the public keys that verify our credentials and status list (RFC 7517
// JWK Set), current key first; keys retired from signing stay here so older credentials verify.
import { publicJwks } from "@/lib/certificates/signing";
import { publicOrigin } from "@/lib/server/http";

export const dynamic = "force-dynamic";

export async function GET() {
  return Response.json(await publicJwks(publicOrigin()), { headers: { "cache-control": "public, max-age=300" } });
}
