// `npm run bench:lesson`: what serving a statically generated lesson costs, in one run, against
// the cluster of `npm run start:cluster` (start it first; load goes only to 127.0.0.1).
//  (a) through the proxy: the lesson from nginx's cache, to a client that asks as browsers do
//      (gzip, br...), against a plain file with the same bytes in the same encoding (the
//      lesson's HTML as the proxy sends it, saved once into nginx's folder as lesson.html,
//      .gz and .br) served by the same nginx. Goal: ratio >= 0.90.
//  (b) Next.js alone: the lesson from one app instance directly, against the bare /colophon
//      page of the same instance. Printed as it is (no goal): the framework's cost of a bigger page.
// Rounds alternate the two targets of each pair, so a slow patch of this shared machine hits both
// alike; each ratio printed is the median of the rounds' ratios.
//   BENCH_PROXY_URL (http://127.0.0.1:8080)  BENCH_APP_URL (instance A, http://127.0.0.1:3001)
//   NGINX_DIR (.data/nginx)  BENCH_SECONDS (5)  BENCH_ROUNDS (5)  BENCH_CONNECTIONS (20)
//   tsx scripts/bench-lesson.ts [lesson path]
import { mkdirSync, writeFileSync } from "node:fs";
import { get as httpGet } from "node:http";
import { loadavg } from "node:os";
import path from "node:path";
import autocannon from "autocannon";

const proxy = process.env.BENCH_PROXY_URL ?? "http://127.0.0.1:8080";
const app = process.env.BENCH_APP_URL ?? "http://127.0.0.1:3001";
for (const base of [proxy, app]) {
  if (!/^http:\/\/127\.0\.0\.1(:\d+)?$/.test(base)) throw new Error(`bench-lesson only loads servers on this machine (http://127.0.0.1:port), not ${base}`);
}
const nginxDir = path.resolve(process.env.NGINX_DIR ?? ".data/nginx");
const lessonPath = process.argv[2] ?? "/courses/how-microphones-hear/les-mic-moving-coil";
const barePath = "/colophon";
const staticPath = "/__bench/lesson.html";
const seconds = Number(process.env.BENCH_SECONDS ?? 5);
const rounds = Number(process.env.BENCH_ROUNDS ?? 5);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);
// What every current browser sends.
const BROWSER = { "accept-encoding": "gzip, deflate, br, zstd" };

type Run = { rps: number; p99: number; non2xx: number; bytesPerRequest: number };

async function run(url: string, headers: Record<string, string>): Promise<Run> {
  const r = await autocannon({ url, connections, duration: seconds, pipelining: 1, headers });
  return { rps: r.requests.average, p99: r.latency.p99, non2xx: r.non2xx, bytesPerRequest: r.throughput.total / Math.max(1, r.requests.total) };
}

async function fetchOk(url: string, headers: Record<string, string> = {}) {
  const res = await fetch(url, { headers });
  if (!res.ok) throw new Error(`${url} answered ${res.status}: is the cluster running (npm run start:cluster)?`);
  return res;
}

/** The body exactly as sent (fetch would decode it), with its Content-Encoding and X-Cache-Status. */
function raw(url: string, headers: Record<string, string>): Promise<{ body: Buffer; encoding: string; cache: string }> {
  return new Promise((resolve, reject) => {
    httpGet(url, { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => {
        if (res.statusCode !== 200) reject(new Error(`${url} answered ${res.statusCode}: is the cluster running (npm run start:cluster)?`));
        else resolve({ body: Buffer.concat(chunks), encoding: String(res.headers["content-encoding"] ?? ""), cache: String(res.headers["x-cache-status"] ?? "") });
      });
    }).on("error", reject);
  });
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const load = () => loadavg().map((l) => l.toFixed(2)).join(" ");

