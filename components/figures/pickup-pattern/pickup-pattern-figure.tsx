"use client";
// Pickup-pattern explorer: presets and a continuous A, three sources around the mic with their
// level relative to on axis, and the pattern's figures of merit. All numbers: lib/acoustics.
import { PICKUP_PATTERN_IDS, PICKUP_PATTERNS, patternFigures, patternLevelDb, type PickupPatternId } from "@/lib/acoustics";
import { FIGURE_META } from "../figure-meta";
import { PICKUP_PATTERN_DEFAULTS, patternCoefficient, patternForCoefficient, type PickupPatternState } from "../figure-state";
import { ChoiceGroup } from "../parts/choice-group";
import { ControlStack, FigureColumns, FigureFrame } from "../parts/figure-frame";
import { describeBearing, formatDb, formatDegrees, formatNumber } from "../parts/format";
import { RangeField } from "../parts/range-field";
import { KeyResult, Readouts } from "../parts/readouts";
import { PATTERN_SHORT_LABELS } from "../parts/pattern-labels";
import { useFigureState } from "../parts/use-figure-state";
import { PatternFiguresList } from "./pattern-figures-table";
import { PolarPlot, type PolarSource } from "./polar-plot";


const SOURCES = [
  { id: "voice", key: "voiceDeg", mark: "V", label: "Voice" },
  { id: "wedge", key: "wedgeDeg", mark: "W", label: "Monitor wedge" },
  { id: "cymbal", key: "cymbalDeg", mark: "C", label: "Cymbal" },
] as const;

export interface PickupPatternFigureProps {
  initialState?: Partial<PickupPatternState>;
  onStateChange?: (state: PickupPatternState) => void;
  /** Lesson shorthand: a starting pattern id, as in PICKUP_PATTERNS. */
  pattern?: string;
}

function isPatternId(value: string | undefined): value is PickupPatternId {
  return value !== undefined && (PICKUP_PATTERN_IDS as readonly string[]).includes(value);
}

function startingState(props: PickupPatternFigureProps): Partial<PickupPatternState> | undefined {
  if (!isPatternId(props.pattern)) return props.initialState;
  return { pattern: props.pattern, a: PICKUP_PATTERNS[props.pattern].a, ...props.initialState };
}

function patternName(state: PickupPatternState, a: number): string {
  return state.pattern === "custom" ? `Custom pattern (A = ${formatNumber(a, 2)})` : PATTERN_SHORT_LABELS[state.pattern];
}

export function PickupPatternFigure(props: PickupPatternFigureProps) {
  const [state, update] = useFigureState(PICKUP_PATTERN_DEFAULTS, startingState(props), props.onStateChange);
  const a = patternCoefficient(state.pattern, state.a);
  const figures = patternFigures({ a });
  const sources: PolarSource[] = SOURCES.map((source) => ({
    id: source.id,
    mark: source.mark,
    label: source.label,
    angleDeg: state[source.key],
    levelDb: patternLevelDb({ a, angleDeg: state[source.key] }),
  }));
  const [voice, wedge, cymbal] = sources;
  const name = patternName(state, a);
  const description =
    `Polar plot of a ${name.toLowerCase()}, A = ${formatNumber(a, 3)}, in dB relative to on axis. ` +
    sources.map((source) => `${source.label} at ${formatDegrees(source.angleDeg)} (${describeBearing(source.angleDeg)}): ${formatDb(source.levelDb)}.`).join(" ") +
    (figures.nullAnglesDeg.length > 0 ? ` Nulls at ${figures.nullAnglesDeg.map((angleDeg) => formatDegrees(angleDeg)).join(" and ")}.` : " No null.");

  return (
    <FigureFrame name="pickup-pattern" title={FIGURE_META["pickup-pattern"].title} summary="Level of each source relative to the same source on axis.">
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <PolarPlot
            a={a}
            nullAnglesDeg={figures.nullAnglesDeg}
            sources={sources}
            description={description}
            onMoveSource={(id, angleDeg) => {
              const source = SOURCES.find((entry) => entry.id === id);
              if (source) update({ [source.key]: angleDeg });
            }}
          />
          <p className="text-caption text-ink-muted">
            Rings every 6 dB down to −24 dB; the centre is −30 dB or less.{figures.invertedAt180 ? " Dashed: the rear lobe, with inverted polarity." : ""}
          </p>
          <KeyResult testId="pattern-key-result">
            {name}: the wedge arrives at <strong>{formatDb(wedge.levelDb)}</strong>, the cymbal at <strong>{formatDb(cymbal.levelDb)}</strong> and the voice
            at <strong>{formatDb(voice.levelDb)}</strong>, relative to on axis.
          </KeyResult>
          <Readouts
            label="Source levels relative to on axis"
            items={sources.map((source) => ({
              label: `${source.label} (${formatDegrees(source.angleDeg)})`,
              value: formatDb(source.levelDb, { signed: true }),
              testId: `source-level-${source.id}`,
            }))}
          />
        </div>
        <ControlStack label="Pattern and source controls">
          <ChoiceGroup
            legend="Pattern"
            options={PICKUP_PATTERN_IDS.map((id) => ({ value: id, label: PATTERN_SHORT_LABELS[id] }))}
            value={state.pattern}
            onChange={(pattern) => update({ pattern, a: PICKUP_PATTERNS[pattern].a })}
            testId="pattern-choice"
          />
          <RangeField
            label="Omni share A"
            min={0}
            max={1}
            step={0.01}
            value={a}
            valueText={`A = ${formatNumber(a, 3)}, B = ${formatNumber(figures.b, 3)}`}
            onChange={(nextA) => update({ a: nextA, pattern: patternForCoefficient(nextA) })}
            hint="A + B = 1: 1 is omni, 0.5 cardioid, 0 figure-8."
            testId="pattern-a"
          />
          {state.pattern !== "custom" && <p className="text-body-sm text-ink-muted">{PICKUP_PATTERNS[state.pattern].description}</p>}
          {SOURCES.map((source) => (
            <RangeField
              key={source.id}
              label={`${source.label} bearing`}
              min={0}
              max={355}
              step={5}
              value={state[source.key]}
              valueText={`${formatDegrees(state[source.key])}, ${describeBearing(state[source.key])}`}
              onChange={(angleDeg) => update({ [source.key]: angleDeg })}
              testId={`source-angle-${source.id}`}
            />
          ))}
          <p className="text-caption text-ink-muted">0° is straight in front of the mic, 180° behind it; bearings go clockwise seen from above. You can also drag V, W and C on the plot.</p>
        </ControlStack>
      </FigureColumns>
      <section aria-label="Figures of merit" className="flex flex-col gap-2">
        <p className="text-body font-semibold text-ink">Figures of merit</p>
        <PatternFiguresList figures={figures} />
      </section>
    </FigureFrame>
  );
}
