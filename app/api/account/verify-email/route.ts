import { verifyEmail } from "@/lib/server/accounts";
import { crossSiteFailure, readInput, respond } from "@/lib/server/http";

export async function POST(request: Request) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  return respond(await verifyEmail(await readInput(request)));
}
