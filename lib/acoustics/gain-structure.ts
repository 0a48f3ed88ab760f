/**
 * Gain structure: the level of a signal and of its noise through a chain of gain stages, each
 * with the level where it clips, and the headroom and signal-to-noise ratio at every stage.
 *
 * - Gains in dB add along a chain (levels are logarithmic: ITU-R V.574-5, the decibel of a
 *   field quantity).
 * - Uncorrelated noises add by power: L = 10·log10 Σ 10^(Lᵢ/10) (two equal noises → +3.01 dB;
 *   Everest & Pohlmann, Master Handbook of Acoustics, adding decibels of uncorrelated sources).
 * - Headroom is the distance from the signal level up to the clip level; signal-to-noise is
 *   the distance from the noise floor up to the signal (common practice, as in Ballou (ed.),
 *   Handbook for Sound Engineers, on gain structure). Levels are rms, in dBu; a peak meter
 *   reads a sine 3 dB higher, which is why operating levels sit well below clip.
 */
import { micOutputVolts, voltsToDbu } from "./levels";
import { requireFinite, requirePositive } from "./validate";

/** Headroom, dB: clip level − signal level. Negative means the stage clips. */
export function headroomDb({ levelDbu, clipDbu }: { levelDbu: number; clipDbu: number }): number {
  requireFinite("levelDbu", levelDbu);
  requireFinite("clipDbu", clipDbu);
  return clipDbu - levelDbu;
}

/** Signal-to-noise ratio, dB: signal level − noise level (both rms, same bandwidth). */
export function signalToNoiseDb({ levelDbu, noiseDbu }: { levelDbu: number; noiseDbu: number }): number {
  requireFinite("levelDbu", levelDbu);
  requireFinite("noiseDbu", noiseDbu);
  return levelDbu - noiseDbu;
}

/**
 * Power sum of uncorrelated levels, dB: 10·log10 Σ 10^(Lᵢ/10). −Infinity entries (no noise)
 * add nothing. Two equal levels → +3.0103 dB; levels 10 dB apart → +0.41 dB.
 */
export function sumUncorrelatedDb(levelsDb: readonly number[]): number {
  let power = 0;
  for (const levelDb of levelsDb) {
    if (levelDb === -Infinity) continue;
    requireFinite("levelDb", levelDb);
    power += 10 ** (levelDb / 10);
  }
  return power === 0 ? -Infinity : 10 * Math.log10(power);
}

/** A mic's output level in dBu at an SPL: 20·log10(S·p/√0.6 V), S in mV/Pa, p re 20 µPa (ISO 1683). */
export function micOutputDbu({ splDb, mvPerPa }: { splDb: number; mvPerPa: number }): number {
  return voltsToDbu(micOutputVolts({ splDb, mvPerPa }));
}

export interface GainStage {
  /** What the stage is called on the readout ("preamp", "pad", "fader"…). */
  name: string;
  /** Gain of the stage, dB (negative for a pad or a fader below unity). */
  gainDb: number;
  /** The rms level at the stage's output where it clips, dBu; omit for a passive stage (a pad) that cannot clip. */
  clipDbu?: number;
  /**
   * The noise the stage itself adds, at its output with its input silent, dBu (for a mic
   * preamp, its EIN plus its gain). Omit for a stage that adds none worth counting.
   */
  noiseFloorDbu?: number;
}

export type ChainSource = { sourceDbu: number } | { splDb: number; mvPerPa: number };

export interface StageLevels {
  name: string;
  inputDbu: number;
  /** Signal at the stage's output, dBu, as if nothing before it had clipped. */
  outputDbu: number;
  /** Where the stage clips, dBu; Infinity for a passive stage. */
  clipDbu: number;
  /** All the noise at the stage's output, dBu: the noise carried in, plus the gain, plus its own. */
  noiseDbu: number;
  headroomDb: number;
  snrDb: number;
  clips: boolean;
}

export interface ChainLevels {
  sourceDbu: number;
  stages: StageLevels[];
  /** The stage with the least headroom, and that headroom (dB). */
  tightestStage: string;
  minimumHeadroomDb: number;
  /** The first stage that clips, or null. */
  firstClip: string | null;
  /** Signal-to-noise at the last stage, dB. */
  finalSnrDb: number;
}

function sourceLevelDbu(source: ChainSource): number {
  if ("sourceDbu" in source) return requireFinite("sourceDbu", source.sourceDbu);
  requirePositive("mvPerPa", source.mvPerPa);
  return micOutputDbu({ splDb: source.splDb, mvPerPa: source.mvPerPa });
}

/**
 * Level, noise, headroom and signal-to-noise at every stage of a chain. The signal at each
 * output is input + gain; the noise is the power sum of the noise carried in (plus the gain)
 * and the stage's own floor. `sourceNoiseDbu` is the noise that arrives with the source (the
 * thermal noise of a mic's source resistance, see thermalNoiseDbu); it defaults to none.
 * A clipped stage is flagged, and later stages are computed as if it had not clipped, so the
 * readout shows by how much each stage is over.
 */
export function gainStageLevels(args: ChainSource & { sourceNoiseDbu?: number; stages: readonly GainStage[] }): ChainLevels {
  const sourceDbu = sourceLevelDbu(args);
  if (args.stages.length === 0) throw new RangeError("stages must list at least one stage");
  let levelDbu = sourceDbu;
  let noiseDbu = args.sourceNoiseDbu === undefined ? -Infinity : requireFinite("sourceNoiseDbu", args.sourceNoiseDbu);
  const stages = args.stages.map((stage): StageLevels => {
    requireFinite(`gainDb of ${stage.name}`, stage.gainDb);
    const inputDbu = levelDbu;
    levelDbu = inputDbu + stage.gainDb;
    noiseDbu = sumUncorrelatedDb([noiseDbu + stage.gainDb, stage.noiseFloorDbu ?? -Infinity]);
    const clipDbu = stage.clipDbu ?? Infinity;
    const stageHeadroomDb = stage.clipDbu === undefined ? Infinity : headroomDb({ levelDbu, clipDbu });
    return {
      name: stage.name,
      inputDbu,
      outputDbu: levelDbu,
      clipDbu,
      noiseDbu,
      headroomDb: stageHeadroomDb,
      snrDb: noiseDbu === -Infinity ? Infinity : signalToNoiseDb({ levelDbu, noiseDbu }),
      clips: stageHeadroomDb < 0,
    };
  });
  const tightest = stages.reduce((least, stage) => (stage.headroomDb < least.headroomDb ? stage : least));
  return {
    sourceDbu,
    stages,
    tightestStage: tightest.name,
    minimumHeadroomDb: tightest.headroomDb,
    firstClip: stages.find((stage) => stage.clips)?.name ?? null,
    finalSnrDb: stages[stages.length - 1].snrDb,
  };
}
