import { NextResponse } from "next/server";
import { failureResponse } from "@/lib/server/http";
import { meDto } from "@/lib/server/users";
import { getViewer } from "@/lib/server/viewer";

// Read by the signed-in header (SWR). Only the DTO's fields leave the server.
export async function GET() {
  const viewer = await getViewer();
  if (!viewer) return failureResponse("not_signed_in");
  return NextResponse.json({ ok: true, me: meDto(viewer) }, { headers: { "cache-control": "private, no-store" } });
}
