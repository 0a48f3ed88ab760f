"use client";
// Noise dose: a show day's schedule as NIOSH and OSHA dose, 8-hour TWA and time left at a chosen
// level. Numbers: lib/acoustics noiseDose, permissibleExposureHours, EXPOSURE_CRITERIA.
import { useId } from "react";
import { EXPOSURE_CRITERIA, noiseDose, permissibleExposureHours, type ExposureStandard } from "@/lib/acoustics";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { FIGURE_META } from "./figure-meta";
import { LIMITS, NOISE_DOSE_DEFAULTS, type NoiseDoseState, type NoiseSegmentState } from "./figure-state";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatHours, formatNumber } from "./parts/format";
import { NumberField } from "./parts/number-field";
import { RangeField } from "./parts/range-field";
import { KeyResult } from "./parts/readouts";
import { useFigureState } from "./parts/use-figure-state";
import { DoseBars, DoseResults, leftText } from "./noise-dose-bars";
import { OSHA_THRESHOLD_DBA, remainingHoursAt } from "./noise-dose-math";

export interface NoiseDoseFigureProps {
  initialState?: Partial<NoiseDoseState>;
  onStateChange?: (state: NoiseDoseState) => void;
}

const STANDARDS: ReadonlyArray<{ id: ExposureStandard; label: string; thresholdDba?: number }> = [
  { id: "niosh", label: "NIOSH REL" },
  { id: "osha", label: "OSHA PEL", thresholdDba: OSHA_THRESHOLD_DBA },
];

function doseFor(segments: readonly NoiseSegmentState[], standard: ExposureStandard, thresholdDba?: number) {
  return noiseDose({ segments, standard, thresholdDba });
}

