"use client";
// Direct box: an ideal N:1 transformer between an instrument and a mic preamp. The level change,
// the load reflected to the instrument and the source impedance the preamp sees all come from
// lib/acoustics transformer() and reflectedImpedanceOhms() (ideal-transformer relations).
import { reflectedImpedanceOhms, transformer } from "@/lib/acoustics";
import { Checkbox } from "@/components/ui/checkbox";
import { Notice } from "@/components/ui/notice";
import { DirectBoxSketch } from "./direct-box-sketch";
import { FIGURE_META } from "./figure-meta";
import { DIRECT_BOX_DEFAULTS, LIMITS, type DirectBoxState } from "./figure-state";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatDb, formatNumber, formatOhms } from "./parts/format";
import { RangeField, roundSeries, SeriesRangeField } from "./parts/range-field";
import { KeyResult, Readouts } from "./parts/readouts";
import { useFigureState } from "./parts/use-figure-state";

/** A load at least ten times the source impedance barely loads it ("bridging"; common practice). */
const BRIDGING_FACTOR = 10;

const SOURCE_IMPEDANCE_SERIES = roundSeries(LIMITS.sourceImpedanceOhms.min, LIMITS.sourceImpedanceOhms.max, [1, 1.5, 2.2, 3.3, 4.7, 6.8]);
const PREAMP_IMPEDANCE_SERIES = roundSeries(LIMITS.preampInputOhms.min, LIMITS.preampInputOhms.max, [1, 1.2, 1.5, 2, 2.2, 2.5, 3, 4, 5, 6, 8]);

export interface DirectBoxFigureProps {
  initialState?: Partial<DirectBoxState>;
  onStateChange?: (state: DirectBoxState) => void;
}

