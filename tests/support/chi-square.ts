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

/**
 * The same at α = 0.001 (NIST/SEMATECH e-Handbook §1.3.6.7.4, upper-tail column 0.001), for tests
 * whose draws are truly random (a run that fails by chance should be rarer than one in a thousand):
 * scipy's `chi2.ppf(0.999, ν)` gives 10.828, 13.816, 16.266, 18.467, 20.515 (from memory, not re-run).
 */
export const CHI_SQUARE_CRITICAL_ALPHA_0001: Readonly<Record<number, number>> = {
  1: 10.828,
  2: 13.816,
  3: 16.266,
  4: 18.467,
  5: 20.515,
};

/** Σ (observed − expected)² / expected, with every cell expected to hold total/k. */
export function chiSquareUniform(counts: readonly number[]): number {
  const total = counts.reduce((sum, count) => sum + count, 0);
  const expected = total / counts.length;
  return counts.reduce((sum, count) => sum + (count - expected) ** 2 / expected, 0);
}

export type UniformityCheck = { statistic: number; degreesOfFreedom: number; critical: number; counts: number[] };

/** The statistic for counts over k cells and the critical value for k − 1 degrees of freedom (α = 0.01 unless 0.001 is asked for). */
export function uniformityAtAlpha001(counts: readonly number[], alpha: 0.01 | 0.001 = 0.01): UniformityCheck {
  const degreesOfFreedom = counts.length - 1;
  const critical = (alpha === 0.001 ? CHI_SQUARE_CRITICAL_ALPHA_0001 : CHI_SQUARE_CRITICAL_ALPHA_001)[degreesOfFreedom];
  if (critical === undefined) throw new Error(`no tabulated critical value for ${degreesOfFreedom} degrees of freedom`);
  return { statistic: chiSquareUniform(counts), degreesOfFreedom, critical, counts: [...counts] };
}
