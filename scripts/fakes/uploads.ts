// Runs the local upload stand-in (lib/storage/fake/server.ts) until SIGTERM, on
// UPLOADTHING_INGEST_URL's port (the API is served on the same origin), with the token's key and
// app id from uploadsSettings in lib/env.ts; files under UPLOADS_FAKE_DIR (git-ignored .data/).
import path from "node:path";
import { uploadsSettings } from "@/lib/env";
import { startUploadsFake } from "@/lib/storage/fake/server";

const settings = uploadsSettings(process.env, "local");
const address = new URL(settings.ingestUrl!);

startUploadsFake({
  port: Number(address.port || 80),
  host: address.hostname.replace(/^\[|\]$/g, ""),
  dir: path.resolve(settings.fakeDir, settings.appId),
  apiKey: settings.apiKey,
  appId: settings.appId,
})
  .then((fake) => {
    console.log(`[uploads] ingest, API and files on ${fake.url} (files in ${settings.fakeDir})`);
    const stop = () => fake.close().then(() => process.exit(0));
    process.on("SIGTERM", stop);
    process.on("SIGINT", stop);
  })
  .catch((err: Error) => {
    console.error(`[uploads] could not start: ${err.message}`);
    process.exit(1);
  });
