// Pearson's chi-square goodness-of-fit test against a uniform distribution, for the tests that
// check a shuffle gives away nothing about where the key sits.

/**
 * Upper-tail critical values of the chi-square distribution at α = 0.01 for ν = 1…10 degrees
 * of freedom: NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.7.4 "Critical Values of
 * the Chi-Square Distribution" (upper-tail table, column 0.01). Checked against scipy 1.17.1,
 * `scipy.stats.chi2.ppf(0.99, ν)`: 6.6349, 9.2103, 11.3449, 13.2767, 15.0863, 16.8119, 18.4753,
 * 20.0902, 21.6660, 23.2093.
 */
export const CHI_SQUARE_CRITICAL_ALPHA_001: Readonly<Record<number, number>> = {
  1: 6.635,
  2: 9.21,
  3: 11.345,
  4: 13.277,
  5: 15.086,
  6: 16.812,
  7: 18.475,
  8: 20.09,
  9: 21.666,
  10: 23.209,
};

/** Σ (observed − expected)² / expected, with every cell expected to hold total/k. */
export function chiSquareUniform(counts: readonly number[]): number {
  const total = counts.reduce((sum, count) => sum + count, 0);
  const expected = total / counts.length;
  return counts.reduce((sum, count) => sum + (count - expected) ** 2 / expected, 0);
}

export type UniformityCheck = { statistic: number; degreesOfFreedom: number; critical: number; counts: number[] };

/** The statistic for counts over k cells and the α = 0.01 critical value for k − 1 degrees of freedom. */
export function uniformityAtAlpha001(counts: readonly number[]): UniformityCheck {
  const degreesOfFreedom = counts.length - 1;
  const critical = CHI_SQUARE_CRITICAL_ALPHA_001[degreesOfFreedom];
  if (critical === undefined) throw new Error(`no tabulated critical value for ${degreesOfFreedom} degrees of freedom`);
  return { statistic: chiSquareUniform(counts), degreesOfFreedom, critical, counts: [...counts] };
}
