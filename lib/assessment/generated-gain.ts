/**
 * Generators for gain-structure questions: dBFS and dBu under the two published alignments,
 * the thermal noise of a source resistance, a preamp's noise figure, the gain that brings a mic
 * to a level, and the headroom left at a stage. Part of GENERATOR_CATALOG (generated.ts); each
 * key comes from a tested lib/acoustics function (alignment.ts, thermal-noise.ts,
 * gain-structure.ts).
 */
import type { AcousticsFunctions, GeneratorCatalogEntry } from "./generated";

export const GAIN_STRUCTURE_GENERATORS = {
  dbfsToDbuEbu: {
    inputs: ["dbfs"],
    unit: "dBu",
    displayDecimals: 1,
    description: "the analogue level of a digital meter reading, EBU R68 alignment (−18 dBFS = 0 dBu)",
    // Nothing codes above 0 dBFS; below −60 dBFS a meter reading is no longer a working level.
    domain: { dbfs: [-60, 0] },
    example: { dbfs: -18 },
  },
  dbfsToDbuSmpte: {
    inputs: ["dbfs"],
    unit: "dBu",
    displayDecimals: 1,
    description: "the analogue level of a digital meter reading, SMPTE RP 155 reference with +4 dBu (−20 dBFS = +4 dBu)",
    domain: { dbfs: [-60, 0] },
    example: { dbfs: -20 },
  },
  dbuToDbfsEbu: {
    inputs: ["levelDbu"],
    unit: "dBFS",
    displayDecimals: 1,
    description: "the digital meter reading of an analogue level, EBU R68 alignment (full scale = +18 dBu)",
    // Up to full scale (+18 dBu): above it the converter clips and there is no reading to give.
    domain: { levelDbu: [-40, 18] },
    example: { levelDbu: 4 },
  },
  dbuToDbfsSmpte: {
    inputs: ["levelDbu"],
    unit: "dBFS",
    displayDecimals: 1,
    description: "the digital meter reading of an analogue level, SMPTE RP 155 with +4 dBu (full scale = +24 dBu)",
    domain: { levelDbu: [-40, 24] },
    example: { levelDbu: 4 },
  },
  sourceThermalNoiseDbu: {
    inputs: ["resistanceOhms", "bandwidthHz", "temperatureC"],
    unit: "dBu",
    displayDecimals: 1,
    description: "the Johnson–Nyquist noise of a source resistance over a bandwidth, in dBu",
    // From a low-impedance mic to a passive pickup, over any audio bandwidth, indoors or out.
    domain: { resistanceOhms: [10, 1_000_000], bandwidthHz: [1, 100_000], temperatureC: [-20, 60] },
    example: { resistanceOhms: 150, bandwidthHz: 20_000, temperatureC: 17 },
  },
  sourceThermalNoiseMicrovolts: {
    inputs: ["resistanceOhms", "bandwidthHz", "temperatureC"],
    unit: "uV",
    displayDecimals: 3,
    description: "the Johnson–Nyquist noise voltage of a resistance over a bandwidth, in µV",
    domain: { resistanceOhms: [10, 1_000_000], bandwidthHz: [1, 100_000], temperatureC: [-20, 60] },
    example: { resistanceOhms: 1000, bandwidthHz: 10_000, temperatureC: 17 },
  },
  preampNoiseFigure: {
    inputs: ["einDbu"],
    unit: "dB",
    displayDecimals: 1,
    description: "a mic preamp's noise figure from its EIN, quoted with 150 Ω over 20 kHz (floor −130.96 dBu at 290 K)",
    // From just above the 150 Ω floor to a poor preamp; an EIN below the floor cannot be measured with 150 Ω.
    domain: { einDbu: [-130.5, -110] },
    example: { einDbu: -129 },
  },
  preampGainForLevel: {
    inputs: ["mvPerPa", "splDb", "targetDbu"],
    unit: "dB",
    displayDecimals: 1,
    description: "the preamp gain that brings a mic at an SPL up to a target level in dBu",
    domain: { mvPerPa: [0.1, 100], splDb: [40, 140], targetDbu: [-20, 10] },
    example: { mvPerPa: 10, splDb: 114, targetDbu: 4 },
  },
  stageHeadroom: {
    inputs: ["sourceDbu", "gainDb", "clipDbu"],
    unit: "dB",
    displayDecimals: 1,
    description: "the headroom left at a stage: its clip level minus the level the gain brings the signal to",
    domain: { sourceDbu: [-70, 24], gainDb: [-40, 70], clipDbu: [0, 30] },
    example: { sourceDbu: -36, gainDb: 40, clipDbu: 24 },
  },
} as const satisfies Record<string, GeneratorCatalogEntry>;

type GainStructureGeneratorName = keyof typeof GAIN_STRUCTURE_GENERATORS;

/** 150 Ω over 20 kHz: how preamp EIN is quoted (common practice). */
const EIN_SOURCE = { resistanceOhms: 150, bandwidthHz: 20_000 } as const;

export function gainStructureComputations(
  acoustics: AcousticsFunctions,
): Record<GainStructureGeneratorName, (inputs: Readonly<Record<string, number>>) => number> {
  const noiseArgs = (inputs: Readonly<Record<string, number>>) => ({
    resistanceOhms: inputs.resistanceOhms,
    bandwidthHz: inputs.bandwidthHz,
    temperatureK: acoustics.celsiusToKelvin(inputs.temperatureC),
  });
  return {
    dbfsToDbuEbu: (inputs) => acoustics.dbfsToDbu({ dbfs: inputs.dbfs, alignment: "ebu-r68" }),
    dbfsToDbuSmpte: (inputs) => acoustics.dbfsToDbu({ dbfs: inputs.dbfs, alignment: "smpte-rp155" }),
    dbuToDbfsEbu: (inputs) => acoustics.dbuToDbfs({ dbu: inputs.levelDbu, alignment: "ebu-r68" }),
    dbuToDbfsSmpte: (inputs) => acoustics.dbuToDbfs({ dbu: inputs.levelDbu, alignment: "smpte-rp155" }),
    sourceThermalNoiseDbu: (inputs) => acoustics.thermalNoiseDbu(noiseArgs(inputs)),
    // The catalog key is in µV: the library answers in volts.
    sourceThermalNoiseMicrovolts: (inputs) => 1e6 * acoustics.thermalNoiseVolts(noiseArgs(inputs)),
    preampNoiseFigure: (inputs) => acoustics.noiseFigureDb({ einDbu: inputs.einDbu, ...EIN_SOURCE }),
    preampGainForLevel: (inputs) => inputs.targetDbu - acoustics.micOutputDbu({ splDb: inputs.splDb, mvPerPa: inputs.mvPerPa }),
    stageHeadroom: (inputs) =>
      acoustics.gainStageLevels({ sourceDbu: inputs.sourceDbu, stages: [{ name: "stage", gainDb: inputs.gainDb, clipDbu: inputs.clipDbu }] }).stages[0].headroomDb,
  };
}
