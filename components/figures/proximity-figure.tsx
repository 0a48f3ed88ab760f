"use client";
// Proximity effect: the ideal on-axis bass boost near a point source, per pattern, 20 Hz–20 kHz.
// Every number: lib/acoustics (proximityBoostDb, proximityCornerHz, proximityResponseCurve, speedOfSoundMs).
import { PICKUP_PATTERN_IDS, PICKUP_PATTERNS, proximityBoostDb, proximityCornerHz, proximityResponseCurve, speedOfSoundMs, type PickupPatternId } from "@/lib/acoustics";
import { FIGURE_META } from "./figure-meta";
import { LIMITS, PROXIMITY_DEFAULTS, type ProximityState } from "./figure-state";
import { ChoiceGroup } from "./parts/choice-group";
import { formatLength } from "./parts/display-units";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatDb, formatFrequency, formatNumber } from "./parts/format";
import { FrequencyPlot } from "./parts/frequency-plot";
import { PATTERN_SHORT_LABELS } from "./parts/pattern-labels";
import { KeyResult, Readouts } from "./parts/readouts";
import { LengthField, TemperatureField } from "./parts/unit-fields";
import { useFigureState } from "./parts/use-figure-state";
import { useUnitSystem } from "./units-preference";

/** The frequency at which the boost is quoted, Hz (the lessons and their tests quote it at 100 Hz). */
const QUOTED_HZ = 100;

export interface ProximityFigureProps {
  initialState?: Partial<ProximityState>;
  onStateChange?: (state: ProximityState) => void;
  /** Lesson shorthand: the starting distance, metres. */
  distanceM?: number;
  /** Lesson shorthand: the starting pattern id. */
  pattern?: string;
}

function startingState({ initialState, distanceM, pattern }: ProximityFigureProps): Partial<ProximityState> {
  const start: Partial<ProximityState> = {};
  if (typeof distanceM === "number" && distanceM >= LIMITS.proximityDistanceM.min && distanceM <= LIMITS.proximityDistanceM.max) start.distanceM = distanceM;
  if (pattern && (PICKUP_PATTERN_IDS as readonly string[]).includes(pattern)) start.pattern = pattern as PickupPatternId;
  return { ...start, ...initialState };
}

export function ProximityFigure(props: ProximityFigureProps) {
  const system = useUnitSystem();
  const [state, update] = useFigureState(PROXIMITY_DEFAULTS, startingState(props), props.onStateChange);
  const speedMs = speedOfSoundMs({ temperatureC: state.temperatureC });
  const selectedA = PICKUP_PATTERNS[state.pattern].a;
  const boostDb = proximityBoostDb({ a: selectedA, distanceM: state.distanceM, frequencyHz: QUOTED_HZ, speedOfSoundMs: speedMs });
  const cornerHz = proximityCornerHz({ a: selectedA, distanceM: state.distanceM, speedOfSoundMs: speedMs });
  const perPattern = PICKUP_PATTERN_IDS.map((id) => ({
    id,
    boostDb: proximityBoostDb({ a: PICKUP_PATTERNS[id].a, distanceM: state.distanceM, frequencyHz: QUOTED_HZ, speedOfSoundMs: speedMs }),
    curve: proximityResponseCurve({ a: PICKUP_PATTERNS[id].a, distanceM: state.distanceM, speedOfSoundMs: speedMs, points: 160 }),
  }));
  const topBoostDb = Math.max(...perPattern.map((entry) => entry.curve[0].boostDb));
  const maxDb = Math.min(60, Math.max(12, Math.ceil(topBoostDb / 6) * 6));
  const name = PATTERN_SHORT_LABELS[state.pattern];
  const distanceText = formatLength(state.distanceM, system);
  const cornerText = cornerHz > 0 ? `The boost passes 3 dB below ${formatFrequency(cornerHz)}.` : "An ideal omni has no proximity effect.";
  const description =
    `On-axis bass boost from 20 Hz to 20 kHz at ${distanceText} from a point source. Highlighted: ${name}, ${formatDb(boostDb, { signed: true })} at 100 Hz. ` +
    `Other patterns at 100 Hz: ${perPattern.filter((entry) => entry.id !== state.pattern).map((entry) => `${PATTERN_SHORT_LABELS[entry.id]} ${formatDb(entry.boostDb, { signed: true })}`).join(", ")}.`;

  return (
    <FigureFrame name="proximity" title={FIGURE_META.proximity.title} summary="Ideal boost relative to the same mic far away; real mics roll off some of it." usesUnits>
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <FrequencyPlot
            testId="proximity-plot"
            description={description}
            minDb={0}
            maxDb={maxDb}
            gridStepDb={maxDb > 30 ? 12 : 6}
            traces={[
              ...perPattern
                .filter((entry) => entry.id !== state.pattern)
                .map((entry) => ({
                  id: entry.id,
                  points: entry.curve.map((sample) => ({ frequencyHz: sample.frequencyHz, levelDb: sample.boostDb })),
                  color: "var(--color-border, currentColor)",
                  width: 1.5,
                  dashed: true,
                })),
              {
                id: state.pattern,
                points: perPattern.find((entry) => entry.id === state.pattern)!.curve.map((sample) => ({ frequencyHz: sample.frequencyHz, levelDb: sample.boostDb })),
                color: "var(--color-trace-1, currentColor)",
                width: 3.5,
              },
            ]}
          />
          <p className="text-caption text-ink-muted">Solid: {name}. Dashed: the other patterns (highest is the figure-8, flat at 0 dB is the omni).</p>
          <KeyResult testId="proximity-key-result">
            {name} at {distanceText}: <strong>{formatDb(boostDb, { signed: true })}</strong> at 100 Hz. {cornerText}
          </KeyResult>
          <Readouts
            items={[
              { label: "Boost at 100 Hz", value: formatDb(boostDb, { signed: true, digits: 2 }), testId: "boost-100hz" },
              { label: "3 dB point", value: cornerHz > 0 ? formatFrequency(cornerHz) : "none", testId: "corner-hz" },
              { label: "Speed of sound", value: `${formatNumber(speedMs, 1)} m/s`, testId: "speed-of-sound" },
            ]}
          />
        </div>
        <ControlStack label="Proximity controls">
          <ChoiceGroup
            legend="Pattern"
            options={PICKUP_PATTERN_IDS.map((id) => ({ value: id, label: PATTERN_SHORT_LABELS[id] }))}
            value={state.pattern}
            onChange={(pattern) => update({ pattern })}
            testId="proximity-pattern"
          />
          <LengthField
            label="Distance from the source"
            lengthM={state.distanceM}
            minM={LIMITS.proximityDistanceM.min}
            maxM={LIMITS.proximityDistanceM.max}
            system={system}
            onChange={(distanceM) => update({ distanceM })}
            testId="proximity-distance"
          />
          <TemperatureField temperatureC={state.temperatureC} system={system} onChange={(temperatureC) => update({ temperatureC })} />
          <Readouts
            label="Boost at 100 Hz, every pattern"
            items={perPattern.map((entry) => ({
              label: PATTERN_SHORT_LABELS[entry.id],
              value: formatDb(entry.boostDb, { signed: true }),
              testId: `boost-100hz-${entry.id}`,
            }))}
          />
        </ControlStack>
      </FigureColumns>
    </FigureFrame>
  );
}
