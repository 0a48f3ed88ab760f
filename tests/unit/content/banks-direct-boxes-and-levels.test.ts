// Question banks of the course direct-boxes-and-levels (content/banks/direct-boxes-and-levels/*.json):
// every numeric key, and the numbers other questions rest on, recomputed with lib/acoustics with
// the source of the value beside it. The checks all banks share are in banks-common.test.ts.
import { describe, expect, it } from "vitest";
import {
  combNotchesHz,
  dbuToDbv,
  dbuToVolts,
  dbvToDbu,
  dbvToVolts,
  distanceForDelayM,
  micOutputVolts,
  phantomAtMic,
  reflectedImpedanceOhms,
  splDbFromPa,
  transformer,
  voltsToDbu,
  voltsToDbv,
} from "@/lib/acoustics";
import { describeNumericKeys, loadCourseBanks } from "./course-banks";

const COURSE_SLUG = "direct-boxes-and-levels";
const { question } = loadCourseBanks(COURSE_SLUG);

/** Speed of sound pinned where a time offset is turned into notch frequencies (343 m/s; Wikipedia "Speed of sound" gives 343.2 at 20 °C). */
const SPEED_OF_SOUND_MS = 343.0;
const OHMS_PER_KOHM = 1000;

/** Lowest comb notch of a signal summed with a copy delayed by delayMs: f = 1/(2τ) (two-path comb filter; recordingology.com "Comb Filter Calculations"). */
function firstNotchForDelayHz(delayMs: number): number {
  const pathDifferenceM = distanceForDelayM({ delayMs, speedOfSoundMs: SPEED_OF_SOUND_MS });
  return combNotchesHz({ pathDifferenceM, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 1 })[0];
}

/** Voltage of a power into a resistance, V = √(P·R) (common practice: P = V²/R). */
function voltsForPowerIntoLoad(powerW: number, loadOhms: number): number {
  return Math.sqrt(powerW * loadOhms);
}

/**
 * Every numeric key, recomputed with lib/acoustics, in the question's own unit.
 * Keyed "<bank>/<question id>" because question ids are unique only within a bank.
 */
const NUMERIC_KEYS: Record<string, number> = {
  // STx manual table "+4 dBu = 1.2276 V" (ITU-R V.574-5 absolute voltage level): +4 dBu → 1.22765 V
  "levels-and-lines/q-levels-and-lines-03": dbuToVolts(4),
  // ControlBooth wiki "0.316 V": −10 dBV → 0.316228 V
  "levels-and-lines/q-levels-and-lines-04": dbvToVolts(-10),
  // ControlBooth wiki "11.78 dB": +4 dBu vs −10 dBV → 11.7815 dB
  "levels-and-lines/q-levels-and-lines-05": 4 - dbvToDbu(-10),
  // itwissen.info "1 dBV ≈ +2.2 dBu": 0 dBV in dBu → +2.2185 dBu [derived]
  "levels-and-lines/q-levels-and-lines-06": dbvToDbu(0),
  // V = S·10^((L − 94)/20): 2 mV/Pa at 94 dB SPL → 2 mV = −51.76 dBu [derived]; gain to +4 dBu = 55.76 dB
  "levels-and-lines/q-levels-and-lines-07": 4 - voltsToDbu(micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true })),
  // ISO 1683:2015, 20 µPa: 1 Pa → 93.979 dB SPL
  "levels-and-lines/q-levels-and-lines-08": splDbFromPa(1),
  // common practice: voltage divider load/(source + load), as a level via 20·log10 (voltsToDbv of the ratio); typical impedances are common practice
  "levels-and-lines/q-levels-and-lines-11": voltsToDbv(1500 / (150 + 1500)),

  // Ballou, Handbook for Sound Engineers, audio transformers: 12:1 → −21.58 dB
  "direct-boxes/q-direct-boxes-02": transformer({ turnsRatio: 12 }).voltageChangeDb,
  // ideal transformer Z_p = N²·Z_s; 10:1 into 1.5 kΩ → 150 kΩ [derived]
  "direct-boxes/q-direct-boxes-03": reflectedImpedanceOhms({ turnsRatio: 10, loadOhms: 1500 }) / OHMS_PER_KOHM,
  // a 12:1 transformer (−20·log10 12) on +4 dBu: +4 dBu − 21.58 dB → −17.58 dBu [derived]
  "direct-boxes/q-direct-boxes-04": 4 + transformer({ turnsRatio: 12 }).voltageChangeDb,
  // IEC 61938: P48 at 48 V, 5 mA → 30.98 V
  "direct-boxes/q-direct-boxes-05": phantomAtMic({ supply: "P48", supplyV: 48, currentMa: 5 }).voltsAtMic,
  // common practice P = V²/R (100 W, 8 Ω → 28.28 V), then 0 dBu = 0.7746 V (STx manual table) → +31.25 dBu
  "direct-boxes/q-direct-boxes-14": voltsToDbu(voltsForPowerIntoLoad(100, 8)),
  // common practice: two identical signals sum to twice the voltage, 20·log10 2 = 6.02 dB (two-path peak 20·log10(1 + a) = +6.021 dB at a = 1)
  "direct-boxes/q-direct-boxes-15": voltsToDbv(2),
  // notches at (2n − 1)/(2τ); τ = 2 ms → 250 Hz [derived]
  "direct-boxes/q-direct-boxes-16": firstNotchForDelayHz(2),

  // −10 dBV = 0.316 V (ControlBooth wiki) = −7.7815 dBu [derived]
  "final/q-final-02": dbvToDbu(-10),
  // 0 dBu = 0.7746 V (STx manual table): +4 dBu = +1.78151 dBV [derived]
  "final/q-final-03": dbuToDbv(4),
  // ideal transformer −20·log10 N (ratios: Electronic Musician "Going Direct"): 10:1 → −20.00 dB
  "final/q-final-08": transformer({ turnsRatio: 10 }).voltageChangeDb,
  // Z_p = N²·Z_s: a 12:1 DI into 2 kΩ → 288 kΩ
  "final/q-final-09": reflectedImpedanceOhms({ turnsRatio: 12, loadOhms: 2000 }) / OHMS_PER_KOHM,
  // −10 dBV in dBu, then a 10:1 transformer: −7.78 dBu − 20 dB → −27.78 dBu [derived]
  "final/q-final-10": dbvToDbu(-10) + transformer({ turnsRatio: 10 }).voltageChangeDb,
  // ideal transformer −20·log10 N: 15:1 → −23.52 dB
  "final/q-final-11": transformer({ turnsRatio: 15 }).voltageChangeDb,
  // f = 1/(2τ): τ = 0.5 ms → first notch 1000 Hz [derived]
  "final/q-final-17": firstNotchForDelayHz(0.5),
};

