/**
 * Classical item analysis of one quiz: per-item difficulty and discrimination, and the
 * reliability of the total score. Formulas as in classical test theory texts (Crocker &
 * Algina 1986; Kelley 1939 for the 27 % groups); the formula text as in the scipy
 * `pointbiserialr` and pingouin `cronbach_alpha` documentation (tests/sources.md).
 *
 * Conventions, fixed here once:
 * - Every variance is a POPULATION variance (divide by N). With it, KR-20 equals Cronbach's α
 *   on 0/1 items, because a 0/1 item's population variance is exactly p·q. `sd` and `sem`
 *   use the population SD too.
 * - Item scores are in [0, 1] (partial credit allowed); a total is the sum of item scores.
 * - Missing responses are not supported: pass complete rows (see `listwiseComplete`).
 * - A statistic whose formula divides by a zero variance is null, never NaN.
 *
 * Upper/lower groups for D: group size g = max(1, round(0.27·N)) (halves round up), capped at
 * ⌊N/2⌋ so the groups cannot overlap by size; D is null for N < 2. Examinees are ranked by
 * total score. Ties at a group's boundary are shared fractionally, not broken by order: if `a`
 * examinees are strictly above the upper boundary score and `m` are tied on it, each tied
 * examinee counts with weight (g − a)/m (the same for the lower group). The result is
 * therefore independent of the order of the rows. D = p_upper − p_lower, each the weighted
 * mean item score of its group (weights sum to g).
 */
import { correlationFromComoments, isNegligibleVariance, scaledComoment } from "./basic-statistics";

export type ItemFlag = "low-discrimination" | "too-easy" | "negative-point-biserial";

export interface ItemStatistic {
  /** Difficulty: mean item score (proportion correct for 0/1 items). */
  p: number;
  /** Upper–lower discrimination p_U − p_L; null for N < 2. */
  d: number | null;
  /** Point-biserial: Pearson r of item score with total score; null for zero variance. */
  rpb: number | null;
  /** Corrected item–total r: item with (total − item); null for zero variance. */
  rCorrected: number | null;
  /** Population variance of the item score (p·q for 0/1 items). */
  variance: number;
  flags: ItemFlag[];
}

export interface ItemStatisticsResult {
  items: ItemStatistic[];
  /** KR-20; null unless every score is 0 or 1, k ≥ 2 and the totals vary. */
  kr20: number | null;
  /** KR-21 (equal-difficulty shortcut, 0/1 items only); null in the same cases as KR-20. */
  kr21: number | null;
  /** Cronbach's α; null when k < 2 or the totals do not vary. */
  alpha: number | null;
  /** Standard error of measurement SD·√(1 − α), population SD; null when α is null. */
  sem: number | null;
  /** Mean total score. */
  mean: number;
  /** Population SD of the total score. */
  sd: number;
  /** Population variance of the total score. */
  variance: number;
  /** Σ p_i·q_i over items (the KR-20 numerator term). */
  sumPq: number;
  /** Number of examinees (rows) and of items (columns). */
  n: number;
  k: number;
  /** Size of each of the upper and lower groups used for D (0 when N < 2). */
  groupSize: number;
  /** True when every item score is exactly 0 or 1. */
  binary: boolean;
}

export interface ItemStatisticsInput {
  /** One row per examinee, one item score per column, all rows the same length. */
  responses: ReadonlyArray<ArrayLike<number>>;
  /** Overrides the 27 % rule (1 … ⌊N/2⌋), e.g. to compare with a table that used another size. */
  groupSize?: number;
}

export interface ItemFlagThresholds {
  /** Flag when D is below this (Ebel & Frisbie: < 0.20 is poor). */
  minDiscrimination: number;
  /** Flag when p is above this (almost everyone right: the item tells little). */
  maxDifficulty: number;
}

export const DEFAULT_FLAG_THRESHOLDS: ItemFlagThresholds = { minDiscrimination: 0.2, maxDifficulty: 0.95 };

export function itemFlags(
  item: Pick<ItemStatistic, "p" | "d" | "rpb">,
  thresholds: ItemFlagThresholds = DEFAULT_FLAG_THRESHOLDS,
): ItemFlag[] {
  const flags: ItemFlag[] = [];
  if (item.d !== null && item.d < thresholds.minDiscrimination) flags.push("low-discrimination");
  if (item.p > thresholds.maxDifficulty) flags.push("too-easy");
  if (item.rpb !== null && item.rpb < 0) flags.push("negative-point-biserial");
  return flags;
}

/** The 27 % rule: max(1, round(0.27·N)), capped at ⌊N/2⌋; 0 when N < 2. */
export function upperLowerGroupSize(n: number): number {
  if (n < 2) return 0;
  return Math.min(Math.floor(n / 2), Math.max(1, Math.round((27 * n) / 100)));
}

/** Scores into one row-major Float64Array, validating shape and values on the way. */
function packResponses(responses: ReadonlyArray<ArrayLike<number>>, k: number) {
  const n = responses.length;
  const scores = new Float64Array(n * k);
  const totals = new Float64Array(n);
  let binary = true;
  for (let i = 0; i < n; i++) {
    const row = responses[i];
    if (row.length !== k) throw new RangeError(`row ${i} has ${row.length} scores, expected ${k}`);
    let total = 0;
    const offset = i * k;
    for (let j = 0; j < k; j++) {
      const score = row[j];
      if (!Number.isFinite(score)) throw new RangeError(`score at row ${i}, item ${j} is not a finite number`);
      if (score !== 0 && score !== 1) binary = false;
      scores[offset + j] = score;
      total += score;
    }
    totals[i] = total;
  }
  return { scores, totals, binary };
}

