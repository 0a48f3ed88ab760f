"use client";
// Feedback margin: potential acoustic gain against needed acoustic gain (Ballou, Handbook for
// Sound Engineers, ch. 34). Numbers: lib/acoustics potentialAcousticGainDb, neededAcousticGainDb.
import { neededAcousticGainDb, potentialAcousticGainDb } from "@/lib/acoustics";
import { Notice } from "@/components/ui/notice";
import { FeedbackStagePlan } from "./feedback-stage-plan";
import { FIGURE_META } from "./figure-meta";
import { FEEDBACK_MARGIN_DEFAULTS, FEEDBACK_STABILITY_MARGIN_DB, LIMITS, type FeedbackMarginState } from "./figure-state";
import { ChoiceGroup } from "./parts/choice-group";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatDb } from "./parts/format";
import { RangeField } from "./parts/range-field";
import { KeyResult, Readouts } from "./parts/readouts";
import { LengthField } from "./parts/unit-fields";
import { useFigureState } from "./parts/use-figure-state";
import { useUnitSystem } from "./units-preference";

export interface FeedbackMarginFigureProps {
  initialState?: Partial<FeedbackMarginState>;
  onStateChange?: (state: FeedbackMarginState) => void;
}

export function FeedbackMarginFigure({ initialState, onStateChange }: FeedbackMarginFigureProps) {
  const system = useUnitSystem();
  const [state, update] = useFigureState(FEEDBACK_MARGIN_DEFAULTS, initialState, onStateChange);
  const criticalDistanceM = state.room === "indoor" ? state.criticalDistanceM : undefined;
  const pagDb = potentialAcousticGainDb({
    dsM: state.dsM,
    d0M: state.d0M,
    d1M: state.d1M,
    d2M: state.d2M,
    openMics: state.openMics,
    stabilityMarginDb: FEEDBACK_STABILITY_MARGIN_DB,
    criticalDistanceM,
  });
  const nagDb = neededAcousticGainDb({ d0M: state.d0M, eadM: state.eadM, criticalDistanceM });
  const marginDb = pagDb - nagDb;
  const stable = marginDb >= 0;
  const verdict = stable ? "enough gain before feedback" : "not enough gain: it will ring or feed back before it is loud enough";
  const description =
    `Stage plan, not to scale, ${state.room === "indoor" ? "indoors" : "outdoors"}. PAG ${formatDb(pagDb)}, NAG ${formatDb(nagDb)}, margin ${formatDb(marginDb, { signed: true })}: ${verdict}.`;
  const length = (key: "dsM" | "d0M" | "d1M" | "d2M" | "eadM" | "criticalDistanceM", label: string, minM: number, maxM: number, hint?: string) => (
    <LengthField label={label} lengthM={state[key]} minM={minM} maxM={maxM} system={system} onChange={(value) => update({ [key]: value })} hint={hint} testId={`feedback-${key}`} />
  );
  const { min, max } = LIMITS.feedbackDistanceM;

  return (
    <FigureFrame name="feedback-margin" title={FIGURE_META["feedback-margin"].title} summary="One talker, one loudspeaker, one listener; the 6 dB stability margin is built in." usesUnits>
      <FeedbackStagePlan dsM={state.dsM} d0M={state.d0M} d1M={state.d1M} d2M={state.d2M} eadM={state.eadM} indoor={state.room === "indoor"} system={system} description={description} />
      <p className="-mt-2 text-center text-caption text-ink-muted">Stage plan from above, not to scale.</p>
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <KeyResult testId="feedback-key-result">
            PAG <strong>{formatDb(pagDb)}</strong> against NAG <strong>{formatDb(nagDb)}</strong>: a margin of <strong>{formatDb(marginDb, { signed: true })}</strong>, {verdict}.
          </KeyResult>
          <GainBars pagDb={pagDb} nagDb={nagDb} />
          <Readouts
            items={[
              { label: "Potential acoustic gain (PAG)", value: formatDb(pagDb, { digits: 2 }), testId: "pag" },
              { label: "Needed acoustic gain (NAG)", value: formatDb(nagDb, { digits: 2 }), testId: "nag" },
              { label: "Margin (PAG − NAG)", value: `${formatDb(marginDb, { signed: true, digits: 2 })} (${stable ? "stable" : "short"})`, testId: "feedback-margin", tone: stable ? "good" : "bad" },
            ]}
          />
          <p className="text-caption text-ink-muted">
            To gain margin: bring the mic closer to the talker (Dₛ), move the loudspeaker away from the mic (D₁), or accept a larger EAD. Each extra open mic costs 10·log10 NOM.
          </p>
        </div>
        <ControlStack label="Stage plan distances">
          <ChoiceGroup
            legend="Where"
            options={[
              { value: "indoor", label: "Indoors" },
              { value: "outdoor", label: "Outdoors (free field)" },
            ]}
            value={state.room}
            onChange={(room) => update({ room })}
            testId="feedback-room"
          />
          {length("dsM", "Talker to mic (Dₛ)", 0.02, 5)}
          {length("d1M", "Mic to loudspeaker (D₁)", min, max)}
          {length("d2M", "Loudspeaker to farthest listener (D₂)", min, max)}
          {length("d0M", "Talker to farthest listener (D₀)", min, max)}
          {length("eadM", "Equivalent acoustic distance (EAD)", min, max, "How close the farthest listener should seem to be to the talker.")}
          {state.room === "indoor" &&
            length("criticalDistanceM", "Critical distance of the room (Dc)", LIMITS.criticalDistanceM.min, LIMITS.criticalDistanceM.max, "Where direct and reverberant sound are equal.")}
          <RangeField
            label="Open mics (NOM)"
            min={LIMITS.openMics.min}
            max={LIMITS.openMics.max}
            step={1}
            value={state.openMics}
            valueText={String(state.openMics)}
            onChange={(openMics) => update({ openMics })}
            testId="feedback-open-mics"
          />
        </ControlStack>
      </FigureColumns>
      <Notice tone="caution" title="feedback is loud">
        Ringing and runaway feedback can reach levels that damage hearing and loudspeakers. Bring gain up slowly, keep a hand on the master mute, and wear hearing protection while ringing out a system.
      </Notice>
    </FigureFrame>
  );
}

