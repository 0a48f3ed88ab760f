/**
 * Small statistics shared by the item analysis. Variances here are population variances
 * (divide by N), the one convention used throughout lib/assessment.
 */

/**
 * N times the co-moment of x and y: N·Σxy − Σx·Σy (= N²·cov_pop). Working with sums keeps
 * integer-valued data exact, so a zero variance is detected as exactly zero.
 */
export function scaledComoment(n: number, sumX: number, sumY: number, sumXY: number): number {
  return n * sumXY - sumX * sumY;
}

/** A scaled variance this small relative to N·Σx² is rounding noise, not spread. */
export function isNegligibleVariance(scaledVariance: number, n: number, sumSquares: number): boolean {
  return scaledVariance <= 1e-12 * n * sumSquares;
}

/** r = C_xy / √(C_xx·C_yy) from scaled co-moments, clamped to [−1, 1]; null if a variance is zero. */
export function correlationFromComoments(
  cxy: number,
  cxx: number,
  cyy: number,
  zeroX: boolean,
  zeroY: boolean,
): number | null {
  if (zeroX || zeroY) return null;
  const r = cxy / Math.sqrt(cxx * cyy);
  return Math.max(-1, Math.min(1, r));
}

/** Pearson r of two equal-length series; null when either is constant or shorter than 2. */
export function pearsonR(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  if (x.length !== y.length) throw new RangeError("pearsonR needs two series of equal length");
  const n = x.length;
  if (n < 2) return null;
  let sumX = 0;
  let sumY = 0;
  let sumXX = 0;
  let sumYY = 0;
  let sumXY = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i];
    const yi = y[i];
    sumX += xi;
    sumY += yi;
    sumXX += xi * xi;
    sumYY += yi * yi;
    sumXY += xi * yi;
  }
  const cxx = scaledComoment(n, sumX, sumX, sumXX);
  const cyy = scaledComoment(n, sumY, sumY, sumYY);
  return correlationFromComoments(
    scaledComoment(n, sumX, sumY, sumXY),
    cxx,
    cyy,
    isNegligibleVariance(cxx, n, sumXX),
    isNegligibleVariance(cyy, n, sumYY),
  );
}

/**
 * Point-biserial correlation of a 0/1 item with a score: it is Pearson r of the two series
 * (scipy.stats.pointbiserialr computes it the same way).
 */
export const pointBiserialR = pearsonR;

/** Listwise deletion: keeps only the rows with no missing (null/undefined/NaN) score. */
export function listwiseComplete(rows: ReadonlyArray<ReadonlyArray<number | null | undefined>>): number[][] {
  return rows
    .filter((row) => row.every((value) => typeof value === "number" && !Number.isNaN(value)))
    .map((row) => row.slice() as number[]);
}
