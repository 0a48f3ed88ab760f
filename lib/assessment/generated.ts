/**
 * Generated numeric questions: the bank names a generator from a fixed list and gives a
 * range for each of its inputs; each attempt draws the inputs from a seed and the generator
 * computes the key. There is deliberately no formula language in the bank: every formula is
 * tested library code in lib/acoustics.
 *
 * The catalog (names, inputs, answer unit) is static so banks can be validated without the
 * computation. The compute functions are injected through `createGeneratorRegistry`, because
 * lib/acoustics is written separately; the app wires it once, e.g.
 * `createGeneratorRegistry(acoustics)` with `import * as acoustics from "@/lib/acoustics"`.
 */
import { GAIN_STRUCTURE_GENERATORS, gainStructureComputations } from "./generated-gain";
import { formatQuantity, type UnitId } from "./units";

/** The lib/acoustics functions the generators need (units in the names, SI unless stated). */
export interface AcousticsFunctions {
  /** Comb-filter notch frequencies in Hz, lowest first: f_n = (2n−1)·c/(2Δd). */
  combNotchesHz(args: { pathDifferenceM: number; speedOfSoundMs: number; count: number }): readonly number[];
  /** Speed of sound in dry air in m/s at a temperature in °C. */
  speedOfSoundMs(args: { temperatureC: number }): number;
  /** Acoustic delay in ms over a distance in m: t = d/c. */
  delayMs(args: { distanceM: number; speedOfSoundMs: number }): number;
  /** Level change in dB moving from one distance to another, free field: −20·log10(to/from). */
  inverseSquareChangeDb(args: { fromM: number; toM: number }): number;
  /** Permissible daily exposure in hours at an A-weighted level (NIOSH REL or OSHA PEL). */
  permissibleExposureHours(args: { levelDba: number; standard: "niosh" | "osha" }): number;
  /** Volts at the mic on IEC 61938 phantom power: V − I·R/2 (the two feed resistors in parallel). */
  phantomAtMic(args: { supply: "P48"; supplyV: number; currentMa: number }): { voltsAtMic: number };
  /** Fault current in mA of IEC 61938 phantom power: V/R for one leg grounded, 2V/R for both. */
  phantomFaultCurrentMa(args: { supply: "P48"; supplyV: number; fault: "one-leg" | "both-legs" }): number;
  /** dBu → volts rms: V = √0.6·10^(L/20). */
  dbuToVolts(levelDbu: number): number;
  /** A mic's output in volts at a sound pressure level, from its sensitivity in mV/Pa. */
  micOutputVolts(args: { mvPerPa: number; splDb: number }): number;
  /** An ideal N:1 transformer: voltage change −20·log10 N dB and impedance ratio N². */
  transformer(args: { turnsRatio: number }): { voltageChangeDb: number };
  /** dBFS → dBu under an alignment (EBU R68: −18 dBFS = 0 dBu; SMPTE RP 155: −20 dBFS = +4 dBu). */
  dbfsToDbu(args: { dbfs: number; alignment: "ebu-r68" | "smpte-rp155" }): number;
  /** dBu → dBFS under an alignment. */
  dbuToDbfs(args: { dbu: number; alignment: "ebu-r68" | "smpte-rp155" }): number;
  /** K = °C + 273.15. */
  celsiusToKelvin(temperatureC: number): number;
  /** Johnson–Nyquist noise √(4kTRB), volts rms. */
  thermalNoiseVolts(args: { resistanceOhms: number; bandwidthHz: number; temperatureK: number }): number;
  /** The same noise in dBu. */
  thermalNoiseDbu(args: { resistanceOhms: number; bandwidthHz: number; temperatureK: number }): number;
  /** A preamp's noise figure, dB: EIN − thermal noise of the source over the bandwidth (at 290 K). */
  noiseFigureDb(args: { einDbu: number; resistanceOhms: number; bandwidthHz: number }): number;
  /** A mic's output level in dBu at an SPL, from its sensitivity in mV/Pa. */
  micOutputDbu(args: { splDb: number; mvPerPa: number }): number;
  /** Level and headroom at each stage of a chain of gains (only what the generators read). */
  gainStageLevels(args: { sourceDbu: number; stages: readonly { name: string; gainDb: number; clipDbu: number }[] }): {
    stages: readonly { headroomDb: number }[];
  };
}

