// What the gain-structure figure remembers, with its defaults, limits and the fixed parts of its
// console. Plain data: shared by the figure, the Bench URL parser and the tests. From the
// modules, not the barrel: this file is in the first load of every Bench page.
import type { AlignmentId } from "@/lib/acoustics/alignment";

export interface GainStructureState {
  alignment: AlignmentId;
  /** Sound pressure level at the mic, dB SPL. */
  splDb: number;
  /** Mic sensitivity, mV/Pa. */
  mvPerPa: number;
  /** The input pad switched in. */
  pad: boolean;
  preampGainDb: number;
  /** The preamp's equivalent input noise, quoted with 150 Ω over 20 kHz, dBu. */
  einDbu: number;
  channelFaderDb: number;
  busFaderDb: number;
}

/** A vocal on a dynamic mic (2 mV/Pa) at 100 dB SPL, gain set to put it near the alignment level. */
export const GAIN_STRUCTURE_DEFAULTS: GainStructureState = {
  alignment: "ebu-r68",
  splDb: 100,
  mvPerPa: 2,
  pad: false,
  preampGainDb: 46,
  einDbu: -127,
  channelFaderDb: 0,
  busFaderDb: 0,
};

/** Bounds shared by the controls and the URL parser. */
export const GAIN_STRUCTURE_LIMITS = {
  splDb: { min: 60, max: 140 },
  mvPerPa: { min: 0.5, max: 50 },
  // A console mic preamp: about +10 to +70 dB of gain (common practice).
  preampGainDb: { min: 10, max: 70 },
  // Above the −130.96 dBu floor of 150 Ω over 20 kHz at 290 K, which no preamp can beat.
  einDbu: { min: -130, max: -110 },
  faderDb: { min: -40, max: 10 },
} as const;

/**
 * The console the figure models. Illustrative values of an analogue console with a converter
 * at its output (common practice, no one desk's data sheet): the figure computes with them but
 * they are inputs, not physics.
 */
export const GAIN_STRUCTURE_RIG = {
  /** A mic's source resistance, and the EIN source it is quoted with, Ω. */
  micSourceOhms: 150,
  /** Audio bandwidth for every noise figure, Hz. */
  bandwidthHz: 20_000,
  /** The noise-figure reference temperature T₀, K. */
  temperatureK: 290,
  /** The input pad, dB. */
  padDb: 20,
  /** Where the preamp, the channel and the mix bus clip, dBu rms. */
  analogueClipDbu: 24,
  /** Noise the channel fader stage adds at its output, dBu. */
  channelNoiseDbu: -95,
  /** Noise the mix bus adds at its output (its summing amplifier, with several channels routed), dBu. */
  busNoiseDbu: -88,
  /** The converter's dynamic range, full scale down to its noise, dB. */
  converterDynamicRangeDb: 114,
} as const;
