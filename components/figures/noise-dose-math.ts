// Small helpers around lib/acoustics exposure functions.
import { permissibleExposureHours, type ExposureStandard } from "@/lib/acoustics";

/**
 * OSHA integrates sound levels from 80 dBA up into the dose (29 CFR 1910.95(d)(2)(i) and
 * App. A; from memory). NIOSH 98-126 sets no separate threshold here.
 */
export const OSHA_THRESHOLD_DBA = 80;

/**
 * Hours you could still spend at `levelDba` before the day's dose reaches 100 %: the unused share
 * of the dose times the permitted time at that level, (1 − D/100)·T(L), with T from the library.
 * Zero once the dose is at or past 100 %.
 */
export function remainingHoursAt({ dosePercent, levelDba, standard }: { dosePercent: number; levelDba: number; standard: ExposureStandard }): number {
  const unusedShare = Math.max(0, 1 - dosePercent / 100);
  return unusedShare * permissibleExposureHours({ levelDba, standard });
}
