/**
 * Benchmark of the quiz item analysis: `npx tsx scripts/bench-item-stats.ts`.
 * Builds a deterministic 10,000 × 30 response matrix (each examinee has an ability, each item
 * a difficulty, so the items correlate as real ones do) and prints the median run time.
 */
import { itemStatistics } from "../lib/assessment/item-statistics";
import { mulberry32 } from "../lib/assessment/random";

const EXAMINEES = 10_000;
const ITEMS = 30;
const RUNS = 21;
const WARM_UP_RUNS = 5;
const GOAL_MS = 200;

function buildResponses(): number[][] {
  const random = mulberry32(20240301);
  const difficulties = Array.from({ length: ITEMS }, () => random() * 2 - 1);
  return Array.from({ length: EXAMINEES }, () => {
    const ability = random() * 2 - 1;
    return difficulties.map((difficulty) => {
      const chance = 1 / (1 + Math.exp(-2 * (ability - difficulty))); // logistic item response
      return random() < chance ? 1 : 0;
    });
  });
}

const responses = buildResponses();
// warm-up so the JIT has compiled the loops
for (let run = 0; run < WARM_UP_RUNS; run++) itemStatistics({ responses });
const timesMs: number[] = [];
let alpha: number | null = null;
for (let run = 0; run < RUNS; run++) {
  const start = performance.now();
  alpha = itemStatistics({ responses }).alpha;
  timesMs.push(performance.now() - start);
}
timesMs.sort((a, b) => a - b);
const medianMs = timesMs[Math.floor(RUNS / 2)];
console.log(
  `item statistics, ${EXAMINEES} attempts x ${ITEMS} items: median ${medianMs.toFixed(1)} ms ` +
    `(goal <= ${GOAL_MS} ms; ${RUNS} runs, min ${timesMs[0].toFixed(1)} ms, max ${timesMs[RUNS - 1].toFixed(1)} ms; alpha ${alpha?.toFixed(3)})`,
);
if (medianMs > GOAL_MS) process.exitCode = 1;
