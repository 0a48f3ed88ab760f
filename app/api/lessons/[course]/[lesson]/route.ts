// GET /api/lessons/<course>/<lesson>: a lesson body as a JSON tree, for the player. Locked lessons
// only for viewers with access (lib/server/lessons.ts decides).
// A locked lesson the viewer may not read is an answer, not an error: 200 with `locked` ("sign-in"
// or "seat"), a sentence and, signed out, a sign-in link. Every visitor's browser asks for it, and a
// 401 or 403 would be logged as a console error on each view of a locked lesson.
import { handleRoute } from "@/lib/server/unavailable";
import { NextResponse } from "next/server";
import { getLessonBody } from "@/lib/server/lessons";
import { respond } from "@/lib/server/http";
import { getViewer } from "@/lib/server/viewer";

const PRIVATE = { "cache-control": "private, no-store" };

export const GET = handleRoute(async (_request: Request, { params }: { params: Promise<{ course: string; lesson: string }> }) => {
  const { course, lesson } = await params;
  const result = await getLessonBody(await getViewer(), { courseSlug: course, lessonId: lesson });
  if (result.ok) return NextResponse.json(result, { headers: PRIVATE });
  if (result.code === "not_signed_in") {
    const signInHref = "signInHref" in result ? result.signInHref : undefined;
    return NextResponse.json({ ok: true, locked: "sign-in", message: result.message, signInHref }, { headers: PRIVATE });
  }
  if (result.code === "forbidden") return NextResponse.json({ ok: true, locked: "seat", message: result.message }, { headers: PRIVATE });
  return respond(result, { headers: PRIVATE });
});
