import "server-only";
import type { PhotoFile } from "./uploads";

/**
 * A photo as the browser gets it: the type of the bytes we encoded (never the uploader's), shown
 * inline under a sanitised name; nosniff; a CSP that lets the response run nothing if opened on
 * its own; cached only by this browser, for five minutes (a photo never changes under its URL;
 * access withdrawn takes effect at the next fetch after that).
 */
export function photoResponse(photo: PhotoFile): Response {
  const ascii = photo.filename.replace(/[^\w .()-]/g, "_");
  return new Response(new Uint8Array(photo.body), {
    status: 200,
    headers: {
      "content-type": photo.contentType,
      "content-length": String(photo.body.length),
      // RFC 6266: a plain ASCII filename, and filename* (RFC 8187) for the name as written.
      "content-disposition": `inline; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(photo.filename)}`,
      "x-content-type-options": "nosniff",
      "content-security-policy": "default-src 'none'; sandbox",
      "cache-control": "private, max-age=300",
      "cross-origin-resource-policy": "same-origin",
    },
  });
}
