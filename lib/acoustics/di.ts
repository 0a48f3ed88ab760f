/**
 * Ideal transformers, as in a passive DI box.
 *
 * For an N:1 (primary:secondary) step-down transformer:
 * - voltage: V_s = V_p/N, a change of −20·log10 N dB;
 * - impedance: Z_p = N²·Z_s, so the load seen by the source is N² times the
 *   load on the secondary.
 * (Textbook ideal-transformer relations; e.g. Ballou, Handbook for Sound
 * Engineers, chapter on audio transformers.) Real transformers add winding
 * resistance, leakage inductance and core losses; these are ideal ceilings.
 */
import { requirePositive } from "./validate";

/**
 * Ideal N:1 transformer: voltageChangeDb = −20·log10 N (primary to secondary),
 * impedanceRatio = N² (Z_p/Z_s). 10:1 → −20 dB, 100:1; 12:1 → −21.58 dB, 144:1.
 * `turnsRatio` below 1 is a step-up transformer (positive dB).
 */
export function transformer({ turnsRatio }: { turnsRatio: number }): { voltageChangeDb: number; impedanceRatio: number } {
  requirePositive("turnsRatio", turnsRatio);
  return {
    voltageChangeDb: -20 * Math.log10(turnsRatio),
    impedanceRatio: turnsRatio * turnsRatio,
  };
}

/**
 * Impedance seen at the primary of an ideal N:1 transformer loaded by
 * `loadOhms` on the secondary: Z_p = N²·Z_load. A 12:1 DI into a 1.5 kΩ
 * preamp input presents 216 kΩ to the instrument.
 */
export function reflectedImpedanceOhms({ turnsRatio, loadOhms }: { turnsRatio: number; loadOhms: number }): number {
  requirePositive("turnsRatio", turnsRatio);
  requirePositive("loadOhms", loadOhms);
  return turnsRatio * turnsRatio * loadOhms;
}

/**
 * Turns ratio N that matches a primary impedance to a secondary one:
 * N = √(Z_p/Z_s). 600 Ω to 4 Ω → 12.25.
 */
export function turnsRatioForImpedances({ primaryOhms, secondaryOhms }: { primaryOhms: number; secondaryOhms: number }): number {
  requirePositive("primaryOhms", primaryOhms);
  requirePositive("secondaryOhms", secondaryOhms);
  return Math.sqrt(primaryOhms / secondaryOhms);
}
