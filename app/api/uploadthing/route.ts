import { uploadRouteHandler } from "@/lib/storage/route-handler";
import { handleRoute } from "@/lib/server/unavailable";

// The upload service's route (SDK: uploadthing/server's standard-Request adapter): GET answers the file routes' config; POST
// takes the browser's upload request (?actionType=upload&slug=placementPhoto) and the service's
// signed callback (header uploadthing-hook). Authorization is in the file route's middleware.
export const GET = handleRoute((request: Request) => uploadRouteHandler()(request));
export const POST = handleRoute((request: Request) => uploadRouteHandler()(request));
