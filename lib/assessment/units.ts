/**
 * The small unit table that numeric and generated questions may use.
 *
 * Each unit converts to the base unit of its quantity by `base = value·scale + offset`
 * (the offset is only non-zero for °F). Unit ids are plain ASCII so a bank stays easy to
 * type in JSON; `symbol` is what a learner sees.
 */

export const UNIT_IDS = [
  "m",
  "cm",
  "mm",
  "in",
  "ft",
  "s",
  "ms",
  "min",
  "h",
  "Hz",
  "kHz",
  "dB",
  "degC",
  "degF",
  "V",
  "mV",
  "uV",
  "dBu",
  "dBFS",
  "ohm",
  "kohm",
  "A",
  "mA",
] as const;

export type UnitId = (typeof UNIT_IDS)[number];

export type Quantity =
  | "length"
  | "time"
  | "frequency"
  | "level"
  | "analogue-level"
  | "digital-level"
  | "temperature"
  | "voltage"
  | "resistance"
  | "current";

export interface UnitDefinition {
  quantity: Quantity;
  symbol: string;
  /** Multiplier to the quantity's base unit (m, s, Hz, dB, °C, V, Ω, A). */
  scale: number;
  /** Added after scaling; non-zero only for affine units (°F → °C). */
  offset: number;
}

export const UNITS: Readonly<Record<UnitId, UnitDefinition>> = {
  m: { quantity: "length", symbol: "m", scale: 1, offset: 0 },
  cm: { quantity: "length", symbol: "cm", scale: 0.01, offset: 0 },
  mm: { quantity: "length", symbol: "mm", scale: 0.001, offset: 0 },
  // 1 in = 25.4 mm and 1 ft = 0.3048 m exactly (international yard and pound, 1959) // common practice
  in: { quantity: "length", symbol: "in", scale: 0.0254, offset: 0 },
  ft: { quantity: "length", symbol: "ft", scale: 0.3048, offset: 0 },
  s: { quantity: "time", symbol: "s", scale: 1, offset: 0 },
  ms: { quantity: "time", symbol: "ms", scale: 0.001, offset: 0 },
  // Minutes and hours are here for noise-exposure times (permissible hours per day).
  min: { quantity: "time", symbol: "min", scale: 60, offset: 0 },
  h: { quantity: "time", symbol: "h", scale: 3600, offset: 0 },
  Hz: { quantity: "frequency", symbol: "Hz", scale: 1, offset: 0 },
  kHz: { quantity: "frequency", symbol: "kHz", scale: 1000, offset: 0 },
  // A level or level difference; only one unit, so nothing converts.
  dB: { quantity: "level", symbol: "dB", scale: 1, offset: 0 },
  degC: { quantity: "temperature", symbol: "°C", scale: 1, offset: 0 },
  // °C = (°F − 32)·5/9 = °F·5/9 − 160/9
  degF: { quantity: "temperature", symbol: "°F", scale: 5 / 9, offset: -160 / 9 },
  V: { quantity: "voltage", symbol: "V", scale: 1, offset: 0 },
  mV: { quantity: "voltage", symbol: "mV", scale: 0.001, offset: 0 },
  // 1 µV = 10⁻⁶ V, the SI prefix micro (BIPM SI Brochure, 9th ed.): thermal noise is a fraction of a µV.
  uV: { quantity: "voltage", symbol: "µV", scale: 1e-6, offset: 0 },
  // Absolute levels are quantities of their own: a dBu (re 0.7746 V) and a dBFS (re digital full
  // scale) answer are not interchangeable with each other or with a level difference in dB.
  dBu: { quantity: "analogue-level", symbol: "dBu", scale: 1, offset: 0 },
  dBFS: { quantity: "digital-level", symbol: "dBFS", scale: 1, offset: 0 },
  ohm: { quantity: "resistance", symbol: "Ω", scale: 1, offset: 0 },
  kohm: { quantity: "resistance", symbol: "kΩ", scale: 1000, offset: 0 },
  // Current, for phantom power: a condenser mic's draw and a fault current are a few mA.
  A: { quantity: "current", symbol: "A", scale: 1, offset: 0 },
  mA: { quantity: "current", symbol: "mA", scale: 0.001, offset: 0 },
};

export function quantityOf(unit: UnitId): Quantity {
  return UNITS[unit].quantity;
}

export function sameQuantity(a: UnitId, b: UnitId): boolean {
  return UNITS[a].quantity === UNITS[b].quantity;
}

/** The units a learner may answer in when the key is given in `unit`. */
export function unitsOfSameQuantity(unit: UnitId): UnitId[] {
  const quantity = UNITS[unit].quantity;
  return UNIT_IDS.filter((id) => UNITS[id].quantity === quantity);
}

/** Converts a value between two units of one quantity; throws on a quantity mismatch (a bug). */
export function convertUnit(value: number, from: UnitId, to: UnitId): number {
  if (from === to) return value;
  const source = UNITS[from];
  const target = UNITS[to];
  if (source.quantity !== target.quantity) {
    throw new Error(`cannot convert ${from} (${source.quantity}) to ${to} (${target.quantity})`);
  }
  const base = value * source.scale + source.offset;
  return (base - target.offset) / target.scale;
}

export function formatQuantity(value: number, unit: UnitId, decimals: number): string {
  return `${value.toFixed(decimals)} ${UNITS[unit].symbol}`;
}
