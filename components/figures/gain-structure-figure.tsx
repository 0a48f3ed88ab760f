"use client";
// Gain structure: a mic through pad, preamp, channel fader and mix bus to the converter. Every
// level, noise, headroom and dBFS reading comes from lib/acoustics (alignment.ts,
// thermal-noise.ts, gain-structure.ts) through gain-structure-chain.ts.
import { DIGITAL_ALIGNMENTS, ALIGNMENT_IDS, type AlignmentId } from "@/lib/acoustics/alignment";
import { Checkbox } from "@/components/ui/checkbox";
import { FIGURE_META } from "./figure-meta";
import { gainStructure, type GainStructureResult } from "./gain-structure-chain";
import { GainStructurePlot } from "./gain-structure-plot";
import { GAIN_STRUCTURE_DEFAULTS, GAIN_STRUCTURE_LIMITS as LIMITS, GAIN_STRUCTURE_RIG as RIG, type GainStructureState } from "./gain-structure-state";
import { GainStructureTable } from "./gain-structure-table";
import { ChoiceGroup } from "./parts/choice-group";
import { ControlStack, FigureColumns, FigureFrame } from "./parts/figure-frame";
import { formatDb, formatNumber } from "./parts/format";
import { RangeField, roundSeries, SeriesRangeField } from "./parts/range-field";
import { KeyResult, Readouts } from "./parts/readouts";
import { useFigureState } from "./parts/use-figure-state";

export interface GainStructureFigureProps {
  initialState?: Partial<GainStructureState>;
  onStateChange?: (state: GainStructureState) => void;
}

const SENSITIVITY_SERIES = roundSeries(LIMITS.mvPerPa.min, LIMITS.mvPerPa.max);
const ALIGNMENT_OPTIONS = ALIGNMENT_IDS.map((id) => ({ value: id, label: DIGITAL_ALIGNMENTS[id].label }));

const dbu = (value: number) => formatDb(value, { unit: "dBu" });
const dbfs = (value: number) => formatDb(value, { unit: "dBFS" });
const gain = (value: number) => formatDb(value, { signed: true, digits: 0 });

function keySentence(result: GainStructureResult): string {
  const clipped = result.points.find((point) => point.clips);
  const converter = `The converter reads ${dbfs(result.converter.levelDbfs)} (${dbu(result.converter.levelDbu)}).`;
  if (clipped) {
    return `${clipped.label} clips: ${formatDb(-clipped.headroomDb)} over its ${dbu(clipped.clipDbu)} limit. ${converter} Lower the gain before it, or switch in the pad.`;
  }
  return `${converter} The least headroom is at the ${result.tightest.label.toLowerCase()}, ${formatDb(result.tightest.headroomDb)}; signal-to-noise at the converter is ${formatDb(result.converter.snrDb)}.`;
}

function describeChain(state: GainStructureState, result: GainStructureResult): string {
  const stages = result.points.map((point) => `${point.label} ${dbu(point.levelDbu)} (${dbfs(point.levelDbfs)})`).join(", ");
  return (
    `A ${formatNumber(state.mvPerPa, 1)} mV/Pa mic at ${formatNumber(state.splDb, 0)} dB SPL, pad ${state.pad ? "in" : "out"}, preamp ${gain(state.preampGainDb)}, ` +
    `fader ${gain(state.channelFaderDb)}, bus ${gain(state.busFaderDb)}, ${DIGITAL_ALIGNMENTS[state.alignment].label}. Levels: ${stages}. ${keySentence(result)}`
  );
}

