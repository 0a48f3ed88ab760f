// GET /issuer: the issuer's Open Badges 3.0 Profile (the `issuer.id` of every credential).
import { issuerProfile } from "@/lib/certificates/credential";
import { publicOrigin } from "@/lib/server/http";

export const dynamic = "force-dynamic";

export function GET() {
  return Response.json(issuerProfile(publicOrigin()), { headers: { "cache-control": "public, max-age=300" } });
}
