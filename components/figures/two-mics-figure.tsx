"use client";
// Two mics, one source: the level difference and delay between them, the comb response of
// their sum with its notches, and where the 3:1 guideline leaves you. Numbers: lib/acoustics.
import {
  combExtremesDb,
  combNotchesHz,
  combResponseCurve,
  delayMs,
  inverseSquareChangeDb,
  speedOfSoundMs,
  twoPathAmplitudeRatio,
} from "@/lib/acoustics";
import { FIGURE_META } from "./figure-meta";
import { LIMITS, TWO_MICS_DEFAULTS, type TwoMicsState } from "./figure-state";
import { formatLength } from "./parts/display-units";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatDb, formatFrequency, formatNumber } from "./parts/format";
import { FrequencyPlot } from "./parts/frequency-plot";
import { KeyResult, Readouts } from "./parts/readouts";
import { LengthField, TemperatureField } from "./parts/unit-fields";
import { useFigureState } from "./parts/use-figure-state";
import { TwoMicsSketch } from "./two-mics-sketch";
import { useUnitSystem, type UnitSystem } from "./units-preference";

/** Notches listed below the plot (those under 20 kHz). */
const LISTED_NOTCHES = 8;
/** The distance ratio of the 3:1 guideline (common practice). */
const THREE_TO_ONE_RATIO = 1 / 3;

export interface TwoMicsFigureProps {
  initialState?: Partial<TwoMicsState>;
  onStateChange?: (state: TwoMicsState) => void;
  /** Lesson shorthand: source to the nearer mic, metres. */
  nearM?: number;
  /** Lesson shorthand: source to the farther mic, metres. */
  farM?: number;
}

function inRange(value: number | undefined): value is number {
  return typeof value === "number" && value >= LIMITS.micDistanceM.min && value <= LIMITS.micDistanceM.max;
}

function startingState({ initialState, nearM, farM }: TwoMicsFigureProps): Partial<TwoMicsState> {
  const start: Partial<TwoMicsState> = {};
  if (inRange(nearM)) start.nearM = nearM;
  if (inRange(farM)) start.farM = farM;
  return { ...start, ...initialState };
}

/** Enough samples that the comb's teeth are drawn even at 20 kHz (about 8 per tooth), capped. */
function pointsFor(delayOfPathMs: number): number {
  const toothHz = delayOfPathMs > 0 ? 1000 / delayOfPathMs : Infinity;
  return Math.round(Math.min(6000, Math.max(400, (20_000 * Math.log(1000) * 8) / toothHz)));
}

function comparisonWithThreeToOne(ratio: number, system: UnitSystem, nearM: number): string {
  const threeToOne = combExtremesDb({ amplitudeRatio: THREE_TO_ONE_RATIO });
  const ripple = `${formatDb(threeToOne.peakDb, { signed: true })} / ${formatDb(threeToOne.notchDb)}`;
  if (ratio >= 2.95 && ratio <= 3.05) return `You are at 3:1. It still leaves ${ripple} of ripple: less comb, not none.`;
  if (ratio > 3) return `Farther apart than 3:1, so less ripple than the ${ripple} that 3:1 leaves.`;
  return `Closer than 3:1 (3:1 here would put the far mic at ${formatLength(3 * nearM, system)}, and still leave ${ripple} of ripple).`;
}

