import { handleRoute } from "@/lib/server/unavailable";
import { respond } from "@/lib/server/http";
import { checkHealth } from "@/lib/server/health";

export const dynamic = "force-dynamic";

export const GET = handleRoute(async () => {
  return respond(await checkHealth(), { headers: { "cache-control": "no-store" } });
});
