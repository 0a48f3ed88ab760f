import "server-only";
import { UTApi } from "uploadthing/server";
import { uploadsSettings, type UploadsSettings } from "@/lib/env";

// The one place the upload service's SDK is configured. With SERVICES_MODE=local (the demo, tests)
// UPLOADTHING_INGEST_URL and UPLOADTHING_API_URL aim it at the stand-in (scripts/fakes/uploads.ts);
// unset in hosted mode, the SDK uses the service's own hosts. Nothing else differs.

let settings: UploadsSettings | undefined;
export function storageSettings(): UploadsSettings {
  settings ??= uploadsSettings();
  return settings;
}

/**
 * The SDK's config object (route handler and UTApi). isDev is always false: the callback then comes
 * from the service to our route (production mode); the stand-in can reach our loopback address,
 * and in hosted mode the service reaches our public one. (Dev mode streams the callback through
 * the route-metadata answer instead; see docs/decisions/007-uploads-stand-in.md.)
 */
export function sdkConfig() {
  const s = storageSettings();
  return {
    token: s.token,
    isDev: false,
    logLevel: "Error" as const,
    ...(s.ingestUrl ? { ingestUrl: s.ingestUrl } : {}),
    ...(s.apiUrl ? { apiUrl: s.apiUrl } : {}),
  };
}

let api: UTApi | undefined;
/** One UTApi per process. */
export function storageApi(): UTApi {
  api ??= new UTApi(sdkConfig());
  return api;
}
