/**
 * Occupational noise exposure: permissible durations, dose and 8-hour TWA.
 *
 * - NIOSH REL (NIOSH, Criteria for a Recommended Standard: Occupational Noise
 *   Exposure, Revised Criteria 1998, DHHS (NIOSH) Publ. No. 98-126):
 *   85 dBA criterion for 8 h, 3 dB exchange rate.
 * - OSHA PEL (29 CFR 1910.95, Table G-16 and Appendix A): 90 dBA for 8 h,
 *   5 dB exchange rate.
 *
 * Safety: these are occupational limits, not guarantees of safe hearing. Sound
 * crews and audiences are exposed for long periods at high levels: wear
 * hearing protection, measure with a calibrated meter, and follow the venue's
 * rules and local regulations, which may be stricter.
 */
import { requireFinite, requireNonNegative } from "./validate";

export type ExposureStandard = "niosh" | "osha";

export interface ExposureCriteria {
  /** Level allowed for a full 8-hour day, dBA. */
  readonly criterionDba: number;
  /** Level increase that halves the allowed time, dB. */
  readonly exchangeRateDb: number;
  /** Level above which no unprotected exposure is permitted, dBA. */
  readonly ceilingDba: number;
  readonly source: string;
}

/**
 * Criteria per standard. NIOSH ceiling 140 dBA (NIOSH 98-126). OSHA: 115 dBA
 * is the maximum for continuous noise in Table G-16 (the App. A formula
 * table runs higher).
 */
export const EXPOSURE_CRITERIA: Readonly<Record<ExposureStandard, ExposureCriteria>> = Object.freeze({
  niosh: Object.freeze({ criterionDba: 85, exchangeRateDb: 3, ceilingDba: 140, source: "NIOSH 98-126 (1998)" }),
  osha: Object.freeze({ criterionDba: 90, exchangeRateDb: 5, ceilingDba: 115, source: "29 CFR 1910.95" }),
});

/** The 8-hour reference duration, h. */
export const REFERENCE_DURATION_HOURS = 8;

function lookUpCriteria(standard: ExposureStandard): ExposureCriteria {
  const found = EXPOSURE_CRITERIA[standard];
  if (!found) {
    throw new RangeError(`standard must be "niosh" or "osha"; received ${String(standard)}`);
  }
  return found;
}

/**
 * Permissible exposure time, hours: T = 8 / 2^((L − L_c)/q).
 * NIOSH: L_c 85 dBA, q 3 dB (NIOSH 98-126): 94 dBA → 1 h, 100 dBA → 15 min.
 * OSHA: L_c 90 dBA, q 5 dB (29 CFR 1910.95 App. A, Table G-16a footnote):
 * 100 dBA → 2 h. The formula is returned as is above the ceiling unless
 * `applyCeiling` is true, which returns 0 h above `ceilingDba`.
 */
export function permissibleExposureHours({
  levelDba,
  standard,
  applyCeiling = false,
}: {
  levelDba: number;
  standard: ExposureStandard;
  applyCeiling?: boolean;
}): number {
  requireFinite("levelDba", levelDba);
  const criteria = lookUpCriteria(standard);
  if (applyCeiling && levelDba > criteria.ceilingDba) return 0;
  return REFERENCE_DURATION_HOURS / 2 ** ((levelDba - criteria.criterionDba) / criteria.exchangeRateDb);
}

export interface ExposureSegment {
  readonly levelDba: number;
  readonly hours: number;
}

/**
 * Daily noise dose and 8-hour time-weighted average.
 *
 * Dose D = 100·Σ C_n/T_n % (C_n hours at level L_n, T_n from
 * `permissibleExposureHours`).
 * - NIOSH (98-126): TWA = 10·log10(D/100) + 85 dBA.
 * - OSHA (29 CFR 1910.95 App. A): TWA = 16.61·log10(D/100) + 90 dBA; we use
 *   the exact 5/log10 2 = 16.6096 so that a constant level returns itself.
 * Segments below `thresholdDba` (optional, e.g. 80 dBA) are left out of the
 * dose. No segments, or zero dose, gives TWA = −Infinity.
 * Example (NIOSH): 5 min at 100 dBA + 30 min at 94 dBA → 83.3 %, 84.2 dBA.
 */
export function noiseDose({
  segments,
  standard,
  thresholdDba,
}: {
  segments: readonly ExposureSegment[];
  standard: ExposureStandard;
  thresholdDba?: number;
}): { dosePercent: number; twaDba: number } {
  const criteria = lookUpCriteria(standard);
  if (thresholdDba !== undefined) requireFinite("thresholdDba", thresholdDba);
  let doseFraction = 0;
  for (const [index, segment] of segments.entries()) {
    requireFinite(`segments[${index}].levelDba`, segment.levelDba);
    requireNonNegative(`segments[${index}].hours`, segment.hours);
    if (thresholdDba !== undefined && segment.levelDba < thresholdDba) continue;
    doseFraction += segment.hours / permissibleExposureHours({ levelDba: segment.levelDba, standard });
  }
  const doseLevelDb =
    standard === "niosh" ? 10 * Math.log10(doseFraction) : (criteria.exchangeRateDb / Math.log10(2)) * Math.log10(doseFraction);
  return {
    dosePercent: 100 * doseFraction,
    twaDba: doseFraction === 0 ? -Infinity : criteria.criterionDba + doseLevelDb,
  };
}
