import { respond } from "@/lib/server/http";
import { checkHealth } from "@/lib/server/health";

export const dynamic = "force-dynamic";

export async function GET() {
  return respond(await checkHealth(), { headers: { "cache-control": "no-store" } });
}
