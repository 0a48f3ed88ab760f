// npm run bench:photo — what one placement photo costs to process: a 12-megapixel JPEG (4000 × 3000,
// gradient plus noise, made here with sharp) through lib/storage/photo-pipeline.ts (signature and
// pixel checks, EXIF rotation, sRGB, no metadata, 1600 px display + 320 px thumbnail JPEGs).
// Goal (issue 12): median ≤ 1.5 s and peak memory ≤ 300 MB on this machine.
// The photo is made in this process; the pipeline runs in a child process of its own, so the
// child's peak resident set (process.resourceUsage().maxRSS, the kernel's high-water mark) is the
// pipeline's alone, not the image generator's.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import sharp from "sharp";

const RUNS = Number(process.env.BENCH_RUNS ?? 7);
const [WIDTH, HEIGHT] = [4000, 3000];

async function makePhoto(): Promise<Buffer> {
  const raw = Buffer.alloc(WIDTH * HEIGHT * 3);
  let seed = 12345;
  for (let y = 0; y < HEIGHT; y++) {
    for (let x = 0; x < WIDTH; x++) {
      seed = (seed * 1103515245 + 12345) >>> 0; // a small LCG: the same "photo" every run
      const n = (seed >>> 24) % 48;
      const i = (y * WIDTH + x) * 3;
      raw[i] = ((x * 255) / WIDTH + n) & 0xff;
      raw[i + 1] = ((y * 255) / HEIGHT + n) & 0xff;
      raw[i + 2] = (((x + y) * 127) / (WIDTH + HEIGHT) + n) & 0xff;
    }
  }
  return sharp(raw, { raw: { width: WIDTH, height: HEIGHT, channels: 3 } }).jpeg({ quality: 90 }).withMetadata({ orientation: 6 }).toBuffer();
}

async function measure(file: string): Promise<void> {
  const { processPhoto } = await import("@/lib/storage/photo-pipeline");
  const bytes = new Uint8Array(readFileSync(file));
  const baselineMb = process.resourceUsage().maxRSS / 1024; // Node, tsx and the modules, before any photo
  const times: number[] = [];
  let out = "";
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    const r = await processPhoto(bytes);
    times.push(performance.now() - t0);
    if (!r.ok) throw new Error(r.reason);
    out = `display ${r.display.width}×${r.display.height} (${Math.round(r.display.data.length / 1024)} KB), thumbnail ${r.thumb.width}×${r.thumb.height} (${Math.round(r.thumb.data.length / 1024)} KB)`;
  }
  times.sort((a, b) => a - b);
  const maxRssMb = process.resourceUsage().maxRSS / 1024; // maxRSS is in kilobytes (Node docs)
  console.log(JSON.stringify({ times, median: times[Math.floor(times.length / 2)], maxRssMb, baselineMb, out }));
}

async function main(): Promise<void> {
  if (process.argv[2] === "--measure") return measure(process.argv[3]);
  const dir = mkdtempSync(path.join(tmpdir(), "bench-photo-"));
  try {
    const file = path.join(dir, "photo.jpg");
    const photo = await makePhoto();
    writeFileSync(file, photo);
    console.log(`bench:photo: ${WIDTH}×${HEIGHT} JPEG (${(photo.length / 1024 / 1024).toFixed(1)} MB, EXIF orientation 6), ${RUNS} runs, sharp ${sharp.versions.sharp} / libvips ${sharp.versions.vips}, sharp threads ${sharp.concurrency()}`);
    const child = execFileSync(process.execPath, [...process.execArgv, process.argv[1], "--measure", file], { encoding: "utf8" });
    const r = JSON.parse(child.trim().split("\n").pop()!) as { times: number[]; median: number; maxRssMb: number; baselineMb: number; out: string };
    console.log(`  ${r.out}`);
    console.log(`  times (ms): ${r.times.map((t) => t.toFixed(0)).join(", ")}`);
    console.log(`  median ${(r.median / 1000).toFixed(2)} s (goal ≤ 1.5 s) · peak RSS ${r.maxRssMb.toFixed(0)} MB (goal ≤ 300 MB; the whole child process, of which ${r.baselineMb.toFixed(0)} MB before the first photo)`);
    if (r.median > 1500 || r.maxRssMb > 300) process.exitCode = 1;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err: Error) => {
  console.error(err.message);
  process.exit(1);
});