export function TwoMicsFigure(props: TwoMicsFigureProps) {
  const system = useUnitSystem();
  const [state, update] = useFigureState(TWO_MICS_DEFAULTS, startingState(props), props.onStateChange);
  const nearM = Math.min(state.nearM, state.farM);
  const farM = Math.max(state.nearM, state.farM);
  const speedMs = speedOfSoundMs({ temperatureC: state.temperatureC });
  const pathDifferenceM = farM - nearM;
  const amplitudeRatio = twoPathAmplitudeRatio({ nearM, farM });
  const levelDifferenceDb = inverseSquareChangeDb({ fromM: nearM, toM: farM });
  const pathDelayMs = delayMs({ distanceM: pathDifferenceM, speedOfSoundMs: speedMs });
  const extremes = combExtremesDb({ amplitudeRatio });
  const notchesHz = pathDifferenceM > 0 ? combNotchesHz({ pathDifferenceM, speedOfSoundMs: speedMs, count: LISTED_NOTCHES }).filter((hz) => hz <= 20_000) : [];
  const curve = combResponseCurve({ amplitudeRatio, delayMs: pathDelayMs, points: pointsFor(pathDelayMs) });
  const ratio = farM / nearM;
  const ripple = `${formatDb(extremes.peakDb, { signed: true })} / ${formatDb(extremes.notchDb)}`;
  const notchText = notchesHz.length > 0 ? notchesHz.map(formatFrequency).join(", ") : "none (the paths are equal)";
  const description =
    `Comb response of the two mics summed, 20 Hz to 20 kHz. Near mic ${formatLength(nearM, system)}, far mic ${formatLength(farM, system)} from the source; ` +
    `the far mic is ${formatDb(levelDifferenceDb)} and ${formatNumber(pathDelayMs, 2)} ms behind. Ripple ${ripple}. Notches at ${notchText}.`;

  return (
    <FigureFrame name="two-mics" title={FIGURE_META["two-mics"].title} summary="Both mics at the same gain, summed in the mix." usesUnits>
      <TwoMicsSketch nearM={nearM} farM={farM} system={system} />
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <FrequencyPlot
            testId="comb-plot"
            description={description}
            minDb={-30}
            maxDb={9}
            gridStepDb={6}
            markersHz={notchesHz}
            traces={[{ id: "comb", points: curve, color: "var(--color-trace-1, currentColor)", width: 2 }]}
          />
          <p className="text-caption text-ink-muted">Level of the sum relative to the near mic alone. Dashed lines: the notches.</p>
          <KeyResult testId="two-mics-key-result">
            The far mic arrives <strong>{formatNumber(pathDelayMs, 2)} ms</strong> later and <strong>{formatDb(-levelDifferenceDb)}</strong> quieter, so the sum ripples{" "}
            <strong>{ripple}</strong>, first notch at {notchesHz.length > 0 ? formatFrequency(notchesHz[0]) : "none"}.
          </KeyResult>
        </div>
        <ControlStack label="Distance controls">
          <LengthField
            label="Source to the near mic"
            lengthM={state.nearM}
            minM={LIMITS.micDistanceM.min}
            maxM={LIMITS.micDistanceM.max}
            system={system}
            onChange={(nextNearM) => update({ nearM: nextNearM, farM: Math.max(state.farM, nextNearM) })}
            testId="near-distance"
          />
          <LengthField
            label="Source to the far mic"
            lengthM={state.farM}
            minM={LIMITS.micDistanceM.min}
            maxM={LIMITS.micDistanceM.max}
            system={system}
            onChange={(nextFarM) => update({ farM: nextFarM, nearM: Math.min(state.nearM, nextFarM) })}
            testId="far-distance"
          />
          <TemperatureField temperatureC={state.temperatureC} system={system} onChange={(temperatureC) => update({ temperatureC })} />
          <Readouts
            items={[
              { label: "Distance ratio", value: `${formatNumber(ratio, 2)} : 1`, testId: "distance-ratio" },
              { label: "Far mic level re near", value: formatDb(levelDifferenceDb, { digits: 2 }), testId: "level-difference" },
              { label: "Delay", value: `${formatNumber(pathDelayMs, 3)} ms`, testId: "delay-ms" },
              { label: "Peak of the sum", value: formatDb(extremes.peakDb, { signed: true, digits: 2 }), testId: "comb-peak" },
              { label: "Deepest dip", value: formatDb(extremes.notchDb, { digits: 2 }), testId: "comb-dip" },
            ]}
          />
          <p className="text-body-sm text-ink">
            <span className="font-semibold">Notches:</span> <span data-testid="notch-list" className="font-mono">{notchText}</span>
          </p>
        </ControlStack>
      </FigureColumns>
      <p className="text-body-sm text-ink" data-testid="three-to-one">
        <strong>The 3:1 guideline</strong> (common practice): keep the second mic at least three times as far from the source as the first. {comparisonWithThreeToOne(ratio, system, nearM)}
      </p>
    </FigureFrame>
  );
}
