import { classOfficeCsv, csvFileName } from "@/lib/server/office-csv";
import { respond } from "@/lib/server/http";
import { getClassOffice, parseSort } from "@/lib/server/school-office";
import { handleRoute } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

// The class's apprentice table as a CSV file, sorted as the page was. Same checks as the page:
// signed out 401, another role 403, another school's class 404.
export const GET = handleRoute(async (request: Request, { params }: { params: Promise<{ classId: string }> }) => {
  const { classId } = await params;
  const url = new URL(request.url);
  const result = await getClassOffice(await getViewer(), classId, parseSort(url.searchParams.get("sort"), url.searchParams.get("dir")));
  if (!result.ok) return respond(result, { headers: { "cache-control": "private, no-store" } });
  return new Response(classOfficeCsv(result.office), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${csvFileName(result.office)}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
