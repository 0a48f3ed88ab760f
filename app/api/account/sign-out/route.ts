import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { signOut } from "@/lib/server/accounts";
import { crossSiteFailure, respond } from "@/lib/server/http";
import { clearedSessionCookie } from "@/lib/server/session-cookie";
import { getViewer } from "@/lib/server/viewer";

export async function POST(request: Request) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  const viewer = await getViewer();
  if (viewer) await signOut(db(), viewer.sessionId);
  const response = NextResponse.json({ ok: true });
  const c = clearedSessionCookie();
  response.cookies.set(c.name, c.value, c.options);
  return response;
}
