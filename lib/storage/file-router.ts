import "server-only";
// The upload service's file route for placement photos (slug "placementPhoto"). The browser asks
// our /api/uploadthing for presigned URLs; the middleware below runs first and creates our own
// record of every file before any byte moves; the service's signed callback then lands in
// onUploadComplete, which processes the photo at once and answers its outcome as serverData.
import { createUploadthing, UTFiles, UploadThingError, type FileRouter } from "uploadthing/server";
import { PHOTO_LIMITS, type PhotoUploadOutcome } from "@/lib/dto/uploads";
import type { Failure } from "@/lib/dto/result";
import { recordStored } from "@/lib/server/upload-records";
import { beginPhotoUploads, viewerFromRequest } from "@/lib/server/uploads";
import { clientAddress, crossSiteFailure } from "@/lib/server/http";
import { isDatabaseUnavailable, unavailable } from "@/lib/server/unavailable";
import { outcomeOf, processStoredUpload } from "./process-upload";
import { PRESIGNED_URL_SECONDS } from "./reconcile";

const f = createUploadthing({ errorFormatter: (error) => ({ message: error.message }) });

/** Our refusal as the SDK's error: its sentence reaches the uploader; 401/429 have no SDK code. */
function refusal(failure: Failure): UploadThingError {
  const code = failure.code === "invalid_input" ? "BAD_REQUEST" : failure.code === "not_found" ? "NOT_FOUND" : "FORBIDDEN";
  return new UploadThingError({ code, message: failure.message });
}

async function beginFor(req: Request, files: readonly { name: string; size: number; type: string }[]) {
  const viewer = await viewerFromRequest(req);
  const result = await beginPhotoUploads(viewer, { files: files.map((file) => ({ name: file.name, size: file.size, type: file.type })) }, clientAddress(req));
  return Object.assign(result, { viewer });
}

export const placementFileRouter = {
  placementPhoto: f({ image: { maxFileSize: "16MB", maxFileCount: PHOTO_LIMITS.maxFiles, minFileCount: 1 } }, { awaitServerData: true, presignedURLTTL: PRESIGNED_URL_SECONDS })
    .middleware(async ({ req, files }) => {
      const crossSite = crossSiteFailure(req);
      if (crossSite) throw refusal(crossSite);
      const begun = await beginFor(req, files).catch((error: unknown) => {
        // The SDK answers anything thrown here as a 500; a database outage at least gets its sentence.
        if (isDatabaseUnavailable(error)) throw new UploadThingError({ code: "INTERNAL_SERVER_ERROR", message: unavailable().message });
        throw error;
      });
      const viewer = begun.viewer;
      if (!begun.ok || !viewer) throw refusal(begun.ok ? { ok: false, code: "not_signed_in", message: "Please sign in to continue." } : begun);
      const ownerId = viewer.id;
      // Our row id travels as the file's customId; the sanitised name replaces the browser's.
      return { ownerId, [UTFiles]: files.map((file, i) => ({ ...file, name: begun.uploads[i].name, customId: begun.uploads[i].id })) };
    })
    .onUploadComplete(async ({ file, metadata }): Promise<PhotoUploadOutcome> => {
      const uploadId = file.customId;
      if (!uploadId) return { uploadId: "", status: "failed", message: "That upload is unknown." };
      const row = await recordStored({ uploadId, ownerId: metadata.ownerId, fileKey: file.key, byteSize: file.size });
      if (!row) return { uploadId, status: "failed", message: "That upload is unknown." };
      try {
        return await processStoredUpload(uploadId);
      } catch {
        // The service or the database hiccuped: the row stays stored and reconciliation retries it.
        return outcomeOf(row);
      }
    }),
} satisfies FileRouter;

/** For @uploadthing/react's generateReactHelpers<PlacementFileRouter>() (a type only). */
export type PlacementFileRouter = typeof placementFileRouter;
