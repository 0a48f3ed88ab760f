// Checks shared by the unit test of public/ and the e2e test that fetches it from the server:
// the web app manifest's shape and a PNG's pixel size.
import { z } from "zod";

const hex = z.string().regex(/^#[0-9a-f]{6}$/);

/** The members we rely on (W3C Web App Manifest: name, short_name, start_url, display, colours, icons). */
export const WebManifest = z.object({
  name: z.string().min(1),
  short_name: z.string().min(1).max(12),
  start_url: z.string().startsWith("/"),
  scope: z.string().startsWith("/"),
  display: z.enum(["fullscreen", "standalone", "minimal-ui", "browser"]),
  background_color: hex,
  theme_color: hex,
  icons: z
    .array(
      z.object({
        src: z.string().regex(/^\/icons\/[a-z0-9-]+\.png$/),
        sizes: z.string().regex(/^\d+x\d+$/),
        type: z.literal("image/png"),
        purpose: z.enum(["any", "maskable", "monochrome"]),
      }),
    )
    .min(1),
});
export type WebManifest = z.infer<typeof WebManifest>;

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

/** Width and height from a PNG's IHDR chunk (PNG Specification, 2nd ed., W3C Recommendation 2003 / ISO/IEC 15948:2003: §5.2 signature, §11.2.2 IHDR). */
export function pngSize(bytes: Uint8Array): { width: number; height: number } {
  if (bytes.length < 24 || PNG_SIGNATURE.some((b, i) => bytes[i] !== b)) throw new Error("not a PNG file");
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const chunkType = String.fromCharCode(...bytes.subarray(12, 16));
  if (chunkType !== "IHDR") throw new Error(`first PNG chunk is ${chunkType}, not IHDR`);
  return { width: view.getUint32(16), height: view.getUint32(20) };
}

/** "192x192" → { width: 192, height: 192 } */
export function declaredSize(sizes: string): { width: number; height: number } {
  const [width, height] = sizes.split("x").map(Number);
  return { width, height };
}
