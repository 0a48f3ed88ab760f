import "server-only";
// What an uploaded photo goes through before anyone sees it (docs/decisions/007-uploads-stand-in.md).
// The bytes decide: their signature, their size, their pixel count; never the name or the declared
// type. What comes out is a fresh JPEG (display and thumbnail) with no metadata at all: pixels
// turned upright from the EXIF orientation, converted to sRGB, no EXIF, GPS, XMP, IPTC or ICC.
import sharp, { type Metadata, type Sharp } from "sharp";
import { PHOTO_LIMITS } from "@/lib/dto/uploads";

export type SniffedFormat = "jpeg" | "png" | "webp";

/**
 * The format by its signature: JPEG starts FF D8 FF (ITU-T T.81 SOI marker + the next marker's FF),
 * PNG with its 8-byte signature 89 50 4E 47 0D 0A 1A 0A (PNG spec, 5.2), WebP is a RIFF container
 * whose form type at offset 8 is "WEBP" (RFC 9649, 2.5).
 */
export function sniffFormat(bytes: Uint8Array): SniffedFormat | null {
  const at = (offset: number, sig: number[]) => sig.every((b, i) => bytes[offset + i] === b);
  if (at(0, [0xff, 0xd8, 0xff])) return "jpeg";
  if (at(0, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "png";
  if (at(0, [0x52, 0x49, 0x46, 0x46]) && at(8, [0x57, 0x45, 0x42, 0x50])) return "webp";
  return null;
}

/** The ISO BMFF "ftyp" box with a HEIF brand: recognised only to say why it is refused. */
function looksLikeHeic(bytes: Uint8Array): boolean {
  const text = Buffer.from(bytes.subarray(4, 12)).toString("latin1");
  return text.startsWith("ftyp") && /^(heic|heix|hevc|heim|heis|mif1|msf1)$/.test(text.slice(4));
}

export type Variant = { data: Buffer; width: number; height: number };
export type PipelineResult =
  | { ok: true; format: SniffedFormat; display: Variant; thumb: Variant }
  | { ok: false; reason: string };

const QUALITY = { display: 82, thumb: 76 };

// libvips keeps recent operations and their pixels in a cache (50 MB by default) for reuse; each
// photo is processed once, so the cache only raises the process's memory (bench:photo).
sharp.cache(false);

const refuse = (reason: string): PipelineResult => ({ ok: false, reason });

/** Checks, re-encodes and strips one photo. Refusals carry the sentence the apprentice sees. */
export async function processPhoto(bytes: Uint8Array): Promise<PipelineResult> {
  if (bytes.length === 0) return refuse("That file is empty.");
  if (bytes.length > PHOTO_LIMITS.maxBytes) return refuse(`That photo is larger than ${PHOTO_LIMITS.maxBytes / 1024 / 1024} MB. Send a smaller copy.`);
  const format = sniffFormat(bytes);
  if (!format) {
    if (looksLikeHeic(bytes)) return refuse("HEIC photos can't be read here. Set the camera to save JPEG (often called 'most compatible') or export a JPEG copy, and send that.");
    return refuse("That file is not a JPEG, PNG or WebP photo.");
  }
  // failOn "error": a decoder error or a truncated file stops the pipeline (sharp's default,
  // "warning", also refuses harmless quirks some cameras write). limitInputPixels is libvips's own
  // guard; we check the header's dimensions first so a bomb is refused before any decoding.
  const input = () => sharp(bytes, { failOn: "error", limitInputPixels: PHOTO_LIMITS.maxPixels, sequentialRead: true });
  let meta: Metadata;
  try {
    // The header only (no pixels are decoded), without the limit, so a flood is named as such.
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    return refuse("That photo is damaged or incomplete and can't be read. Send it again.");
  }
  if (meta.format !== format) return refuse("That file's contents don't match a JPEG, PNG or WebP photo.");
  const pixels = (meta.width ?? 0) * (meta.height ?? 0);
  if (!pixels) return refuse("That photo has no size and can't be read.");
  if (pixels > PHOTO_LIMITS.maxPixels) return refuse(`That image is ${meta.width} × ${meta.height} pixels, more than ${PHOTO_LIMITS.maxPixels / 1_000_000} megapixels. Send a smaller copy.`);
  try {
    const display = await encode(input(), PHOTO_LIMITS.displayMaxPx, QUALITY.display);
    // The thumbnail from the display copy: already upright and sRGB, and a much smaller decode.
    const thumb = await encode(sharp(display.data, { failOn: "error" }), PHOTO_LIMITS.thumbMaxPx, QUALITY.thumb);
    return { ok: true, format, display, thumb };
  } catch {
    return refuse("That photo is damaged or incomplete and can't be read. Send it again.");
  }
}

/**
 * rotate() with no angle applies the EXIF orientation to the pixels. Output keeps no metadata
 * (sharp writes none unless asked with keepMetadata/withMetadata/keepIccProfile); pixels are
 * converted to sRGB from any embedded profile; transparency is flattened on white (JPEG has none).
 */
async function encode(image: Sharp, maxPx: number, quality: number): Promise<Variant> {
  const { data, info } = await image
    .rotate()
    .resize(maxPx, maxPx, { fit: "inside", withoutEnlargement: true })
    .toColourspace("srgb")
    .flatten({ background: "#ffffff" })
    .jpeg({ quality, progressive: true, chromaSubsampling: "4:2:0" })
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}
