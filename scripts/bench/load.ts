// autocannon over one signed-in GET, with every response's latency kept so p50/p95 are exact
// (autocannon's own histogram reports p90 and p97.5, not p95).
import { loadavg } from "node:os";
import autocannon from "autocannon";

export type LoadFigures = { requests: number; rps: number; p50: number; p95: number; mean: number; non2xx: number; errors: number; statuses: Record<number, number> };

export function percentile(sorted: readonly number[], p: number): number {
  return sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

export function figuresOf(latenciesMs: number[], seconds: number, statuses: Map<number, number>, errors: number): LoadFigures {
  const sorted = [...latenciesMs].sort((a, b) => a - b);
  const non2xx = [...statuses].filter(([s]) => s < 200 || s > 299).reduce((n, [, c]) => n + c, 0);
  return {
    requests: sorted.length,
    rps: sorted.length / seconds,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    mean: sorted.reduce((a, b) => a + b, 0) / Math.max(1, sorted.length),
    non2xx,
    errors,
    statuses: Object.fromEntries(statuses),
  };
}

/** GET `path` with `cookie` on `connections` connections for `seconds`. */
export function loadGet(baseUrl: string, path: string, cookie: string, connections: number, seconds: number): Promise<LoadFigures> {
  const latencies: number[] = [];
  const statuses = new Map<number, number>();
  return new Promise((resolve, reject) => {
    const instance = autocannon({ url: baseUrl + path, connections, duration: seconds, headers: { cookie, "accept-encoding": "gzip, br" } }, (err, result) =>
      err ? reject(err) : resolve(figuresOf(latencies, result.duration, statuses, result.errors + result.timeouts)),
    );
    instance.on("response", (_client, status, _bytes, ms) => {
      latencies.push(ms);
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
    });
  });
}

export const loadAverage = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(" ");
