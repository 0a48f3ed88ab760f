/**
 * Phantom power per IEC 61938:2018 (P48 earlier in DIN 45596).
 *
 * The supply feeds both signal legs through equal resistors R, so the
 * microphone sees the two in parallel, R/2:
 *
 *   V_mic = V_supply − I·R/2
 *   one leg shorted to ground:  I = V/R
 *   both legs shorted to ground: I = 2V/R
 *   maximum power available:    V²/(2R)  (matched load, R/2 internal)
 *
 * Safety: phantom power is low-voltage DC, but a fault puts up to ~7 mA of DC
 * (P48) through whatever is on one leg: a ribbon element, its transformer or an
 * unbalanced output. Switch phantom off before patching, mute the channel
 * before switching it, and follow the equipment maker's instructions, the
 * venue's rules and local electrical codes.
 */
import { requireNonNegative, requirePositive } from "./validate";

export type PhantomSupplyId = "P12" | "P24" | "P48";

export interface PhantomSupply {
  readonly id: PhantomSupplyId;
  /** Nominal open-circuit supply voltage, V. */
  readonly nominalV: number;
  /** Permitted deviation from nominal, ± V. */
  readonly toleranceV: number;
  /** Feed resistor in each signal leg, Ω. */
  readonly feedResistorPerLegOhms: number;
  /** Maximum current a microphone may draw, mA. */
  readonly maxCurrentMa: number;
}

/**
 * IEC 61938:2018 phantom supplies. Sources: Sound On Sound glossary "Phantom
 * Power" (P48: 44–52 V, 6.8 kΩ, 10 mA); Wikipedia "Phantom power" (6.81 kΩ,
 * P24 1.2 kΩ, P12 680 Ω). P12's ±1 V tolerance is the IEC value as best we
 * could confirm; one secondary source prints ±3 V.
 */
export const PHANTOM_SUPPLIES: Readonly<Record<PhantomSupplyId, PhantomSupply>> = Object.freeze({
  P12: Object.freeze({ id: "P12", nominalV: 12, toleranceV: 1, feedResistorPerLegOhms: 680, maxCurrentMa: 15 }),
  P24: Object.freeze({ id: "P24", nominalV: 24, toleranceV: 4, feedResistorPerLegOhms: 1200, maxCurrentMa: 10 }),
  P48: Object.freeze({ id: "P48", nominalV: 48, toleranceV: 4, feedResistorPerLegOhms: 6810, maxCurrentMa: 10 }),
});

function lookUpSupply(supply: PhantomSupplyId): PhantomSupply {
  const found = PHANTOM_SUPPLIES[supply];
  if (!found) {
    throw new RangeError(`supply must be one of ${Object.keys(PHANTOM_SUPPLIES).join(", ")}; received ${String(supply)}`);
  }
  return found;
}

function resolveSupplyV(found: PhantomSupply, supplyV: number | undefined): number {
  return supplyV === undefined ? found.nominalV : requirePositive("supplyV", supplyV);
}

/**
 * Voltage at the microphone for a given current draw: V_mic = V − I·R/2
 * (the two feed resistors in parallel; IEC 61938). `withinSpec` is true when
 * the supply voltage is within its IEC tolerance and the current does not
 * exceed the IEC maximum. `supplyV` defaults to the nominal voltage.
 * P48 at 48 V drawing 5 mA → 30.98 V. Throws a RangeError if the current
 * exceeds what the supply can deliver into a short (2V/R).
 */
export function phantomAtMic({
  supply,
  supplyV,
  currentMa,
}: {
  supply: PhantomSupplyId;
  supplyV?: number;
  currentMa: number;
}): { voltsAtMic: number; withinSpec: boolean } {
  const found = lookUpSupply(supply);
  const volts = resolveSupplyV(found, supplyV);
  requireNonNegative("currentMa", currentMa);
  const parallelResistanceOhms = found.feedResistorPerLegOhms / 2;
  const shortCircuitMa = (1000 * volts) / parallelResistanceOhms;
  if (currentMa > shortCircuitMa) {
    throw new RangeError(
      `currentMa ${currentMa} exceeds the ${shortCircuitMa.toFixed(2)} mA a ${supply} supply at ${volts} V can deliver into a short`,
    );
  }
  const voltsAtMic = volts - (currentMa / 1000) * parallelResistanceOhms;
  const supplyWithinTolerance = Math.abs(volts - found.nominalV) <= found.toleranceV;
  return { voltsAtMic, withinSpec: supplyWithinTolerance && currentMa <= found.maxCurrentMa };
}

/**
 * DC fault current, mA: one signal leg shorted to ground (an unbalanced
 * adaptor, a miswired or damaged cable, a TRS patch point mid-insertion) draws
 * I = V/R; both legs shorted draw I = 2V/R (IEC 61938 feed network).
 * P48: 7.05 mA at 48 V one leg; 15.27 mA at 52 V both legs.
 */
export function phantomFaultCurrentMa({
  supply,
  supplyV,
  fault,
}: {
  supply: PhantomSupplyId;
  supplyV?: number;
  fault: "one-leg" | "both-legs";
}): number {
  const found = lookUpSupply(supply);
  const volts = resolveSupplyV(found, supplyV);
  if (fault !== "one-leg" && fault !== "both-legs") {
    throw new RangeError(`fault must be "one-leg" or "both-legs"; received ${String(fault)}`);
  }
  const legs = fault === "both-legs" ? 2 : 1;
  return (1000 * legs * volts) / found.feedResistorPerLegOhms;
}

/**
 * Maximum power the supply can deliver to a microphone, mW: V²/(2R)
 * (source resistance R/2 driving a matched load). P48 at 48 V → 169.2 mW.
 */
export function phantomMaxPowerMw({ supply, supplyV }: { supply: PhantomSupplyId; supplyV?: number }): number {
  const found = lookUpSupply(supply);
  const volts = resolveSupplyV(found, supplyV);
  return (1000 * volts * volts) / (2 * found.feedResistorPerLegOhms);
}