export function DirectBoxFigure({ initialState, onStateChange }: DirectBoxFigureProps) {
  const [state, update] = useFigureState(DIRECT_BOX_DEFAULTS, initialState, onStateChange);
  const { voltageChangeDb, impedanceRatio } = transformer({ turnsRatio: state.turnsRatio });
  const preampLevelDbu = state.sourceLevelDbu + voltageChangeDb;
  const reflectedLoadOhms = reflectedImpedanceOhms({ turnsRatio: state.turnsRatio, loadOhms: state.preampInputOhms });
  // Seen from the secondary the transformer is 1:N, so the source impedance is reflected by (1/N)².
  const sourceSeenByPreampOhms = reflectedImpedanceOhms({ turnsRatio: 1 / state.turnsRatio, loadOhms: state.sourceImpedanceOhms });
  const loadRatio = reflectedLoadOhms / state.sourceImpedanceOhms;
  const bridging = loadRatio >= BRIDGING_FACTOR;
  const ratioText = `${formatNumber(state.turnsRatio, state.turnsRatio % 1 === 0 ? 0 : 1)}:1`;
  const description =
    `An instrument at ${formatDb(state.sourceLevelDbu, { unit: "dBu", digits: 0 })} with ${formatOhms(state.sourceImpedanceOhms)} source impedance, through a ${ratioText} DI transformer ` +
    `to a preamp input of ${formatOhms(state.preampInputOhms)}. The preamp receives ${formatDb(preampLevelDbu, { unit: "dBu" })}; the instrument sees a load of ${formatOhms(reflectedLoadOhms)}. ` +
    `Ground lift ${state.groundLift ? "on: pin 1 is disconnected at the DI output" : "off: pin 1 is connected"}.`;

  return (
    <FigureFrame name="direct-box" title={FIGURE_META["direct-box"].title} summary="An ideal transformer: real ones lose a little to winding resistance and core losses.">
      <DirectBoxSketch
        sourceLevelDbu={state.sourceLevelDbu}
        sourceImpedanceOhms={state.sourceImpedanceOhms}
        preampLevelDbu={preampLevelDbu}
        preampInputOhms={state.preampInputOhms}
        reflectedLoadOhms={reflectedLoadOhms}
        turnsRatio={state.turnsRatio}
        groundLift={state.groundLift}
        description={description}
      />
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <KeyResult testId="direct-box-key-result">
            Through {ratioText}, the preamp gets <strong>{formatDb(preampLevelDbu, { unit: "dBu" })}</strong> and the instrument sees{" "}
            <strong>{formatOhms(reflectedLoadOhms)}</strong>, {formatNumber(loadRatio, 1)} times its own impedance ({bridging ? "a light load" : "enough to load it down"}).
          </KeyResult>
          <Readouts
            items={[
              { label: "Transformer level change", value: formatDb(voltageChangeDb, { signed: true, digits: 2 }), testId: "di-voltage-change" },
              { label: "Level at the preamp", value: formatDb(preampLevelDbu, { unit: "dBu", digits: 2 }), testId: "level-at-preamp" },
              { label: "Impedance ratio", value: `${formatNumber(impedanceRatio, 0)} : 1`, testId: "impedance-ratio" },
              { label: "Load on the instrument", value: formatOhms(reflectedLoadOhms), testId: "reflected-load" },
              { label: "Source impedance the preamp sees", value: formatOhms(sourceSeenByPreampOhms), testId: "source-seen-by-preamp" },
              {
                label: "Load ÷ source impedance",
                value: `${formatNumber(loadRatio, 1)}× (${bridging ? "bridging" : "loading"})`,
                testId: "load-ratio",
                tone: bridging ? "good" : "bad",
              },
            ]}
          />
          <p className="text-caption text-ink-muted">
            A load of at least ten times the source impedance leaves the source almost unloaded (common practice). A passive pickup&apos;s impedance rises a lot in the treble, so it wants a much higher load than its nominal figure suggests.
          </p>
        </div>
        <ControlStack label="Direct box controls">
          <RangeField
            label="Instrument output level"
            min={LIMITS.sourceLevelDbu.min}
            max={LIMITS.sourceLevelDbu.max}
            step={1}
            value={state.sourceLevelDbu}
            valueText={formatDb(state.sourceLevelDbu, { unit: "dBu", digits: 0 })}
            onChange={(sourceLevelDbu) => update({ sourceLevelDbu })}
            testId="source-level"
          />
          <SeriesRangeField
            label="Instrument source impedance"
            series={SOURCE_IMPEDANCE_SERIES}
            value={state.sourceImpedanceOhms}
            valueText={formatOhms(state.sourceImpedanceOhms)}
            onChange={(sourceImpedanceOhms) => update({ sourceImpedanceOhms })}
            hint="A passive pickup is many kilohms; a keyboard or active output is usually under 1 kΩ."
            testId="source-impedance"
          />
          <RangeField
            label="Transformer turns ratio N (N:1)"
            min={LIMITS.turnsRatio.min}
            max={LIMITS.turnsRatio.max}
            step={1}
            value={state.turnsRatio}
            valueText={ratioText}
            onChange={(turnsRatio) => update({ turnsRatio })}
            testId="turns-ratio"
          />
          <SeriesRangeField
            label="Preamp input impedance"
            series={PREAMP_IMPEDANCE_SERIES}
            value={state.preampInputOhms}
            valueText={formatOhms(state.preampInputOhms)}
            onChange={(preampInputOhms) => update({ preampInputOhms })}
            testId="preamp-impedance"
          />
          <Checkbox label="Ground lift (pin 1 lifted at the DI output)" checked={state.groundLift} onChange={(event) => update({ groundLift: event.currentTarget.checked })} data-testid="ground-lift" />
        </ControlStack>
      </FigureColumns>
      <div className="flex flex-col gap-3 text-body-sm text-ink">
        <p>
          <strong>What the ground lift does.</strong> A hum loop forms when the instrument&apos;s amp and the console are both earthed at their mains plugs and the cable shield joins them a second time. The lift
          switch opens the shield (pin 1) of the DI&apos;s balanced output, so the audio shield no longer closes that loop. The transformer still carries the signal, because it has no wire between its two sides.
        </p>
        <Notice tone="caution" title="never lift the mains safety earth">
          The ground-lift switch only breaks the audio shield. The safety earth of every mains-powered instrument, amp and console must stay connected: never remove an earth pin, never use an adaptor
          that defeats it, and never tape over it. If hum persists, have the power distribution checked by a qualified electrician and follow local electrical codes and the venue&apos;s rules.
        </Notice>
      </div>
    </FigureFrame>
  );
}
