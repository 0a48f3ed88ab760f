import { handleRoute } from "@/lib/server/unavailable";
import { NextResponse } from "next/server";
import { meDto } from "@/lib/server/users";
import { getViewer } from "@/lib/server/viewer";

// Read by the signed-in header (SWR). Only the DTO's fields leave the server.
// Signed out is an answer, not an error: { me: null } (a 401 would log a console error on every public page).
export const GET = handleRoute(async () => {
  const viewer = await getViewer();
  return NextResponse.json({ ok: true, me: viewer ? meDto(viewer) : null }, { headers: { "cache-control": "private, no-store" } });
});
