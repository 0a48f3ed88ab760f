import "server-only";
import { createRouteHandler } from "uploadthing/server";
import { env } from "@/lib/env";
import { placementFileRouter } from "./file-router";
import { sdkConfig } from "./service";

// The server adapter (uploadthing/server) takes a standard Request, so the same handler serves
// Next's route and a test's own HTTP server.

type Handler = (request: Request) => Promise<Response>;
let handler: Handler | undefined;

/**
 * Built on first use, not at import (a production build must not need the service's token). The
 * callback URL is our public one (NEXTAUTH_URL), not what a proxy made of the request's URL.
 */
export function uploadRouteHandler(callbackOrigin: string = env().NEXTAUTH_URL): Handler {
  handler ??= createRouteHandler({
    router: placementFileRouter,
    config: { ...sdkConfig(), callbackUrl: `${callbackOrigin.replace(/\/$/, "")}/api/uploadthing`, handleDaemonPromise: "await" },
  });
  return handler;
}
