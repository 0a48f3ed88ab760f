/**
 * Micro-benchmark of the acoustics library's figure helpers.
 *
 * Run: npx tsx scripts/bench-acoustics.ts
 * Times a 361-point polar trace and a 512-point proximity response curve:
 * warm-up runs first (so the JIT has compiled the hot paths), then the median
 * and 95th percentile of the timed runs, measured with performance.now().
 * Goal: each well under 1 ms, so figures can be recomputed on every input change.
 */
import { performance } from "node:perf_hooks";
import { PICKUP_PATTERNS, polarTrace, proximityResponseCurve } from "../lib/acoustics/index";

const WARM_UP_RUNS = 500;
const TIMED_RUNS = 2000;
const GOAL_MS = 1;

interface Timing {
  medianMs: number;
  p95Ms: number;
}

/** Nearest-rank percentile of an ascending array (p in (0, 100]). */
function percentile(sortedMs: number[], p: number): number {
  const rank = Math.ceil((p / 100) * sortedMs.length);
  return sortedMs[Math.min(sortedMs.length, Math.max(1, rank)) - 1];
}

function median(sortedMs: number[]): number {
  const middle = Math.floor(sortedMs.length / 2);
  return sortedMs.length % 2 === 1 ? sortedMs[middle] : (sortedMs[middle - 1] + sortedMs[middle]) / 2;
}

/** Runs `work` WARM_UP_RUNS times untimed, then TIMED_RUNS times timed. `sink` keeps results alive. */
function time(work: (run: number) => unknown[]): Timing {
  let sink = 0;
  for (let run = 0; run < WARM_UP_RUNS; run += 1) sink += work(run).length;
  const durationsMs: number[] = new Array(TIMED_RUNS);
  for (let run = 0; run < TIMED_RUNS; run += 1) {
    const startMs = performance.now();
    sink += work(run).length;
    durationsMs[run] = performance.now() - startMs;
  }
  if (sink < 0) console.log(sink); // never true; stops the work being optimised away
  durationsMs.sort((left, right) => left - right);
  return { medianMs: median(durationsMs), p95Ms: percentile(durationsMs, 95) };
}

function report(label: string, { medianMs, p95Ms }: Timing): boolean {
  const withinGoal = p95Ms < GOAL_MS;
  console.log(
    `${label}: median ${medianMs.toFixed(4)} ms, p95 ${p95Ms.toFixed(4)} ms (goal < ${GOAL_MS} ms)${withinGoal ? "" : "  ← over goal"}`,
  );
  return withinGoal;
}

// Vary the inputs a little between runs so no call can be served from a cache.
const coefficients = Object.values(PICKUP_PATTERNS).map((pattern) => pattern.a);

const polar = time((run) => polarTrace({ a: coefficients[run % coefficients.length], points: 361 }));
const proximity = time((run) =>
  proximityResponseCurve({ a: coefficients[run % coefficients.length], distanceM: 0.02 + (run % 50) * 0.01, speedOfSoundMs: 343, points: 512 }),
);

console.log(`node ${process.version}, ${WARM_UP_RUNS} warm-up + ${TIMED_RUNS} timed runs each`);
const polarOk = report("polar trace (361 points)", polar);
const proximityOk = report("proximity response curve (512 points)", proximity);
process.exitCode = polarOk && proximityOk ? 0 : 1;