/** PAG and NAG as two horizontal bars on one dB scale. */
function GainBars({ pagDb, nagDb }: { pagDb: number; nagDb: number }) {
  const maxDb = Math.max(10, Math.ceil(Math.max(pagDb, nagDb, 0) / 10) * 10);
  const minDb = Math.min(0, Math.floor(Math.min(pagDb, nagDb) / 10) * 10);
  const x = (levelDb: number) => 60 + (400 * (levelDb - minDb)) / (maxDb - minDb);
  const bars = [
    { label: "PAG", valueDb: pagDb, y: 8, color: "var(--color-trace-2, currentColor)" },
    { label: "NAG", valueDb: nagDb, y: 40, color: "var(--color-trace-1, currentColor)" },
  ];
  return (
    <svg viewBox="0 0 480 90" role="img" aria-label={`Bars: PAG ${formatDb(pagDb)}, NAG ${formatDb(nagDb)}.`} className="block h-auto w-full text-ink" fontFamily="inherit">
      <g aria-hidden="true">
        {bars.map((bar) => (
          <g key={bar.label}>
            <text x={50} y={bar.y + 18} fontSize={18} textAnchor="end" fill="currentColor" fontWeight={700}>
              {bar.label}
            </text>
            <rect x={Math.min(x(0), x(bar.valueDb))} y={bar.y} width={Math.abs(x(bar.valueDb) - x(0))} height={24} fill={bar.color} rx={3} />
          </g>
        ))}
        <line x1={x(0)} x2={x(0)} y1={2} y2={70} stroke="currentColor" strokeWidth={1.5} />
        <text x={x(0)} y={88} fontSize={15} textAnchor="middle" fill="var(--color-ink-muted, currentColor)">
          0 dB
        </text>
        <text x={x(maxDb)} y={88} fontSize={15} textAnchor="end" fill="var(--color-ink-muted, currentColor)">
          {`${maxDb} dB`}
        </text>
      </g>
    </svg>
  );
}
