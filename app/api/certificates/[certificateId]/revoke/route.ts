// POST /api/certificates/:id/revoke {reason}: admins, and instructors of the issuing school.
import { revokeCertificate } from "@/lib/server/certificate-admin";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { BODY_LIMITS, readBody } from "@/lib/server/request-body";
import { handleRoute } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

export const POST = handleRoute(async (request: Request, { params }: { params: Promise<{ certificateId: string }> }) => {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const body = await readBody(request, BODY_LIMITS.command);
  if (!body.ok) return respond(body);
  const { certificateId } = await params;
  return respond(await revokeCertificate(await getViewer(), { ...body.data, certificateId }), { headers: { "cache-control": "private, no-store" } });
});
