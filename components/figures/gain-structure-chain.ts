// The figure's chain, put together from lib/acoustics: mic → pad → preamp → channel fader → mix
// bus → converter. Every number comes from alignment.ts, thermal-noise.ts and gain-structure.ts;
// this file only lists the stages with the rig's values (gain-structure-state.ts).
import { dbuToDbfs, fullScaleDbu } from "@/lib/acoustics/alignment";
import { gainStageLevels, type ChainLevels } from "@/lib/acoustics/gain-structure";
import { noiseFigureDb, preampOwnNoiseDbu, thermalNoiseDbu } from "@/lib/acoustics/thermal-noise";
import { GAIN_STRUCTURE_RIG as RIG, type GainStructureState } from "./gain-structure-state";

export interface ChainPoint {
  /** Stable id for test ids and keys. */
  id: "mic" | "pad" | "preamp" | "channel" | "bus" | "converter";
  label: string;
  levelDbu: number;
  levelDbfs: number;
  /** Infinity where nothing clips (the mic's output, a passive pad). */
  clipDbu: number;
  noiseDbu: number;
  headroomDb: number;
  snrDb: number;
  clips: boolean;
}

export interface GainStructureResult {
  points: ChainPoint[];
  chain: ChainLevels;
  fullScaleDbu: number;
  micNoiseDbu: number;
  noiseFigureDb: number;
  tightest: ChainPoint;
  converter: ChainPoint;
}

const STAGE_IDS = ["pad", "preamp", "channel", "bus", "converter"] as const;
const LABELS: Record<ChainPoint["id"], string> = { mic: "Mic", pad: "Pad", preamp: "Preamp", channel: "Fader", bus: "Mix bus", converter: "Converter" };

export function gainStructure(state: GainStructureState): GainStructureResult {
  const noiseSource = { resistanceOhms: RIG.micSourceOhms, bandwidthHz: RIG.bandwidthHz, temperatureK: RIG.temperatureK };
  const micNoiseDbu = thermalNoiseDbu(noiseSource);
  const fullScale = fullScaleDbu({ alignment: state.alignment });
  const chain = gainStageLevels({
    splDb: state.splDb,
    mvPerPa: state.mvPerPa,
    sourceNoiseDbu: micNoiseDbu,
    stages: [
      { name: "pad", gainDb: state.pad ? -RIG.padDb : 0 },
      // The preamp's own noise at its output: its EIN less the 150 Ω source's share (which
      // arrives with the signal, through the pad), raised by its gain.
      { name: "preamp", gainDb: state.preampGainDb, clipDbu: RIG.analogueClipDbu, noiseFloorDbu: preampOwnNoiseDbu({ einDbu: state.einDbu, ...noiseSource }) + state.preampGainDb },
      { name: "channel", gainDb: state.channelFaderDb, clipDbu: RIG.analogueClipDbu, noiseFloorDbu: RIG.channelNoiseDbu },
      { name: "bus", gainDb: state.busFaderDb, clipDbu: RIG.analogueClipDbu, noiseFloorDbu: RIG.busNoiseDbu },
      { name: "converter", gainDb: 0, clipDbu: fullScale, noiseFloorDbu: fullScale - RIG.converterDynamicRangeDb },
    ],
  });
  const toDbfs = (dbu: number) => dbuToDbfs({ dbu, alignment: state.alignment });
  const mic: ChainPoint = {
    id: "mic",
    label: LABELS.mic,
    levelDbu: chain.sourceDbu,
    levelDbfs: toDbfs(chain.sourceDbu),
    clipDbu: Infinity,
    noiseDbu: micNoiseDbu,
    headroomDb: Infinity,
    snrDb: chain.sourceDbu - micNoiseDbu,
    clips: false,
  };
  const stages = chain.stages.map((stage, index): ChainPoint => ({
    id: STAGE_IDS[index],
    label: LABELS[STAGE_IDS[index]],
    levelDbu: stage.outputDbu,
    levelDbfs: toDbfs(stage.outputDbu),
    clipDbu: stage.clipDbu,
    noiseDbu: stage.noiseDbu,
    headroomDb: stage.headroomDb,
    snrDb: stage.snrDb,
    clips: stage.clips,
  }));
  const tightest = stages.find((point) => point.id === chain.tightestStage) ?? stages[stages.length - 1];
  return {
    points: [mic, ...stages],
    chain,
    fullScaleDbu: fullScale,
    micNoiseDbu,
    noiseFigureDb: noiseFigureDb({ einDbu: state.einDbu, ...noiseSource }),
    tightest,
    converter: stages[stages.length - 1],
  };
}