export function NoiseDoseFigure({ initialState, onStateChange }: NoiseDoseFigureProps) {
  const [state, update] = useFigureState(NOISE_DOSE_DEFAULTS, initialState, onStateChange);
  const tableId = useId();
  const results = STANDARDS.map((standard) => {
    const dose = doseFor(state.segments, standard.id, standard.thresholdDba);
    return { ...standard, ...dose, remainingHours: remainingHoursAt({ dosePercent: dose.dosePercent, levelDba: state.nextLevelDba, standard: standard.id }) };
  });
  const [niosh, osha] = results;
  const totalHours = state.segments.reduce((sum, segment) => sum + segment.hours, 0);
  const overCeiling = state.segments.filter((segment) => segment.levelDba > EXPOSURE_CRITERIA.osha.ceilingDba);
  const setSegment = (index: number, patch: Partial<NoiseSegmentState>) =>
    update({ segments: state.segments.map((segment, position) => (position === index ? { ...segment, ...patch } : segment)) });
  const description =
    `Noise dose for ${state.segments.length} segments over ${formatHours(totalHours)}: NIOSH ${formatNumber(niosh.dosePercent, 0)} %, OSHA ${formatNumber(osha.dosePercent, 0)} %. ` +
    `Time left at ${formatNumber(state.nextLevelDba, 0)} dBA: NIOSH ${leftText(niosh.remainingHours)}, OSHA ${leftText(osha.remainingHours)}.`;

  return (
    <FigureFrame name="noise-dose" title={FIGURE_META["noise-dose"].title} summary="Occupational limits for a working day; they are not a promise of safe hearing.">
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <DoseBars results={results.map((result) => ({ label: result.label, dosePercent: result.dosePercent }))} description={description} />
          <KeyResult testId="noise-key-result">
            NIOSH dose <strong>{formatNumber(niosh.dosePercent, 0)} %</strong>, OSHA dose <strong>{formatNumber(osha.dosePercent, 0)} %</strong>.{" "}
            {niosh.remainingHours > 0
              ? `At ${formatNumber(state.nextLevelDba, 0)} dBA you could stay ${formatHours(niosh.remainingHours)} more under NIOSH.`
              : `The NIOSH allowance for the day is used up${osha.remainingHours > 0 ? `; OSHA would allow ${formatHours(osha.remainingHours)} more at ${formatNumber(state.nextLevelDba, 0)} dBA` : ""}.`}
          </KeyResult>
          <DoseResults results={results} nextLevelDba={state.nextLevelDba} />
        </div>
        <ControlStack label="Show schedule">
          <table className="w-full border-collapse text-body-sm" aria-describedby={`${tableId}-caption`}>
            <caption id={`${tableId}-caption`} className="mb-1 text-left font-semibold text-ink">
              Schedule: level and time of each part of the day
            </caption>
            <thead>
              <tr className="text-left text-caption text-ink-muted">
                <th scope="col" className="pb-1 font-semibold" id={`${tableId}-level`}>
                  Level, dBA
                </th>
                <th scope="col" className="pb-1 font-semibold" id={`${tableId}-hours`}>
                  Hours
                </th>
                <th scope="col" className="pb-1 text-right font-semibold">
                  NIOSH allows
                </th>
                <th scope="col" className="pb-1">
                  <span className="sr-only">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {state.segments.map((segment, index) => (
                <tr key={index} className="border-t border-rule">
                  <td className="py-1 pr-2">
                    <NumberField
                      id={`${tableId}-level-${index}`}
                      aria-label={`Segment ${index + 1} level, dBA`}
                      value={segment.levelDba}
                      min={LIMITS.noiseLevelDba.min}
                      max={LIMITS.noiseLevelDba.max}
                      step={1}
                      onChange={(levelDba) => setSegment(index, { levelDba })}
                      testId={`segment-level-${index}`}
                      className="max-w-20"
                    />
                  </td>
                  <td className="py-1 pr-2">
                    <NumberField
                      id={`${tableId}-hours-${index}`}
                      aria-label={`Segment ${index + 1} hours`}
                      value={segment.hours}
                      min={LIMITS.noiseHours.min}
                      max={LIMITS.noiseHours.max}
                      step={0.25}
                      onChange={(hours) => setSegment(index, { hours })}
                      testId={`segment-hours-${index}`}
                      className="max-w-20"
                    />
                  </td>
                  <td className="py-1 text-right font-mono">{formatHours(permissibleExposureHours({ levelDba: segment.levelDba, standard: "niosh" }))}</td>
                  <td className="py-1 pl-2 text-right">
                    <Button
                      variant="ghost"
                      size="sm"
                      aria-label={`Remove segment ${index + 1}`}
                      disabled={state.segments.length <= LIMITS.noiseSegments.min}
                      onClick={() => update({ segments: state.segments.filter((_, position) => position !== index) })}
                    >
                      ✕
                    </Button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <Button
            variant="secondary"
            size="sm"
            className="self-start"
            disabled={state.segments.length >= LIMITS.noiseSegments.max}
            onClick={() => update({ segments: [...state.segments, { levelDba: 90, hours: 0.5 }] })}
          >
            Add a segment
          </Button>
          <RangeField
            label="Time left if you stay at"
            min={LIMITS.noiseLevelDba.min}
            max={120}
            step={1}
            value={state.nextLevelDba}
            valueText={`${formatNumber(state.nextLevelDba, 0)} dBA`}
            onChange={(nextLevelDba) => update({ nextLevelDba })}
            testId="next-level"
          />
          <p className="text-caption text-ink-muted">
            NIOSH: 85 dBA for 8 h, 3 dB exchange rate. OSHA: 90 dBA for 8 h, 5 dB exchange rate, counting levels from {OSHA_THRESHOLD_DBA} dBA up.
          </p>
        </ControlStack>
      </FigureColumns>
      {overCeiling.length > 0 && (
        <Notice tone="danger" title={`above ${EXPOSURE_CRITERIA.osha.ceilingDba} dBA`}>
          OSHA permits no unprotected exposure to continuous noise above {EXPOSURE_CRITERIA.osha.ceilingDba} dBA.
        </Notice>
      )}
      <Notice tone="caution" title="protect your hearing">
        These limits are for a working day and still leave some people with hearing loss. Wear hearing protection that fits (and check the fit), measure with a calibrated meter set to A-weighting and slow
        response, take quiet breaks, and follow the venue&apos;s rules and local regulations, which may be stricter. Ringing ears or dull hearing after a show are a warning.
      </Notice>
    </FigureFrame>
  );
}
