"use client";
// Phantom power per IEC 61938: volts left at the mic for a current draw, in or out of spec, and
// the fault current that makes ribbons and unbalanced sources a concern. Numbers: lib/acoustics.
import { PHANTOM_SUPPLIES, phantomAtMic, phantomFaultCurrentMa, phantomMaxPowerMw, type PhantomSupplyId } from "@/lib/acoustics";
import { Notice } from "@/components/ui/notice";
import { FIGURE_META } from "./figure-meta";
import { LIMITS, PHANTOM_POWER_DEFAULTS, supplyVoltageRange, type PhantomPowerState } from "./figure-state";
import { ChoiceGroup } from "./parts/choice-group";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatNumber, formatOhms } from "./parts/format";
import { RangeField } from "./parts/range-field";
import { KeyResult, Readouts } from "./parts/readouts";
import { useFigureState } from "./parts/use-figure-state";
import { PhantomSketch } from "./phantom-sketch";

export interface PhantomPowerFigureProps {
  initialState?: Partial<PhantomPowerState>;
  onStateChange?: (state: PhantomPowerState) => void;
}

const SUPPLY_IDS = Object.keys(PHANTOM_SUPPLIES) as PhantomSupplyId[];

function atMic(state: PhantomPowerState): { voltsAtMic: number; withinSpec: boolean } | null {
  try {
    return phantomAtMic({ supply: state.supply, supplyV: state.supplyV, currentMa: state.currentMa });
  } catch {
    // The library refuses a current above what the supply can push into a short circuit.
    return null;
  }
}

export function PhantomPowerFigure({ initialState, onStateChange }: PhantomPowerFigureProps) {
  const [state, update] = useFigureState(PHANTOM_POWER_DEFAULTS, initialState, onStateChange);
  const supply = PHANTOM_SUPPLIES[state.supply];
  const result = atMic(state);
  const supplyInTolerance = Math.abs(state.supplyV - supply.nominalV) <= supply.toleranceV;
  const currentInSpec = state.currentMa <= supply.maxCurrentMa;
  const oneLegMa = phantomFaultCurrentMa({ supply: state.supply, supplyV: state.supplyV, fault: "one-leg" });
  const bothLegsMa = phantomFaultCurrentMa({ supply: state.supply, supplyV: state.supplyV, fault: "both-legs" });
  const maxPowerMw = phantomMaxPowerMw({ supply: state.supply, supplyV: state.supplyV });
  const range = supplyVoltageRange(state.supply);
  const reasons = [
    !supplyInTolerance && `the supply is outside ${formatNumber(supply.nominalV, 0)} ± ${formatNumber(supply.toleranceV, 0)} V`,
    !currentInSpec && `the mic draws more than the ${formatNumber(supply.maxCurrentMa, 0)} mA ${state.supply} allows`,
  ].filter(Boolean);
  const specText = result === null ? "Not possible" : result.withinSpec ? "Within IEC 61938" : "Out of spec";
  const keyText =
    result === null
      ? `A ${state.supply} supply at ${formatNumber(state.supplyV, 1)} V cannot deliver ${formatNumber(state.currentMa, 1)} mA, even into a short circuit.`
      : `${formatNumber(result.voltsAtMic, 2)} V at the mic. ${specText}${reasons.length > 0 ? `: ${reasons.join(" and ")}` : ""}.`;
  const description = `Phantom feed: ${state.supply} supply at ${formatNumber(state.supplyV, 1)} V through ${formatOhms(supply.feedResistorPerLegOhms)} per leg; the mic draws ${formatNumber(state.currentMa, 1)} mA. ${keyText}`;

  return (
    <FigureFrame name="phantom-power" title={FIGURE_META["phantom-power"].title} summary="The same DC on pins 2 and 3, returned through pin 1.">
      <PhantomSketch supplyV={state.supplyV} resistorOhms={supply.feedResistorPerLegOhms} currentMa={state.currentMa} voltsAtMic={result?.voltsAtMic ?? null} description={description} />
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <KeyResult testId="phantom-key-result">{keyText}</KeyResult>
          <Readouts
            items={[
              { label: "Volts at the mic", value: result === null ? "—" : `${formatNumber(result.voltsAtMic, 2)} V`, testId: "volts-at-mic" },
              { label: "IEC 61938", value: specText, testId: "phantom-spec", tone: result?.withinSpec ? "good" : "bad" },
              { label: "Feed resistor, each leg", value: formatOhms(supply.feedResistorPerLegOhms), testId: "feed-resistor" },
              { label: "Most current allowed", value: `${formatNumber(supply.maxCurrentMa, 0)} mA`, testId: "max-current" },
              { label: "Most power available", value: `${formatNumber(maxPowerMw, 1)} mW`, testId: "max-power" },
              { label: "DC with one leg shorted", value: `${formatNumber(oneLegMa, 2)} mA`, testId: "fault-one-leg" },
              { label: "DC with both legs shorted", value: `${formatNumber(bothLegsMa, 2)} mA`, testId: "fault-both-legs" },
            ]}
          />
        </div>
        <ControlStack label="Phantom power controls">
          <ChoiceGroup
            legend="Supply"
            options={SUPPLY_IDS.map((id) => ({ value: id, label: `${id} (${PHANTOM_SUPPLIES[id].nominalV} V)` }))}
            value={state.supply}
            onChange={(id) => update({ supply: id, supplyV: PHANTOM_SUPPLIES[id].nominalV })}
            testId="phantom-supply"
          />
          <RangeField
            label="Supply voltage (open circuit)"
            min={range.min}
            max={range.max}
            step={0.5}
            value={state.supplyV}
            valueText={`${formatNumber(state.supplyV, 1)} V`}
            onChange={(supplyV) => update({ supplyV })}
            hint={`IEC 61938 allows ${formatNumber(supply.nominalV, 0)} ± ${formatNumber(supply.toleranceV, 0)} V.`}
            testId="phantom-supply-volts"
          />
          <RangeField
            label="Current the mic draws"
            min={LIMITS.currentMa.min}
            max={LIMITS.currentMa.max}
            step={0.1}
            value={state.currentMa}
            valueText={`${formatNumber(state.currentMa, 1)} mA`}
            onChange={(currentMa) => update({ currentMa })}
            hint="Check the mic's datasheet for its current draw."
            testId="phantom-current"
          />
        </ControlStack>
      </FigureColumns>
      <Notice tone="caution" title="ribbons and unbalanced sources">
        <p>
          A ribbon element on a correctly wired balanced cable sees no DC, but a miswired or damaged cable, a patch point being plugged in, or an unbalanced adaptor puts DC through one leg: here about{" "}
          <strong>{formatNumber(oneLegMa, 1)} mA</strong>, enough to damage a ribbon. An unbalanced source (a keyboard or a DI&apos;s unbalanced side) on a phantom-powered input gets the same DC and can
          thump or be damaged.
        </p>
        <p>
          Turn phantom off before connecting or disconnecting anything, mute the channel before switching it, keep it off on channels with ribbons or unbalanced sources unless the maker says otherwise, and follow
          the equipment&apos;s instructions and the venue&apos;s rules.
        </p>
      </Notice>
    </FigureFrame>
  );
}
