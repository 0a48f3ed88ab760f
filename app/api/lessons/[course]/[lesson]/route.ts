// GET /api/lessons/<course>/<lesson>: a lesson body as a JSON tree, for the player. Locked lessons
// only for viewers with access (lib/server/lessons.ts decides); 401 and 403 carry a sentence.
import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { getLessonBody } from "@/lib/server/lessons";
import { statusOf } from "@/lib/server/errors";
import { getViewer } from "@/lib/server/viewer";

const PRIVATE = { "cache-control": "private, no-store" };

export async function GET(_request: Request, { params }: { params: Promise<{ course: string; lesson: string }> }) {
  const { course, lesson } = await params;
  const result = await getLessonBody(db(), await getViewer(), { courseSlug: course, lessonId: lesson });
  if (!result.ok) return NextResponse.json(result, { status: statusOf(result.error), headers: PRIVATE });
  return NextResponse.json(result, { headers: PRIVATE });
}
