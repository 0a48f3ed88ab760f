// GET /api/progress: the viewer's per-course and per-module progress (DTO), read by the apprentice
// home and the course pages in the browser so those pages can stay static.
import { handleRoute } from "@/lib/server/unavailable";
import { NextResponse } from "next/server";
import { respond } from "@/lib/server/http";
import { getProgressOverview } from "@/lib/server/progress";
import { getViewer } from "@/lib/server/viewer";

const PRIVATE = { "cache-control": "private, no-store" };

// Signed out is an answer ({ signedIn: false }), not a 401: public lesson pages read this, and a
// 401 would log a console error for every visitor.
export const GET = handleRoute(async () => {
  const viewer = await getViewer();
  if (!viewer) return NextResponse.json({ ok: true, signedIn: false, courses: [] }, { headers: PRIVATE });
  return respond(await getProgressOverview(viewer), { headers: PRIVATE });
});
