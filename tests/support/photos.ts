// Test images made at test time with sharp, and metadata written and read with Debian's exiftool
// (an outside tool: libimage-exiftool-perl), so no binary fixtures are kept.
import { execFile } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { deflateSync } from "node:zlib";
import sharp from "sharp";

const run = promisify(execFile);

/** A width × height JPEG of random noise (noise keeps it photo-sized and makes truncation bite). */
export async function noiseJpeg(width: number, height: number, quality = 85): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < raw.length; i++) raw[i] = (i * 2654435761) >>> 24 ^ (Math.random() * 64) | 0;
  return sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality }).toBuffer();
}

export async function solidPng(width: number, height: number): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: "#3a6ea5" } }).png().toBuffer();
}

/**
 * A valid 1-bit grayscale PNG of width × height, all one colour, assembled by hand (PNG spec:
 * signature, IHDR, one zlib IDAT, IEND, CRC-32 per chunk): 20000 × 20000 is 400 megapixels in a
 * few tens of kilobytes, the classic pixel flood.
 */
export function pixelFloodPng(width: number, height: number): Buffer {
  const row = Buffer.alloc(1 + Math.ceil(width / 8)); // filter byte 0, then all-zero pixels
  const raw = Buffer.alloc(row.length * height);
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, "latin1"), data]);
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([1, 0, 0, 0, 0], 8); // bit depth 1, grayscale, deflate, filter 0, no interlace
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk("IHDR", ihdr), chunk("IDAT", deflateSync(raw, { level: 9 })), chunk("IEND", Buffer.alloc(0))]);
}

function crc32(buf: Buffer): number {
  let c = ~0;
  for (const byte of buf) {
    c ^= byte;
    for (let k = 0; k < 8; k++) c = c & 1 ? (c >>> 1) ^ 0xedb88320 : c >>> 1;
  }
  return ~c >>> 0;
}

async function withTempFile<T>(bytes: Uint8Array, ext: string, work: (file: string) => Promise<T>): Promise<T> {
  const dir = await mkdtemp(path.join(tmpdir(), "axisline-photo-"));
  const file = path.join(dir, `image${ext}`);
  try {
    await writeFile(file, bytes);
    return await work(file);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** Writes tags with exiftool (e.g. "-GPSLatitude=51.5"); answers the new bytes. */
export async function exiftoolWrite(bytes: Uint8Array, args: string[]): Promise<Buffer> {
  return withTempFile(bytes, ".jpg", async (file) => {
    await run("exiftool", ["-q", "-overwrite_original", "-n", ...args, file]);
    return readFile(file);
  });
}

/** Every tag exiftool finds, keyed "Group1:Tag" (exiftool -j -G1 -a -n). */
export async function exiftoolRead(bytes: Uint8Array): Promise<Record<string, unknown>> {
  return withTempFile(bytes, ".jpg", async (file) => {
    const { stdout } = await run("exiftool", ["-j", "-G1", "-a", "-n", file]);
    return (JSON.parse(stdout) as Record<string, unknown>[])[0];
  });
}
