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
}

interface GeneratorCatalogEntry {
  /** Input names, in the units their names state; the bank gives a range for each. */
  inputs: readonly string[];
  /** Unit of the computed key; learners may answer in any unit of the same quantity. */
  unit: UnitId;
  /** Decimals used to show the key after submission. */
  displayDecimals: number;
  description: string;
}

export const GENERATOR_CATALOG = {
  combFirstNotch: {
    inputs: ["pathDifferenceM", "temperatureC"],
    unit: "Hz",
    displayDecimals: 1,
    description: "first comb-filter notch for a path difference between two mics, at an air temperature",
  },
  delayFromDistance: {
    inputs: ["distanceM", "temperatureC"],
    unit: "ms",
    displayDecimals: 2,
    description: "acoustic delay over a distance, at an air temperature",
  },
  inverseSquareChange: {
    inputs: ["fromM", "toM"],
    unit: "dB",
    displayDecimals: 2,
    description: "free-field level change when the listener moves from one distance to another",
  },
  noisePermissibleTime: {
    inputs: ["levelDba"],
    unit: "h",
    displayDecimals: 2,
    description: "permissible daily exposure time at a level, NIOSH REL (85 dBA, 3 dB exchange rate)",
  },
  noisePermissibleTimeOsha: {
    inputs: ["levelDba"],
    unit: "h",
    displayDecimals: 2,
    description: "permissible daily exposure time at a level, OSHA PEL (90 dBA, 5 dB exchange rate)",
  },
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
