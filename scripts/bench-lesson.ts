// One run, two targets of the same production build: a statically generated lesson page and a
// bare static page (/colophon). Prints req/s and p99 of each and their ratio (goal ≥ 0.9).
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

async function run(url: string) {
  const check = await fetch(url);
  if (!check.ok) throw new Error(`${url} answered ${check.status}`);
  const r = await autocannon({ url, connections, duration: seconds, pipelining: 1 });
  return { url, rps: r.requests.average, p99: r.latency.p99, non2xx: r.non2xx };
}

const kb = async (url: string) => ((await (await fetch(url)).arrayBuffer()).byteLength / 1000).toFixed(1);

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

await run(base + baselinePath); // warm-up of both caches
await run(base + lessonPath);
const pairs: { lesson: Awaited<ReturnType<typeof run>>; bare: Awaited<ReturnType<typeof run>> }[] = [];
for (let round = 0; round < rounds; round++) {
  const bare = await run(base + baselinePath);
  const lesson = await run(base + lessonPath);
  pairs.push({ lesson, bare });
  console.log(`round ${round + 1}: lesson ${lesson.rps.toFixed(0)} req/s (p99 ${lesson.p99} ms), bare ${bare.rps.toFixed(0)} req/s (p99 ${bare.p99} ms), ratio ${(lesson.rps / bare.rps).toFixed(2)}`);
}
const lesson = { rps: median(pairs.map((p) => p.lesson.rps)), p99: median(pairs.map((p) => p.lesson.p99)), non2xx: pairs.reduce((n, p) => n + p.lesson.non2xx, 0) };
const bare = { rps: median(pairs.map((p) => p.bare.rps)), p99: median(pairs.map((p) => p.bare.p99)), non2xx: pairs.reduce((n, p) => n + p.bare.non2xx, 0) };
const ratio = median(pairs.map((p) => p.lesson.rps / p.bare.rps));
const [lessonKb, bareKb] = [await kb(base + lessonPath), await kb(base + baselinePath)];
console.log(`${lessonPath} (${lessonKb} kB): median ${lesson.rps.toFixed(0)} req/s, p99 ${lesson.p99} ms${lesson.non2xx ? `, ${lesson.non2xx} non-2xx` : ""}`);
console.log(`${baselinePath} (${bareKb} kB): median ${bare.rps.toFixed(0)} req/s, p99 ${bare.p99} ms${bare.non2xx ? `, ${bare.non2xx} non-2xx` : ""}`);
console.log(`ratio lesson/bare: ${ratio.toFixed(2)} (median of ${rounds} rounds; goal >= 0.90), ${connections} connections, ${seconds} s per page per round`);

// Control: the same bytes from a server that does nothing but send them.
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
