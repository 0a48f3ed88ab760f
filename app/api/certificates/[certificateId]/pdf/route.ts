// GET /api/certificates/:id/pdf?paper=a4|letter: the graduate's certificate as a PDF.
import { getCertificatePdf } from "@/lib/server/certificates";
import { respond } from "@/lib/server/http";
import { handleRoute } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

export const GET = handleRoute(async (request: Request, { params }: { params: Promise<{ certificateId: string }> }) => {
  const { certificateId } = await params;
  const paper = new URL(request.url).searchParams.get("paper") ?? undefined;
  const result = await getCertificatePdf(await getViewer(), { certificateId, paper });
  if (!result.ok) return respond(result, { headers: { "cache-control": "private, no-store" } });
  return new Response(Buffer.from(result.pdf), {
    headers: { "content-type": "application/pdf", "content-disposition": `attachment; filename="${result.filename}"`, "cache-control": "private, no-store" },
  });
});
