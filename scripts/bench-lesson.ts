// One run, two targets of the same production build: a statically generated lesson page and a
// bare static page (/colophon). Prints req/s and p99 of each and their ratio (goal ≥ 0.9).
// Load goes only to 127.0.0.1 and stops by itself.
//   BENCH_BASE_URL=http://127.0.0.1:3000 tsx scripts/bench-lesson.ts [lesson path]
import autocannon from "autocannon";

const base = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000";
if (!/^http:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(base)) throw new Error("bench-lesson only loads a server on this machine (127.0.0.1)");
const lessonPath = process.argv[2] ?? "/courses/how-microphones-hear/les-mic-moving-coil";
const baselinePath = "/colophon";
const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);

async function run(path: string) {
  const check = await fetch(base + path);
  if (!check.ok) throw new Error(`${path} answered ${check.status}`);
  const r = await autocannon({ url: base + path, connections, duration: seconds, pipelining: 1 });
  return { path, rps: r.requests.average, p99: r.latency.p99, non2xx: r.non2xx };
}

await run(baselinePath); // warm-up of both caches
await run(lessonPath);
const bare = await run(baselinePath);
const lesson = await run(lessonPath);
for (const r of [lesson, bare]) console.log(`${r.path}: ${r.rps.toFixed(0)} req/s, p99 ${r.p99} ms${r.non2xx ? `, ${r.non2xx} non-2xx` : ""}`);
console.log(`ratio lesson/bare: ${(lesson.rps / bare.rps).toFixed(2)} (goal >= 0.90), ${connections} connections, ${seconds} s each`);
