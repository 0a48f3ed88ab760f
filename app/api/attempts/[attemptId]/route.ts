// GET /api/attempts/:attemptId: the owner's view of an attempt (no keys before submission).
import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { getAttemptView } from "@/lib/server/attempts";
import { statusOf } from "@/lib/server/errors";
import { getViewer } from "@/lib/server/viewer";

export async function GET(_request: Request, { params }: { params: Promise<{ attemptId: string }> }) {
  const { attemptId } = await params;
  const result = await getAttemptView(db(), await getViewer(), attemptId);
  return NextResponse.json(result, { status: result.ok ? 200 : statusOf(result.error), headers: { "cache-control": "private, no-store" } });
}
