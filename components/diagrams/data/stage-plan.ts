import { stagePosition, SCENARIO, sideWords, type StagePosition } from "@/lib/content/scenario";
import type { DiagramSpec } from "../diagram-types";

// A small club stage seen from above, upstage (back wall) at the top, audience at the bottom.
// Where each rig stands comes from the scenario data (content/scenario/lantern-room.json): stage
// right, as the band faces the audience, is the LEFT of this drawing. The shapes are drawn for
// the stage-right side and mirrored when the data puts a rig on the other side.
export const STAGE_PLAN_POSITION_IDS = [
  "vocal-centre",
  "wedge-centre",
  "drum-riser",
  "bass-rig",
  "guitar-rig",
  "keys-rig",
  "stage-box",
] as const;
export type StagePlanPositionId = (typeof STAGE_PLAN_POSITION_IDS)[number];

const WIDTH = 560;

function place(id: StagePlanPositionId): StagePosition {
  const position = stagePosition(id);
  if (!position) throw new Error(`the scenario has no stage position "${id}"`);
  return position;
}

/** x as drawn for a stage-right rig, mirrored for a stage-left one. */
function sideX(id: StagePlanPositionId, stageRightX: number): number {
  return place(id).side === "stage-left" ? WIDTH - stageRightX : stageRightX;
}

function sideSpan(id: StagePlanPositionId, left: number, right: number): { left: number; right: number } {
  return place(id).side === "stage-left" ? { left: WIDTH - right, right: WIDTH - left } : { left, right };
}

/** "upstage, stage right (left of the drawing)" */
function where(id: StagePlanPositionId): string {
  const p = place(id);
  const drawing = p.side === "stage-right" ? " (left of the drawing)" : p.side === "stage-left" ? " (right of the drawing)" : "";
  if (p.side === "centre") return p.depth === "centre" ? "centre stage" : `${p.depth} centre`;
  const depth = p.depth === "centre" ? "" : `${p.depth}, `;
  return `${depth}${sideWords(p.side)}${drawing}`;
}

/** Outlines of the stage and the backline, viewBox units. */
export const STAGE_PLAN_PARTS = {
  stage: { left: 20, right: 540, top: 50, audienceEdge: 352 },
  riser: { left: 200, right: 360, top: 66, bottom: 158 },
  bassCab: { ...sideSpan("bass-rig", 66, 144), top: 70, bottom: 118 },
  guitarCab: { ...sideSpan("guitar-rig", 76, 144), top: 74, bottom: 114 },
  keyboard: { ...sideSpan("keys-rig", 60, 172), top: 232, bottom: 256 },
  vocalStand: { cx: 280, cy: 252 },
  wedge: { cx: 280, cy: 320, width: 84, depth: 28 },
  stageBox: { ...sideSpan("stage-box", 30, 62), top: 212, bottom: 246 },
  frontOfHouseArrowX: 280,
} as const;

const stageBoxX = sideX("stage-box", 46);
const stageBoxOnRight = stageBoxX > WIDTH / 2;

export const STAGE_PLAN_DIAGRAM: DiagramSpec<StagePlanPositionId> = {
  title: `${SCENARIO.venue.name} stage plan from above, with input positions`,
  description:
    "A small club stage drawn from above, with the back wall at the top and the audience edge at the bottom. " +
    `A drum riser stands ${where("drum-riser")}, the bass rig ${where("bass-rig")} and the guitar rig ${where("guitar-rig")}, ` +
    "stage left and right being as the band faces the audience. " +
    `The keyboard stands ${where("keys-rig")}. The lead vocal microphone is centre stage with a monitor wedge in front of it, ` +
    `facing back at the singer. A stage box sits at the ${stageBoxOnRight ? "right" : "left"}-hand edge of the drawing (${sideWords(place("stage-box").side)}); its multicore runs along the side ` +
    "and off the stage toward the front-of-house mix position, which is out in the audience beyond the bottom edge. " +
    "Cable runs are kept along the edges and covered or taped where people walk, following the venue's rules.",
  viewBox: { width: WIDTH, height: 440 },
  positions: [
    {
      id: "vocal-centre",
      label: "Lead vocal",
      detail: "The lead vocal microphone on its stand, centre stage.",
      x: 280, y: 252, r: 22,
      labelX: 306, labelY: 250, labelAnchor: "start",
    },
    {
      id: "wedge-centre",
      label: "Wedge",
      detail: "The monitor wedge on the floor in front of the singer, aimed back up at them, in the null of the vocal mic's pattern.",
      x: 280, y: 320, r: 22,
      labelX: 334, labelY: 326, labelAnchor: "start",
    },
    {
      id: "drum-riser",
      label: "Drum riser",
      detail: `The drum riser ${where("drum-riser")}: the drum microphones plug in here.`,
      x: 280, y: 140, r: 22,
      labelX: 280, labelY: 186, labelAnchor: "middle",
    },
    {
      id: "bass-rig",
      label: "Bass rig",
      detail: `The bass amplifier and cabinet ${where("bass-rig")}: an active DI between the bass and the amp, and a mic on the cabinet.`,
      x: sideX("bass-rig", 105), y: 138, r: 22,
      labelX: sideX("bass-rig", 105), labelY: 182, labelAnchor: "middle",
    },
    {
      id: "guitar-rig",
      label: "Guitar rig",
      detail: `The guitar amplifier ${where("guitar-rig")}, with a microphone close to its speaker.`,
      x: sideX("guitar-rig", 110), y: 134, r: 22,
      labelX: sideX("guitar-rig", 110), labelY: 178, labelAnchor: "middle",
    },
    {
      id: "keys-rig",
      label: "Keys",
      detail: `The keyboards ${where("keys-rig")}, mixed on a small line mixer and fed to the stage box through a pair of passive DIs.`,
      x: sideX("keys-rig", 116), y: 244, r: 22,
      labelX: sideX("keys-rig", 116), labelY: 292, labelAnchor: "middle",
    },
    {
      id: "stage-box",
      label: "Stage box",
      detail: `The stage box at the ${stageBoxOnRight ? "right" : "left"}-hand edge of the drawing (${sideWords(place("stage-box").side)}), where every input is patched into the multicore.`,
      x: stageBoxX, y: 229, r: 22,
      labelX: stageBoxOnRight ? stageBoxX - 10 : stageBoxX + 10, labelY: 282, labelAnchor: stageBoxOnRight ? "end" : "start",
    },
  ],
};
