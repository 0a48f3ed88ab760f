import "server-only";
// The request context (client address, public base URL) for a server action, which gets headers
// rather than a Request. The address rule is clientAddress's in http.ts: only what our server
// edge wrote (its peer header present) is believed.
import { headers } from "next/headers";
import { env } from "@/lib/env";
import { EDGE_HEADERS } from "@/lib/net/client-address";
import type { RequestContext } from "./accounts";

export async function actionContext(): Promise<RequestContext> {
  const h = await headers();
  const address = h.get(EDGE_HEADERS.peerAddress) ? h.get(EDGE_HEADERS.clientAddress)?.trim() || "unknown" : "unknown";
  return { address, baseUrl: env().NEXTAUTH_URL.replace(/\/$/, "") };
}
