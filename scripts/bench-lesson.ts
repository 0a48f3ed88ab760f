// One run, two targets of the same production build: a statically generated lesson page and a
// bare static page (/colophon). Prints req/s and p99 of each and their ratio (goal ≥ 0.9), for
// a client that accepts gzip as browsers do and for one that asks for no compression.
// Then a control: the same two pages' bytes served by a bare node:http server in its own
// process, which shows how much of the gap is only the bytes (loopback copy and the load
// generator reading them on the same cores), not the work of serving a page.
// Load goes only to 127.0.0.1 and stops by itself.
//   BENCH_BASE_URL=http://127.0.0.1:3000 tsx scripts/bench-lesson.ts [lesson path]
import { spawn } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import autocannon from "autocannon";

const base = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000";
if (!/^http:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(base)) throw new Error("bench-lesson only loads a server on this machine (127.0.0.1)");
const lessonPath = process.argv[2] ?? "/courses/how-microphones-hear/les-mic-moving-coil";
const baselinePath = "/colophon";
const seconds = Number(process.env.BENCH_SECONDS ?? 5);
// Rounds alternate the two pages, so a slow patch of this shared machine hits both alike; the
// ratio printed is the median of the rounds' ratios.
const rounds = Number(process.env.BENCH_ROUNDS ?? 5);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);

// Two kinds of client, both measured: one that asks as every browser does (Accept-Encoding:
// gzip among others), so the server answers gzip, and one that sends no Accept-Encoding, so
// the pages go out uncompressed (autocannon's default, and the harder case for a big page).
const PROFILES = [
  { name: "as a browser asks (Accept-Encoding: gzip, deflate, br, zstd)", headers: { "accept-encoding": "gzip, deflate, br, zstd" } },
  { name: "without Accept-Encoding (uncompressed)", headers: {} as Record<string, string> },
];

async function run(url: string, headers: Record<string, string> = {}) {
  const check = await fetch(url);
  if (!check.ok) throw new Error(`${url} answered ${check.status}`);
  const r = await autocannon({ url, connections, duration: seconds, pipelining: 1, headers });
  return { url, rps: r.requests.average, p99: r.latency.p99, non2xx: r.non2xx, bytesPerRequest: r.throughput.total / Math.max(1, r.requests.total) };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function measure(profile: (typeof PROFILES)[number]) {
  console.log(`\n${profile.name}`);
  await run(base + baselinePath, profile.headers); // warm-up of both caches
  await run(base + lessonPath, profile.headers);
  const pairs: { lesson: Awaited<ReturnType<typeof run>>; bare: Awaited<ReturnType<typeof run>> }[] = [];
  for (let round = 0; round < rounds; round++) {
    const bare = await run(base + baselinePath, profile.headers);
    const lesson = await run(base + lessonPath, profile.headers);
    pairs.push({ lesson, bare });
    console.log(`  round ${round + 1}: lesson ${lesson.rps.toFixed(0)} req/s (p99 ${lesson.p99} ms), bare ${bare.rps.toFixed(0)} req/s (p99 ${bare.p99} ms), ratio ${(lesson.rps / bare.rps).toFixed(2)}`);
  }
  const summary = (pick: (p: (typeof pairs)[number]) => Awaited<ReturnType<typeof run>>) => ({
    rps: median(pairs.map((p) => pick(p).rps)),
    p99: median(pairs.map((p) => pick(p).p99)),
    non2xx: pairs.reduce((n, p) => n + pick(p).non2xx, 0),
    kb: (pick(pairs[0]).bytesPerRequest / 1000).toFixed(1),
  });
  const lesson = summary((p) => p.lesson);
  const bare = summary((p) => p.bare);
  const ratio = median(pairs.map((p) => p.lesson.rps / p.bare.rps));
  const line = (path: string, s: typeof lesson) =>
    `  ${path} (${s.kb} kB per response): median ${s.rps.toFixed(0)} req/s, p99 ${s.p99} ms${s.non2xx ? `, ${s.non2xx} non-2xx` : ""}`;
  console.log(line(lessonPath, lesson));
  console.log(line(baselinePath, bare));
  console.log(`  ratio lesson/bare: ${ratio.toFixed(2)} (median of ${rounds} rounds; goal >= 0.90), ${connections} connections, ${seconds} s per page per round`);
  return { lesson, bare, ratio };
}

const results = [];
for (const profile of PROFILES) results.push(await measure(profile));
const [, { lesson, bare }] = results;

// Control, for the uncompressed case: the same bytes from a server that does nothing but send them.
console.log("");
const dir = mkdtempSync(path.join(tmpdir(), "axisline-bench-"));
writeFileSync(path.join(dir, "lesson.html"), Buffer.from(await (await fetch(base + lessonPath)).arrayBuffer()));
writeFileSync(path.join(dir, "bare.html"), Buffer.from(await (await fetch(base + baselinePath)).arrayBuffer()));
const serverCode = `
const http = require("node:http"), fs = require("node:fs"), path = require("node:path");
const files = { "/lesson": fs.readFileSync(path.join(${JSON.stringify(dir)}, "lesson.html")), "/bare": fs.readFileSync(path.join(${JSON.stringify(dir)}, "bare.html")) };
const server = http.createServer((req, res) => { const body = files[req.url]; res.writeHead(body ? 200 : 404, { "content-type": "text/html; charset=utf-8", "content-length": body ? body.length : 0 }); res.end(body); });
server.listen(0, "127.0.0.1", () => process.stdout.write(String(server.address().port) + "\\n"));`;
const child = spawn(process.execPath, ["-e", serverCode], { stdio: ["ignore", "pipe", "inherit"] });
try {
  const port = await new Promise<string>((resolve, reject) => {
    child.stdout.once("data", (chunk: Buffer) => resolve(chunk.toString().trim()));
    child.once("exit", (code) => reject(new Error(`control server exited (${code})`)));
  });
  const control = `http://127.0.0.1:${port}`;
  await run(control + "/bare");
  const controlBare = await run(control + "/bare");
  const controlLesson = await run(control + "/lesson");
  console.log(
    `control, the same bytes from a bare node:http server: lesson ${controlLesson.rps.toFixed(0)} req/s, bare ${controlBare.rps.toFixed(0)} req/s, ratio ${(controlLesson.rps / controlBare.rps).toFixed(2)}`,
  );
  const extraMsPerRequest = (1000 / lesson.rps - 1000 / bare.rps).toFixed(3);
  const bytesOnlyMs = (1000 / controlLesson.rps - 1000 / controlBare.rps).toFixed(3);
  console.log(`extra time per lesson request: ${extraMsPerRequest} ms through the app, ${bytesOnlyMs} ms for the bytes alone`);
} finally {
  child.kill();
}