/**
 * Weight of each examinee in the upper and lower groups (see the tie rule above).
 * `sortedTotals` is ascending.
 */
function groupWeights(totals: Float64Array, sortedTotals: Float64Array, groupSize: number) {
  const n = totals.length;
  const lowerBoundary = sortedTotals[groupSize - 1];
  const upperBoundary = sortedTotals[n - groupSize];
  let below = 0;
  let tiedLower = 0;
  let above = 0;
  let tiedUpper = 0;
  for (let i = 0; i < n; i++) {
    const total = totals[i];
    if (total < lowerBoundary) below++;
    else if (total === lowerBoundary) tiedLower++;
    if (total > upperBoundary) above++;
    else if (total === upperBoundary) tiedUpper++;
  }
  return {
    lowerBoundary,
    upperBoundary,
    tiedLowerWeight: (groupSize - below) / tiedLower,
    tiedUpperWeight: (groupSize - above) / tiedUpper,
  };
}

function resolveGroupSize(n: number, requested: number | undefined): number {
  if (requested === undefined) return upperLowerGroupSize(n);
  if (!Number.isInteger(requested) || requested < 1 || requested > Math.floor(n / 2)) {
    throw new RangeError(`groupSize must be an integer from 1 to ${Math.floor(n / 2)}`);
  }
  return requested;
}

export function itemStatistics(input: ItemStatisticsInput): ItemStatisticsResult {
  const { responses } = input;
  const n = responses.length;
  if (n === 0) throw new RangeError("itemStatistics needs at least one examinee");
  const k = responses[0].length;
  if (k === 0) throw new RangeError("itemStatistics needs at least one item");
  const { scores, totals, binary } = packResponses(responses, k);
  const groupSize = resolveGroupSize(n, input.groupSize);

  // Per-item sums in one row-major pass: Σx, Σx², Σx·T, and the group sums for D.
  const sumX = new Float64Array(k);
  const sumXX = new Float64Array(k);
  const sumXT = new Float64Array(k);
  const upperSum = new Float64Array(k);
  const lowerSum = new Float64Array(k);
  let sumT = 0;
  let sumTT = 0;
  const groups = groupSize > 0 ? groupWeights(totals, Float64Array.from(totals).sort(), groupSize) : null;
  for (let i = 0; i < n; i++) {
    const total = totals[i];
    sumT += total;
    sumTT += total * total;
    let upperWeight = 0;
    let lowerWeight = 0;
    if (groups) {
      if (total > groups.upperBoundary) upperWeight = 1;
      else if (total === groups.upperBoundary) upperWeight = groups.tiedUpperWeight;
      if (total < groups.lowerBoundary) lowerWeight = 1;
      else if (total === groups.lowerBoundary) lowerWeight = groups.tiedLowerWeight;
    }
    const offset = i * k;
    for (let j = 0; j < k; j++) {
      const x = scores[offset + j];
      sumX[j] += x;
      sumXX[j] += x * x;
      sumXT[j] += x * total;
      if (upperWeight !== 0) upperSum[j] += upperWeight * x;
      if (lowerWeight !== 0) lowerSum[j] += lowerWeight * x;
    }
  }

  const cTT = scaledComoment(n, sumT, sumT, sumTT);
  const totalsConstant = isNegligibleVariance(cTT, n, sumTT);
  const variance = totalsConstant ? 0 : cTT / (n * n);
  const items: ItemStatistic[] = new Array(k);
  let sumItemVariance = 0;
  let sumPq = 0;
  for (let j = 0; j < k; j++) {
    const p = sumX[j] / n;
    const cXX = scaledComoment(n, sumX[j], sumX[j], sumXX[j]);
    const itemConstant = isNegligibleVariance(cXX, n, sumXX[j]);
    const cXT = scaledComoment(n, sumX[j], sumT, sumXT[j]);
    // Rest score R = T − x: C_xR = C_xT − C_xx and C_RR = C_TT − 2·C_xT + C_xx.
    const sumRR = sumTT - 2 * sumXT[j] + sumXX[j];
    const cRR = cTT - 2 * cXT + cXX;
    const restConstant = isNegligibleVariance(cRR, n, sumRR);
    const itemVariance = itemConstant ? 0 : cXX / (n * n);
    sumItemVariance += itemVariance;
    sumPq += p * (1 - p);
    const stats = {
      p,
      d: groupSize > 0 ? (upperSum[j] - lowerSum[j]) / groupSize : null,
      rpb: correlationFromComoments(cXT, cXX, cTT, itemConstant, totalsConstant),
      rCorrected: correlationFromComoments(cXT - cXX, cXX, cRR, itemConstant, restConstant),
      variance: itemVariance,
    };
    items[j] = { ...stats, flags: itemFlags(stats) };
  }

  const mean = sumT / n;
  const sd = Math.sqrt(variance);
  const reliable = k >= 2 && !totalsConstant;
  const lengthFactor = k / (k - 1);
  const alpha = reliable ? lengthFactor * (1 - sumItemVariance / variance) : null;
  const kr20 = reliable && binary ? lengthFactor * (1 - sumPq / variance) : null;
  const kr21 = reliable && binary ? lengthFactor * (1 - (mean * (k - mean)) / (k * variance)) : null;
  const sem = alpha === null ? null : sd * Math.sqrt(Math.max(0, 1 - alpha));
  return { items, kr20, kr21, alpha, sem, mean, sd, variance, sumPq, n, k, groupSize, binary };
}
