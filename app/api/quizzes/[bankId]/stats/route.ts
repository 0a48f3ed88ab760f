// GET /api/quizzes/:bankId/stats?class=<id>: item statistics as JSON (instructors of the class, admins).
import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { AccessError } from "@/lib/server/errors";
import { failureResponse } from "@/lib/server/http";
import { bankStatistics } from "@/lib/server/quiz-stats";
import { getViewer } from "@/lib/server/viewer";

export async function GET(request: Request, { params }: { params: Promise<{ bankId: string }> }) {
  const { bankId } = await params;
  const classId = new URL(request.url).searchParams.get("class");
  try {
    const stats = await bankStatistics(db(), await getViewer(), { bankId, classId });
    return NextResponse.json({ ok: true, stats }, { headers: { "cache-control": "private, no-store" } });
  } catch (err) {
    if (err instanceof AccessError) return failureResponse(err.code);
    throw err;
  }
}