describeNumericKeys(`${COURSE_SLUG} question banks`, loadCourseBanks(COURSE_SLUG), NUMERIC_KEYS);

describe(`${COURSE_SLUG} question banks: computed keys of other kinds match lib/acoustics`, () => {
  /** Nominal voltages of the stage's signal bands, volts rms. */
  const nominalVolts: Record<string, number> = {
    // V = S·10^((L − 94)/20): 2 mV/Pa at 94 dB SPL (1 Pa) → 2 mV
    mic: micOutputVolts({ mvPerPa: 2, splDb: 94, assume94DbIs1Pa: true }),
    // ControlBooth wiki: −10 dBV → 0.316 V
    consumer: dbvToVolts(-10),
    // ControlBooth wiki: +4 dBu → 1.228 V
    pro: dbuToVolts(4),
    // common practice P = V²/R: 100 W into 8 Ω → 28.3 V
    speaker: voltsForPowerIntoLoad(100, 8),
  };

  it("level ordering agrees with the library's voltages", () => {
    const ordering = question("levels-and-lines", "q-levels-and-lines-09", "ordering");
    const volts = ordering.correctOrder.map((id) => nominalVolts[id]);
    for (let index = 1; index < volts.length; index++) expect(volts[index]).toBeGreaterThan(volts[index - 1]);
  });

  it("level matching agrees with the library's voltages", () => {
    const match = question("final", "q-final-23", "matching");
    const rightVolts: Record<string, number> = { v002: 0.002, v0316: 0.316, v1228: 1.228, v28: 28, v0775: 0.000775 };
    for (const [leftId, rightId] of Object.entries(match.correctPairs)) {
      expect(Math.abs(nominalVolts[leftId] - rightVolts[rightId]) / rightVolts[rightId]).toBeLessThan(0.02);
    }
    // The distractor is no band's nominal voltage.
    for (const volts of Object.values(nominalVolts)) expect(Math.abs(volts - rightVolts.v0775) / volts).toBeGreaterThan(0.5);
  });

  it("60 dB of common-mode rejection is one thousandth of the voltage", () => {
    // common practice: 20·log10 of a voltage ratio (ITU-R V.574-5)
    expect(question("levels-and-lines", "q-levels-and-lines-15", "single").correctOptionId).toBe("thousandth");
    expect(voltsToDbv(1 / 1000)).toBeCloseTo(-60, 9);
  });

  it("the dBu reference is the voltage of 1 mW into 600 Ω", () => {
    // ITU-R BS.645-2 (0.775 V); STx manual table: 0 dBu = √(1 mW × 600 Ω) = 0.7746 V
    expect(question("levels-and-lines", "q-levels-and-lines-01", "single").correctOptionId).toBe("milliwatt");
    expect(dbuToVolts(0)).toBeCloseTo(Math.sqrt(0.001 * 600), 12);
  });

  it("a thru jack's two 1 MΩ loads in parallel make about 0.5 MΩ", () => {
    // common practice: equal resistances in parallel give half of one
    expect(question("final", "q-final-15", "single").correctOptionId).toBe("half");
    const oneMegohm = 1e6;
    expect((oneMegohm * oneMegohm) / (oneMegohm + oneMegohm)).toBe(0.5e6);
  });
});
