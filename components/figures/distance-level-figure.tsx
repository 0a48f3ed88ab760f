"use client";
// Distance and level: the free-field inverse-square law (Ballou, Handbook for Sound Engineers,
// ch. 34), both ways. Numbers: lib/acoustics inverseSquareChangeDb, distanceForLevelChangeM.
import { distanceForLevelChangeM, inverseSquareChangeDb } from "@/lib/acoustics";
import { Notice } from "@/components/ui/notice";
import { DistanceLevelPlot } from "./distance-level-plot";
import { FIGURE_META } from "./figure-meta";
import { DISTANCE_LEVEL_DEFAULTS, LIMITS, type DistanceLevelState } from "./figure-state";
import { formatLength } from "./parts/display-units";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatDb } from "./parts/format";
import { RangeField } from "./parts/range-field";
import { KeyResult, Readouts } from "./parts/readouts";
import { LengthField } from "./parts/unit-fields";
import { useFigureState } from "./parts/use-figure-state";
import { useUnitSystem } from "./units-preference";

export interface DistanceLevelFigureProps {
  initialState?: Partial<DistanceLevelState>;
  onStateChange?: (state: DistanceLevelState) => void;
}

const CURVE_POINTS = 61;

export function DistanceLevelFigure({ initialState, onStateChange }: DistanceLevelFigureProps) {
  const system = useUnitSystem();
  const [state, update] = useFigureState(DISTANCE_LEVEL_DEFAULTS, initialState, onStateChange);
  const levelAt = (distanceM: number) => state.referenceLevelDb + inverseSquareChangeDb({ fromM: state.referenceM, toM: distanceM });
  const levelHereDb = levelAt(state.distanceM);
  const changeFromReferenceDb = inverseSquareChangeDb({ fromM: state.referenceM, toM: state.distanceM });
  const targetM = distanceForLevelChangeM({ fromM: state.distanceM, changeDb: state.changeDb });
  const moveM = Math.abs(targetM - state.distanceM);
  const direction = targetM < state.distanceM ? "closer" : "farther away";
  const { min, max } = LIMITS.levelDistanceM;
  // Samples for the drawing, spread evenly on the log axis; every level from the library.
  const curve = Array.from({ length: CURVE_POINTS }, (_, index) => {
    const distanceM = min * (max / min) ** (index / (CURVE_POINTS - 1));
    return { distanceM, levelDb: levelAt(distanceM) };
  });
  const targetShown = Math.min(max, Math.max(min, targetM));
  const moveText =
    state.changeDb === 0 ? "No change wanted: stay where you are." : `For ${formatDb(state.changeDb, { signed: true, digits: 0 })}, move to ${formatLength(targetM, system)}: ${formatLength(moveM, system)} ${direction}.`;
  const description =
    `Inverse-square line: ${formatDb(state.referenceLevelDb, { digits: 0 })} SPL at ${formatLength(state.referenceM, system)}; ` +
    `${formatDb(levelHereDb)} SPL at ${formatLength(state.distanceM, system)}. ${moveText}`;

  return (
    <FigureFrame name="distance-level" title={FIGURE_META["distance-level"].title} summary="A point source in the free field: 6 dB less for every doubling of distance." usesUnits>
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <DistanceLevelPlot
            curve={curve}
            reference={{ distanceM: state.referenceM, levelDb: state.referenceLevelDb }}
            current={{ distanceM: state.distanceM, levelDb: levelHereDb }}
            target={{ distanceM: targetShown, levelDb: levelAt(targetShown) }}
            system={system}
            description={description}
          />
          <p className="text-caption text-ink-muted">Square: the measurement. Filled dot: where you are. Ring: where the change takes you.</p>
          <KeyResult testId="distance-level-key-result">
            At {formatLength(state.distanceM, system)}: <strong>{formatDb(levelHereDb)} SPL</strong>. {moveText}
          </KeyResult>
          <Readouts
            items={[
              { label: "Level here", value: `${formatDb(levelHereDb, { digits: 2 })} SPL`, testId: "level-at-distance" },
              { label: "Change from the measurement", value: formatDb(changeFromReferenceDb, { signed: true, digits: 2 }), testId: "change-from-reference" },
              { label: "Distance for the change", value: formatLength(targetM, system), testId: "distance-for-change" },
              { label: "Move by", value: `${formatLength(moveM, system)} ${state.changeDb === 0 ? "" : direction}`.trim(), testId: "move-by" },
            ]}
          />
        </div>
        <ControlStack label="Distance and level controls">
          <RangeField
            label="Measured level"
            min={LIMITS.referenceLevelDb.min}
            max={LIMITS.referenceLevelDb.max}
            step={1}
            value={state.referenceLevelDb}
            valueText={`${formatDb(state.referenceLevelDb, { digits: 0 })} SPL`}
            onChange={(referenceLevelDb) => update({ referenceLevelDb })}
            testId="reference-level"
          />
          <LengthField label="Measured at" lengthM={state.referenceM} minM={0.1} maxM={10} system={system} onChange={(referenceM) => update({ referenceM })} testId="reference-distance" />
          <LengthField label="You are at" lengthM={state.distanceM} minM={min} maxM={max} system={system} onChange={(distanceM) => update({ distanceM })} testId="listener-distance" />
          <RangeField
            label="Change wanted"
            min={LIMITS.changeDb.min}
            max={LIMITS.changeDb.max}
            step={1}
            value={state.changeDb}
            valueText={formatDb(state.changeDb, { signed: true, digits: 0 })}
            onChange={(changeDb) => update({ changeDb })}
            hint="Negative is quieter (move away), positive is louder (move closer)."
            testId="change-wanted"
          />
        </ControlStack>
      </FigureColumns>
      <Notice tone="note" title="free field only">
        Indoors, beyond the room&apos;s critical distance the reverberant sound takes over and the level stops falling 6 dB per doubling. Close to a large source (a line array, a wall of cabinets) it falls more slowly too.
      </Notice>
    </FigureFrame>
  );
}
