// What the Bench and the figures say about each figure: title, summary, what it computes and
// where the formulas come from. Plain data (no React), so server pages and tests can read it.
import type { FigureName } from "./figure-names";

export interface FigureMeta {
  title: string;
  /** One line for a card. */
  summary: string;
  /** What the figure computes, in a few plain sentences. */
  computes: string;
  /** Where the formulas come from. */
  formulaSource: string;
}

export const FIGURE_META: Readonly<Record<FigureName, FigureMeta>> = {
  "pickup-pattern": {
    title: "Pickup-pattern explorer",
    summary: "Turn a first-order pattern from omni to figure-8 and see how loud the voice, the wedge and a cymbal arrive.",
    computes:
      "The response of a first-order microphone, r(θ) = A + (1 − A)·cos θ, drawn in dB around the mic; the level of each source relative to on axis; and the pattern's figures of merit: directivity index, random-energy efficiency, distance factor, null angles, front-to-back ratio and pickup arcs.",
    formulaSource: "Eargle, The Microphone Book, 2nd ed. (Focal 2004), ch. 5–6 and Table 6-1.",
  },
  proximity: {
    title: "Proximity effect",
    summary: "Move a directional mic closer to an ideal point source and watch the bass rise, pattern by pattern.",
    computes:
      "The ideal on-axis bass boost of the gradient part of a first-order pattern near a point source, 10·log10(1 + ((1 − A)/(kr))²) with k = 2πf/c, from 20 Hz to 20 kHz; and the frequency where it reaches 3 dB. Real microphones add their own bass roll-off, so this is a ceiling.",
    formulaSource: "Spherical-wave particle velocity: Kinsler & Frey, Fundamentals of Acoustics; proximity effect: Eargle, The Microphone Book, 2nd ed.",
  },
  "two-mics": {
    title: "Two mics, one source",
    summary: "Two mics at different distances from one source, mixed together: level difference, delay and the comb filter they make.",
    computes:
      "The level difference by the inverse-square law, the delay of the path difference at the speed of sound for the air temperature, and the comb response of the sum, 10·log10(1 + a² + 2a·cos 2πfτ), with its notch frequencies (2n − 1)·c/(2Δd).",
    formulaSource: "Everest & Pohlmann, Master Handbook of Acoustics (comb filtering); the 3:1 guideline is common practice.",
  },
  "distance-level": {
    title: "Distance and level",
    summary: "How loud a source is at a distance in the free field, and how far to move for a given change.",
    computes: "The free-field level at a distance by the inverse-square law, ΔL = −20·log10(r₂/r₁), and the distance that gives a chosen change.",
    formulaSource: "Inverse-square law as used in Ballou (ed.), Handbook for Sound Engineers, 4th ed., ch. 34.",
  },
  "direct-box": {
    title: "Direct box",
    summary: "An instrument through a DI transformer to a mic preamp: the level that arrives, and the load the instrument sees.",
    computes:
      "For an ideal N:1 transformer, the level change −20·log10 N, the load reflected back to the instrument N²·Z_preamp, and the source impedance the preamp sees. Also what a ground lift does and does not do.",
    formulaSource: "Ideal transformer relations: Ballou (ed.), Handbook for Sound Engineers, 4th ed., chapter on audio transformers.",
  },
  "phantom-power": {
    title: "Phantom power",
    summary: "Pick a phantom supply and a current draw: the volts left at the mic, and whether it stays in spec.",
    computes:
      "The voltage at the microphone, V − I·R/2 through the two feed resistors in parallel; whether the supply and the current are inside IEC 61938; and the DC that flows when one leg is shorted, which is what damages a ribbon element or upsets an unbalanced source.",
    formulaSource: "IEC 61938:2018, the phantom-power supplies P12, P24 and P48 (feed resistors, voltages and current limits).",
  },
  "feedback-margin": {
    title: "Feedback margin",
    summary: "Talker, mic, loudspeaker and listener on a stage plan: potential against needed acoustic gain, indoors or out.",
    computes:
      "Potential acoustic gain PAG = 20·log10(D₀·D₁/(Dₛ·D₂)) − 10·log10 NOM − 6 dB, and needed acoustic gain NAG = 20·log10(D₀/EAD), with the room correction through the critical distance indoors. The system can deliver the gain without feedback only if PAG ≥ NAG.",
    formulaSource: "Ballou (ed.), Handbook for Sound Engineers, 4th ed. (Focal 2008), ch. 34, eqs. 34-5, 34-8, 34-21 and 34-22.",
  },
  "noise-dose": {
    title: "Noise dose",
    summary: "A show day's levels and hours as a noise dose, an 8-hour TWA and the time left, under NIOSH and OSHA.",
    computes:
      "The permitted time at each level, T = 8/2^((L − L_c)/q) hours (NIOSH: 85 dBA, 3 dB; OSHA: 90 dBA, 5 dB); the dose D = 100·Σ C/T %; the 8-hour TWA; and how long you could stay at a chosen level before the dose reaches 100 %.",
    formulaSource: "NIOSH, Occupational Noise Exposure, Revised Criteria 1998, Publ. No. 98-126; OSHA, 29 CFR 1910.95, Table G-16 and Appendix A.",
  },
  "gain-structure": {
    title: "Gain structure",
    summary: "A mic through pad, preamp, fader and mix bus to the converter: the level at each stage against its clip point and noise floor, in dBu and dBFS.",
    computes:
      "The mic's output from its sensitivity and the sound pressure, 20·log10(S·p/0.775 V) dBu; the level at each stage as the sum of the gains before it; the noise at each stage as the power sum of the noise carried in and the stage's own; headroom (clip point − level) and signal-to-noise (level − noise); the thermal noise of the mic's 150 Ω source, √(4kTRB), and the preamp's noise figure against it; and every level in dBFS under EBU R68 (−18 dBFS = 0 dBu) or SMPTE RP 155 (−20 dBFS, with +4 dBu). The console's clip points and noise floors are typical values, not any one desk's.",
    formulaSource:
      "EBU R68-2000 and SMPTE RP 155 (alignment levels); Johnson and Nyquist, Physical Review 32 (1928), with k = 1.380649 × 10⁻²³ J/K (SI, 2019); dBu per ITU-R V.574-5.",
  },
};