export interface GeneratorCatalogEntry {
  /** Input names, in the units their names state; the bank gives a range for each. */
  inputs: readonly string[];
  /** Unit of the computed key; learners may answer in any unit of the same quantity. */
  unit: UnitId;
  /** Decimals used to show the key after submission. */
  displayDecimals: number;
  description: string;
  /**
   * Where each input makes sense, [min, max] inclusive: a bank's range must lie inside, so no
   * draw can reach a value the formula refuses (a P48 supply outside 44–52 V, a current beyond
   * what the feed resistors pass) or one the trade never meets.
   */
  domain: Readonly<Record<string, readonly [number, number]>>;
  /** Inputs of a worked case, inside the domain; tests run them. */
  example: Readonly<Record<string, number>>;
}

export const GENERATOR_CATALOG = {
  combFirstNotch: {
    inputs: ["pathDifferenceM", "temperatureC"],
    unit: "Hz",
    displayDecimals: 1,
    description: "first comb-filter notch for a path difference between two mics, at an air temperature",
    domain: { pathDifferenceM: [0.001, 100], temperatureC: [-40, 60] },
    example: { pathDifferenceM: 0.45, temperatureC: 18 },
  },
  delayFromDistance: {
    inputs: ["distanceM", "temperatureC"],
    unit: "ms",
    displayDecimals: 2,
    description: "acoustic delay over a distance, at an air temperature",
    domain: { distanceM: [0, 1000], temperatureC: [-40, 60] },
    example: { distanceM: 12, temperatureC: 20 },
  },
  inverseSquareChange: {
    inputs: ["fromM", "toM"],
    unit: "dB",
    displayDecimals: 2,
    description: "free-field level change when the listener moves from one distance to another",
    domain: { fromM: [0.01, 1000], toM: [0.01, 1000] },
    example: { fromM: 2, toM: 8 },
  },
  noisePermissibleTime: {
    inputs: ["levelDba"],
    unit: "h",
    displayDecimals: 2,
    description: "permissible daily exposure time at a level, NIOSH REL (85 dBA, 3 dB exchange rate)",
    domain: { levelDba: [70, 140] },
    example: { levelDba: 97 },
  },
  noisePermissibleTimeOsha: {
    inputs: ["levelDba"],
    unit: "h",
    displayDecimals: 2,
    description: "permissible daily exposure time at a level, OSHA PEL (90 dBA, 5 dB exchange rate)",
    domain: { levelDba: [70, 140] },
    example: { levelDba: 100 },
  },
  phantomVoltsAtMic: {
    inputs: ["supplyV", "currentMa"],
    unit: "V",
    displayDecimals: 2,
    description: "volts left at a condenser mic on P48 phantom power (IEC 61938, 6.81 kΩ per leg) for its current draw",
    // IEC 61938:2018 P48: 48 ± 4 V, at most 10 mA per mic.
    domain: { supplyV: [44, 52], currentMa: [0, 10] },
    example: { supplyV: 48, currentMa: 7 },
  },
  phantomOneLegFault: {
    inputs: ["supplyV"],
    unit: "mA",
    displayDecimals: 2,
    description: "DC current through one P48 leg shorted to ground (an unbalanced adaptor or a miswired cable)",
    // IEC 61938:2018 P48: 48 ± 4 V.
    domain: { supplyV: [44, 52] },
    example: { supplyV: 48 },
  },
  dbuInVolts: {
    inputs: ["levelDbu"],
    unit: "V",
    displayDecimals: 3,
    description: "rms volts of a level in dBu (0 dBu = √0.6 V)",
    domain: { levelDbu: [-80, 30] },
    example: { levelDbu: 4 },
  },
  micOutputAtSpl: {
    inputs: ["mvPerPa", "splDb"],
    unit: "mV",
    displayDecimals: 2,
    description: "a mic's output voltage at a sound pressure level, from its sensitivity in mV/Pa",
    domain: { mvPerPa: [0.1, 100], splDb: [20, 150] },
    example: { mvPerPa: 10, splDb: 114 },
  },
  diTransformerLoss: {
    inputs: ["turnsRatio"],
    unit: "dB",
    displayDecimals: 2,
    description: "level change through an ideal N:1 step-down DI transformer",
    domain: { turnsRatio: [1, 100] },
    example: { turnsRatio: 12 },
  },
  ...GAIN_STRUCTURE_GENERATORS,
} as const satisfies Record<string, GeneratorCatalogEntry>;

export type GeneratorName = keyof typeof GENERATOR_CATALOG;

export const GENERATOR_NAMES = Object.keys(GENERATOR_CATALOG) as [GeneratorName, ...GeneratorName[]];

