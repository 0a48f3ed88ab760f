/**
 * Potential and needed acoustic gain of a sound-reinforcement system
 * (Ballou (ed.), Handbook for Sound Engineers, 4th ed., Focal 2008, ch. 34
 * "Sound System Design"; after Boner & Boner, "The Gain of a Sound System",
 * JAES 17(2), 1969).
 *
 * Distances (any one length unit works, because only ratios enter; the
 * names say metres because the rest of the library does):
 * - ds (D_s): talker to microphone;
 * - d0 (D_0): talker to the farthest listener;
 * - d1 (D_1): microphone to the nearest loudspeaker;
 * - d2 (D_2): loudspeaker to the farthest listener;
 * - EAD: equivalent acoustic distance, the distance at which the farthest
 *   listener would hear the unaided talker as clearly as the system should
 *   make them hear it;
 * - NOM: number of open microphones; FSM: feedback stability margin (6 dB usual).
 *
 * The system can deliver the needed gain without feedback only if PAG ≥ NAG.
 * Safety: ringing and runaway feedback can reach damaging levels; bring gain
 * up slowly and keep hearing protection and a master mute within reach.
 */
import { requireIntegerAtLeast, requireNonNegative, requirePositive } from "./validate";

/** Indoor distance weighting g(x) = D_c² + x² of Handbook for Sound Engineers eq. 34-21. */
function roomWeighting(criticalDistanceM: number, distanceM: number): number {
  return criticalDistanceM * criticalDistanceM + distanceM * distanceM;
}

/**
 * Potential acoustic gain, dB.
 *
 * Free field (Handbook for Sound Engineers, eq. 34-5):
 *   PAG = 20·log10(D_0·D_1 / (D_s·D_2)) − 10·log10 NOM − FSM
 *
 * Indoors, when `criticalDistanceM` (D_c) is given (eq. 34-21): the free-field
 * value minus the room term 10·log10(g(D_0)·g(D_1) / (g(D_s)·g(D_2))),
 * g(x) = D_c² + x². Worked example (ft): D_s 2, D_0 128, D_1 45, D_2 90,
 * NOM 3, FSM 6 → 19.33 dB free field; with D_c 31.2 → 11.7 dB.
 */
export function potentialAcousticGainDb({
  dsM,
  d0M,
  d1M,
  d2M,
  openMics,
  stabilityMarginDb,
  criticalDistanceM,
}: {
  dsM: number;
  d0M: number;
  d1M: number;
  d2M: number;
  openMics: number;
  stabilityMarginDb: number;
  criticalDistanceM?: number;
}): number {
  requirePositive("dsM", dsM);
  requirePositive("d0M", d0M);
  requirePositive("d1M", d1M);
  requirePositive("d2M", d2M);
  requireIntegerAtLeast("openMics", openMics, 1);
  requireNonNegative("stabilityMarginDb", stabilityMarginDb);
  const freeFieldDb = 20 * Math.log10((d0M * d1M) / (dsM * d2M)) - 10 * Math.log10(openMics) - stabilityMarginDb;
  if (criticalDistanceM === undefined) return freeFieldDb;
  requirePositive("criticalDistanceM", criticalDistanceM);
  const roomTermDb =
    10 *
    Math.log10(
      (roomWeighting(criticalDistanceM, d0M) * roomWeighting(criticalDistanceM, d1M)) /
        (roomWeighting(criticalDistanceM, dsM) * roomWeighting(criticalDistanceM, d2M)),
    );
  return freeFieldDb - roomTermDb;
}

/**
 * Needed acoustic gain, dB.
 *
 * Free field (Handbook for Sound Engineers, eq. 34-8): NAG = 20·log10(D_0/EAD).
 * Indoors, with `criticalDistanceM` (eq. 34-22):
 *   NAG = 20·log10(D_0/EAD) − 10·log10(g(D_0)/g(EAD)), g(x) = D_c² + x².
 * Worked example (ft): D_0 128, EAD 4 → 30.10 dB; with D_c 31.2 → 17.7 dB.
 */
