// GET /api/attempts: the viewer's quiz history, best score per quiz and topics to revisit.
import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { listMyAttempts } from "@/lib/server/quiz-history";
import { statusOf } from "@/lib/server/errors";
import { getViewer } from "@/lib/server/viewer";

export async function GET() {
  const result = await listMyAttempts(db(), await getViewer());
  return NextResponse.json(result, { status: result.ok ? 200 : statusOf(result.error), headers: { "cache-control": "private, no-store" } });
}
