// Client-safe facts about placement photos: the limits the uploader can show before anything is
// sent (the server checks them again, and the bytes themselves), and what an upload answers.

/** What one photo may be. Checked on the bytes, never on the name or the declared type. */
export const PHOTO_LIMITS = {
  /** 16 MiB: a 12-megapixel phone JPEG is 3–8 MB; the upload service's route limit is the same ("16MB" = 16 × 1024² bytes). */
  maxBytes: 16 * 1024 * 1024,
  /** Photos per upload request (and per submission's uploader). */
  maxFiles: 6,
  /** 40 megapixels: above any phone camera, far below a decompression bomb (a 20000 × 20000 image is 400 MP). */
  maxPixels: 40_000_000,
  /** Formats recognised by their signature. HEIC is not read here (docs/decisions/007-uploads-stand-in.md). */
  formats: ["JPEG", "PNG", "WebP"] as const,
  /** Longest side of the served display copy and the thumbnail, in pixels. */
  displayMaxPx: 1600,
  thumbMaxPx: 320,
} as const;

export type PhotoVariant = "display" | "thumb";
export const PHOTO_VARIANTS: readonly PhotoVariant[] = ["display", "thumb"];

/**
 * What the uploader gets back for each photo once the service has it (the file route's serverData):
 * processed (ready to attach to a submission) or failed with a sentence for the apprentice.
 * "stored" means processing will be retried in the background (the page can check again later).
 */
export type PhotoUploadOutcome =
  | { uploadId: string; status: "processed"; width: number; height: number; thumbUrl: string; displayUrl: string }
  | { uploadId: string; status: "failed"; message: string }
  | { uploadId: string; status: "stored" | "pending"; message: string };

/** Where our route serves a processed photo (app/api/photos/[uploadId]/[variant]/route.ts). */
export function photoUrl(uploadId: string, variant: PhotoVariant): string {
  return `/api/photos/${uploadId}/${variant}`;
}