/** Alternates two targets over the rounds; prints each round, then the medians and the median ratio. */
async function pair(title: string, first: { label: string; url: string }, second: { label: string; url: string }, headers: Record<string, string>) {
  console.log(`\n${title}`);
  await run(first.url, headers); // warm-up
  await run(second.url, headers);
  const rows: { a: Run; b: Run }[] = [];
  for (let round = 0; round < rounds; round++) {
    const b = await run(second.url, headers);
    const a = await run(first.url, headers);
    rows.push({ a, b });
    console.log(`  round ${round + 1}: ${first.label} ${a.rps.toFixed(0)} req/s (p99 ${a.p99} ms), ${second.label} ${b.rps.toFixed(0)} req/s (p99 ${b.p99} ms), ratio ${(a.rps / b.rps).toFixed(2)}`);
  }
  const summary = (pick: (r: (typeof rows)[number]) => Run, label: string) => {
    const non2xx = rows.reduce((n, r) => n + pick(r).non2xx, 0);
    const kb = (pick(rows[0]).bytesPerRequest / 1000).toFixed(1);
    console.log(`  ${label} (${kb} kB per response): median ${median(rows.map((r) => pick(r).rps)).toFixed(0)} req/s, p99 ${median(rows.map((r) => pick(r).p99))} ms${non2xx ? `, ${non2xx} non-2xx` : ""}`);
  };
  summary((r) => r.a, first.label);
  summary((r) => r.b, second.label);
  const ratio = median(rows.map((r) => r.a.rps / r.b.rps));
  return ratio;
}

console.log(`bench:lesson, ${connections} connections, ${seconds} s per target per round, ${rounds} rounds; load average ${load()} (1, 5, 15 min)`);

// The yardstick files: the lesson's bytes exactly as the proxy's cache sends them in each
// encoding, saved once into nginx's folder (lesson.html, lesson.html.gz, lesson.html.br).
const lessonBytes = Buffer.from(await (await fetchOk(app + lessonPath)).arrayBuffer());
const benchDir = path.join(nginxDir, "bench");
mkdirSync(benchDir, { recursive: true });
writeFileSync(path.join(benchDir, "lesson.html"), lessonBytes);
for (const [encoding, suffix] of [["gzip", ".gz"], ["br", ".br"]] as const) {
  await raw(proxy + lessonPath, { "accept-encoding": encoding }); // fills the cache for this encoding
  const cached = await raw(proxy + lessonPath, { "accept-encoding": encoding });
  if (cached.cache !== "HIT") throw new Error(`the lesson is not served from nginx's cache (X-Cache-Status: ${cached.cache || "none"}): is BENCH_PROXY_URL the cluster's nginx?`);
  if (cached.encoding === encoding) writeFileSync(path.join(benchDir, `lesson.html${suffix}`), cached.body);
}
const proxied = await raw(proxy + lessonPath, BROWSER);
const file = await raw(proxy + staticPath, BROWSER);
if (!proxied.body.equals(file.body) || proxied.encoding !== file.encoding) {
  throw new Error(`nginx does not serve the saved file at ${staticPath} as the cache sends the lesson: is NGINX_DIR (${nginxDir}) this proxy's folder?`);
}
const decoded = Buffer.from(await (await fetchOk(proxy + lessonPath, BROWSER)).arrayBuffer());
if (!decoded.equals(lessonBytes)) throw new Error("the proxy's lesson differs from the app's: is the proxy in front of this app (BENCH_APP_URL)?");
console.log(`lesson ${lessonPath}: ${lessonBytes.length} bytes of HTML; to a browser the proxy sends it from its cache as ${proxied.encoding || "identity"}, ${proxied.body.length} bytes`);

const proxyRatio = await pair(
  `(a) through nginx, as a browser asks (${BROWSER["accept-encoding"]}): cached lesson vs a file of the same bytes`,
  { label: "cached lesson", url: proxy + lessonPath },
  { label: "same bytes as a file", url: proxy + staticPath },
  BROWSER,
);
console.log(`  ratio cached lesson / file: ${proxyRatio.toFixed(2)} (median of ${rounds} rounds; goal >= 0.90) ${proxyRatio >= 0.9 ? "met" : "NOT met"}`);

const appRatio = await pair(
  `(b) Next.js alone (${app}, no proxy), as a browser asks: lesson vs the bare ${barePath}`,
  { label: "lesson", url: app + lessonPath },
  { label: "bare page", url: app + barePath },
  BROWSER,
);
console.log(`  ratio lesson / bare page: ${appRatio.toFixed(2)} (median of ${rounds} rounds; no goal: what a bigger page costs the framework)`);
console.log(`\nload average at the end ${load()}`);