export function GainStructureFigure({ initialState, onStateChange }: GainStructureFigureProps) {
  const [state, update] = useFigureState(GAIN_STRUCTURE_DEFAULTS, initialState, onStateChange);
  const result = gainStructure(state);
  const mic = result.points[0];

  return (
    <FigureFrame name="gain-structure" title={FIGURE_META["gain-structure"].title} summary="Levels are rms; the console's clip points and noise floors are typical values, not one desk's.">
      <GainStructurePlot points={result.points} fullScaleDbu={result.fullScaleDbu} description={describeChain(state, result)} />
      <FigureColumns>
        <div className="flex min-w-0 flex-col gap-3">
          <KeyResult testId="gain-structure-key-result">{keySentence(result)}</KeyResult>
          <GainStructureTable points={result.points} />
          <Readouts
            items={[
              { label: "Mic output", value: dbu(mic.levelDbu), testId: "mic-output" },
              { label: `Thermal noise of ${RIG.micSourceOhms} Ω over 20 kHz`, value: dbu(result.micNoiseDbu), testId: "source-noise" },
              { label: "Preamp noise figure", value: formatDb(result.noiseFigureDb), testId: "noise-figure" },
              { label: "Digital full scale", value: `0 dBFS = ${dbu(result.fullScaleDbu)}`, testId: "full-scale" },
              {
                label: "Least headroom",
                value: result.chain.firstClip ? "clipping" : `${formatDb(result.tightest.headroomDb)} (${result.tightest.label.toLowerCase()})`,
                testId: "least-headroom",
                tone: result.chain.firstClip ? "bad" : result.tightest.headroomDb >= 10 ? "good" : undefined,
              },
              { label: "Signal-to-noise at the converter", value: formatDb(result.converter.snrDb), testId: "final-snr" },
            ]}
          />
        </div>
        <ControlStack label="Gain structure controls">
          <ChoiceGroup<AlignmentId> legend="Converter alignment" options={ALIGNMENT_OPTIONS} value={state.alignment} onChange={(alignment) => update({ alignment })} testId="alignment" />
          <RangeField
            label="Sound pressure at the mic"
            min={LIMITS.splDb.min}
            max={LIMITS.splDb.max}
            step={1}
            value={state.splDb}
            valueText={`${formatNumber(state.splDb, 0)} dB SPL`}
            onChange={(splDb) => update({ splDb })}
            hint="A voice close to the mic is about 90–110 dB SPL; a kick drum inside the shell can pass 130."
            testId="spl"
          />
          <SeriesRangeField
            label="Mic sensitivity"
            series={SENSITIVITY_SERIES}
            value={state.mvPerPa}
            valueText={`${formatNumber(state.mvPerPa, state.mvPerPa < 10 ? 1 : 0)} mV/Pa`}
            onChange={(mvPerPa) => update({ mvPerPa })}
            hint="Dynamic mics are usually 1–3 mV/Pa, condensers 5–30 mV/Pa."
            testId="sensitivity"
          />
          <Checkbox label={`Input pad (−${RIG.padDb} dB, before the preamp)`} checked={state.pad} onChange={(event) => update({ pad: event.currentTarget.checked })} data-testid="pad" />
          <RangeField
            label="Preamp gain"
            min={LIMITS.preampGainDb.min}
            max={LIMITS.preampGainDb.max}
            step={1}
            value={state.preampGainDb}
            valueText={gain(state.preampGainDb)}
            onChange={(preampGainDb) => update({ preampGainDb })}
            testId="preamp-gain"
          />
          <RangeField
            label="Preamp EIN (150 Ω, 20 kHz)"
            min={LIMITS.einDbu.min}
            max={LIMITS.einDbu.max}
            step={0.5}
            value={state.einDbu}
            valueText={dbu(state.einDbu)}
            onChange={(einDbu) => update({ einDbu })}
            testId="ein"
          />
          <RangeField
            label="Channel fader"
            min={LIMITS.faderDb.min}
            max={LIMITS.faderDb.max}
            step={1}
            value={state.channelFaderDb}
            valueText={gain(state.channelFaderDb)}
            onChange={(channelFaderDb) => update({ channelFaderDb })}
            testId="channel-fader"
          />
          <RangeField
            label="Mix bus fader"
            min={LIMITS.faderDb.min}
            max={LIMITS.faderDb.max}
            step={1}
            value={state.busFaderDb}
            valueText={gain(state.busFaderDb)}
            onChange={(busFaderDb) => update({ busFaderDb })}
            testId="bus-fader"
          />
        </ControlStack>
      </FigureColumns>
      <p className="text-caption text-ink-muted">
        Set the preamp so the loudest moments leave headroom at every stage, then mix with the faders. A pad lowers the signal and the mic&apos;s own noise together, so the preamp&apos;s noise
        counts for more: use it only when the source would clip the preamp at its lowest gain. Before raising gain on a live channel, turn the monitors and the PA down: a sudden loud peak or
        feedback can hurt hearing.
      </p>
    </FigureFrame>
  );
}
