import { requestPasswordReset } from "@/lib/server/accounts";
import { crossSiteFailure, readInput, requestContext, respond } from "@/lib/server/http";

export async function POST(request: Request) {
  const refused = crossSiteFailure(request);
  if (refused) return respond(refused);
  return respond(await requestPasswordReset(await readInput(request), requestContext(request)));
}