export interface GeneratedValue {
  value: number;
  unit: UnitId;
}

export interface GeneratorDefinition {
  inputs: readonly string[];
  compute(inputs: Readonly<Record<string, number>>): GeneratedValue;
  /** Shows a computed key to the learner, e.g. "171.5 Hz". */
  format(result: GeneratedValue): string;
}

export type GeneratorRegistry = Readonly<Record<GeneratorName, GeneratorDefinition>>;

type ComputeFunctions = Record<GeneratorName, (inputs: Readonly<Record<string, number>>) => number>;

function computeFunctions(acoustics: AcousticsFunctions): ComputeFunctions {
  return {
    combFirstNotch: (inputs) => {
      const speedOfSoundMs = acoustics.speedOfSoundMs({ temperatureC: inputs.temperatureC });
      const notches = acoustics.combNotchesHz({ pathDifferenceM: inputs.pathDifferenceM, speedOfSoundMs, count: 1 });
      return notches[0];
    },
    delayFromDistance: (inputs) => {
      const speedOfSoundMs = acoustics.speedOfSoundMs({ temperatureC: inputs.temperatureC });
      return acoustics.delayMs({ distanceM: inputs.distanceM, speedOfSoundMs });
    },
    inverseSquareChange: (inputs) => acoustics.inverseSquareChangeDb({ fromM: inputs.fromM, toM: inputs.toM }),
    noisePermissibleTime: (inputs) =>
      acoustics.permissibleExposureHours({ levelDba: inputs.levelDba, standard: "niosh" }),
    noisePermissibleTimeOsha: (inputs) =>
      acoustics.permissibleExposureHours({ levelDba: inputs.levelDba, standard: "osha" }),
    phantomVoltsAtMic: (inputs) =>
      acoustics.phantomAtMic({ supply: "P48", supplyV: inputs.supplyV, currentMa: inputs.currentMa }).voltsAtMic,
    phantomOneLegFault: (inputs) => acoustics.phantomFaultCurrentMa({ supply: "P48", supplyV: inputs.supplyV, fault: "one-leg" }),
    dbuInVolts: (inputs) => acoustics.dbuToVolts(inputs.levelDbu),
    // The catalog key is in mV: the library answers in volts.
    micOutputAtSpl: (inputs) => 1000 * acoustics.micOutputVolts({ mvPerPa: inputs.mvPerPa, splDb: inputs.splDb }),
    diTransformerLoss: (inputs) => acoustics.transformer({ turnsRatio: inputs.turnsRatio }).voltageChangeDb,
    ...gainStructureComputations(acoustics),
  };
}

export function createGeneratorRegistry(acoustics: AcousticsFunctions): GeneratorRegistry {
  const compute = computeFunctions(acoustics);
  const registry = {} as Record<GeneratorName, GeneratorDefinition>;
  for (const name of GENERATOR_NAMES) {
    const entry: GeneratorCatalogEntry = GENERATOR_CATALOG[name];
    registry[name] = {
      inputs: entry.inputs,
      compute: (inputs) => {
        for (const input of entry.inputs) {
          if (typeof inputs[input] !== "number") throw new Error(`generator ${name} needs input ${input}`);
        }
        const value = compute[name](inputs);
        if (!Number.isFinite(value)) throw new Error(`generator ${name} gave a non-finite value`);
        return { value, unit: entry.unit };
      },
      format: (result) => formatQuantity(result.value, result.unit, entry.displayDecimals),
    };
  }
  return registry;
}

/** Placeholder names used in a prompt template: "{pathDifferenceM}" → "pathDifferenceM". */
export function templatePlaceholders(template: string): string[] {
  return Array.from(template.matchAll(/\{([A-Za-z][A-Za-z0-9]*)\}/g), (match) => match[1]);
}

/** Fills "{name}" placeholders with already formatted values; unknown names stay as typed. */
export function fillTemplate(template: string, values: Readonly<Record<string, string>>): string {
  return template.replace(/\{([A-Za-z][A-Za-z0-9]*)\}/g, (whole, name: string) =>
    Object.hasOwn(values, name) ? values[name] : whole,
  );
}

/**
 * A generated prompt as an instructor reads it in the item table, where no one attempt's
 * numbers apply: each "{name}" becomes "…" and the prompt says the values vary.
 */
export function templateForReview(template: string): string {
  const names = templatePlaceholders(template);
  if (names.length === 0) return template;
  return `${fillTemplate(template, Object.fromEntries(names.map((name) => [name, "…"])))} (values drawn per attempt)`;
}
