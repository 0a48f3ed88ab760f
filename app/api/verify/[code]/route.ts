// GET /api/verify/:code: the public verification answer as JSON (what /verify/:code shows):
// 200 {found, status, …}, 429 with Retry-After when the address looked up too many unknown codes.
import { clientAddress, respond } from "@/lib/server/http";
import { handleRoute } from "@/lib/server/unavailable";
import { verifyCertificate } from "@/lib/server/verification";

export const GET = handleRoute(async (request: Request, { params }: { params: Promise<{ code: string }> }) => {
  const { code } = await params;
  return respond(await verifyCertificate({ code: decodeURIComponent(code) }, { address: clientAddress(request) }), { headers: { "cache-control": "no-store" } });
});
