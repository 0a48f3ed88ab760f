// GET /issuer/keys/:keyId: one public key as a JWK, what a credential's `kid` dereferences to
// (OB 3.0 §8.2.1: "A URI that can be dereferenced to an object of type JWK").
import { publicJwks } from "@/lib/certificates/signing";
import { failureResponse, publicOrigin } from "@/lib/server/http";

export const dynamic = "force-dynamic";

export async function GET(_request: Request, { params }: { params: Promise<{ keyId: string }> }) {
  const { keyId } = await params;
  const origin = publicOrigin();
  const wanted = `${origin}/issuer/keys/${encodeURIComponent(decodeURIComponent(keyId))}`;
  const key = (await publicJwks(origin)).keys.find((k) => k.kid === wanted);
  if (!key) return failureResponse("not_found", "There is no such key.");
  return Response.json(key, { headers: { "cache-control": "public, max-age=300" } });
}