export function neededAcousticGainDb({
  d0M,
  eadM,
  criticalDistanceM,
}: {
  d0M: number;
  eadM: number;
  criticalDistanceM?: number;
}): number {
  requirePositive("d0M", d0M);
  requirePositive("eadM", eadM);
  const freeFieldDb = 20 * Math.log10(d0M / eadM);
  if (criticalDistanceM === undefined) return freeFieldDb;
  requirePositive("criticalDistanceM", criticalDistanceM);
  return freeFieldDb - 10 * Math.log10(roomWeighting(criticalDistanceM, d0M) / roomWeighting(criticalDistanceM, eadM));
}

/**
 * Critical distance D_c = √(Q·S·ā / (16π)), where the direct and reverberant
 * levels are equal: solving Q/(4πX²) = 4/(S·ā), the two terms of Handbook for
 * Sound Engineers eq. 34-23. Q = directivity factor of the source, S = total
 * room surface (m²), ā = average absorption coefficient (0 < ā ≤ 1).
 * Q 5, S 28 000 ft², ā 0.35 → 31.22 ft.
 */
export function criticalDistanceM({
  directivityFactor,
  surfaceAreaM2,
  averageAbsorptionCoefficient,
}: {
  directivityFactor: number;
  surfaceAreaM2: number;
  averageAbsorptionCoefficient: number;
}): number {
  requirePositive("directivityFactor", directivityFactor);
  requirePositive("surfaceAreaM2", surfaceAreaM2);
  requirePositive("averageAbsorptionCoefficient", averageAbsorptionCoefficient);
  if (averageAbsorptionCoefficient > 1) {
    throw new RangeError(`averageAbsorptionCoefficient must not exceed 1; received ${averageAbsorptionCoefficient}`);
  }
  return Math.sqrt((directivityFactor * surfaceAreaM2 * averageAbsorptionCoefficient) / (16 * Math.PI));
}

/**
 * Level drop ΔX of direct plus reverberant sound at distance X, dB
 * (Handbook for Sound Engineers, eq. 34-23):
 *   ΔX = −10·log10(Q/(4πX²) + 4/(S·ā))
 * The handbook's worked example uses one Q for every path. Only differences of ΔX are meaningful (the absolute value depends on the
 * length unit); `potentialAcousticGainFromRoomDb` combines them.
 */
export function roomLevelDropDb({
  distanceM,
  directivityFactor,
  surfaceAreaM2,
  averageAbsorptionCoefficient,
}: {
  distanceM: number;
  directivityFactor: number;
  surfaceAreaM2: number;
  averageAbsorptionCoefficient: number;
}): number {
  requirePositive("distanceM", distanceM);
  requirePositive("directivityFactor", directivityFactor);
  requirePositive("surfaceAreaM2", surfaceAreaM2);
  requirePositive("averageAbsorptionCoefficient", averageAbsorptionCoefficient);
  return -10 * Math.log10(directivityFactor / (4 * Math.PI * distanceM * distanceM) + 4 / (surfaceAreaM2 * averageAbsorptionCoefficient));
}

/**
 * Potential acoustic gain from the room form (Handbook for Sound Engineers,
 * eq. 34-23): PAG = ΔD_0 + ΔD_1 − ΔD_s − ΔD_2 − 10·log10 NOM − FSM, each ΔX
 * from `roomLevelDropDb`. Worked example (ft): Q 5, S 28 000 ft², ā 0.35 and
 * the distances above → 11.7 dB (11.651 calculated).
 */
export function potentialAcousticGainFromRoomDb({
  dsM,
  d0M,
  d1M,
  d2M,
  openMics,
  stabilityMarginDb,
  directivityFactor,
  surfaceAreaM2,
  averageAbsorptionCoefficient,
}: {
  dsM: number;
  d0M: number;
  d1M: number;
  d2M: number;
  openMics: number;
  stabilityMarginDb: number;
  directivityFactor: number;
  surfaceAreaM2: number;
  averageAbsorptionCoefficient: number;
}): number {
  requireIntegerAtLeast("openMics", openMics, 1);
  requireNonNegative("stabilityMarginDb", stabilityMarginDb);
  const room = { directivityFactor, surfaceAreaM2, averageAbsorptionCoefficient };
  const drop = (distanceM: number) => roomLevelDropDb({ distanceM, ...room });
  return drop(d0M) + drop(d1M) - drop(dsM) - drop(d2M) - 10 * Math.log10(openMics) - stabilityMarginDb;
}
