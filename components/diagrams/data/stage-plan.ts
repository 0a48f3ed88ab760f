import type { DiagramSpec } from "../diagram-types";

// A small club stage seen from above, upstage (back wall) at the top, audience at the bottom.
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

/** Outlines of the stage and the backline, viewBox units. */
export const STAGE_PLAN_PARTS = {
  stage: { left: 20, right: 540, top: 50, audienceEdge: 352 },
  riser: { left: 200, right: 360, top: 66, bottom: 158 },
  bassCab: { left: 66, right: 144, top: 70, bottom: 118 },
  guitarCab: { left: 416, right: 484, top: 74, bottom: 114 },
  keyboard: { left: 60, right: 172, top: 232, bottom: 256 },
  vocalStand: { cx: 280, cy: 252 },
  wedge: { cx: 280, cy: 320, width: 84, depth: 28 },
  stageBox: { left: 498, right: 530, top: 212, bottom: 246 },
  frontOfHouseArrowX: 280,
} as const;

export const STAGE_PLAN_DIAGRAM: DiagramSpec<StagePlanPositionId> = {
  title: "Club stage plan from above, with input positions",
  description:
    "A small club stage drawn from above, with the back wall at the top and the audience edge at the bottom. " +
    "A drum riser stands upstage centre, the bass rig upstage on the left of the drawing (stage right, as the band faces the audience) " +
    "and the guitar rig upstage on the right of the drawing (stage left). The keyboard stands downstage on the left of the drawing (stage right). The lead vocal microphone is centre stage with a monitor wedge in front of it, " +
    "facing back at the singer. A stage box sits at the right-hand edge of the stage; its multicore runs along the side " +
    "and off the stage toward the front-of-house mix position, which is out in the audience beyond the bottom edge. " +
    "Cable runs are kept along the edges and covered or taped where people walk, following the venue's rules.",
  viewBox: { width: 560, height: 440 },
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
      detail: "The monitor wedge on the floor in front of the singer, aimed back up at them, into the rear of the vocal mic's pattern.",
      x: 280, y: 320, r: 22,
      labelX: 334, labelY: 326, labelAnchor: "start",
    },
    {
      id: "drum-riser",
      label: "Drum riser",
      detail: "The drum riser upstage centre: the drum microphones plug in here.",
      x: 280, y: 140, r: 22,
      labelX: 280, labelY: 186, labelAnchor: "middle",
    },
    {
      id: "bass-rig",
      label: "Bass rig",
      detail: "The bass amplifier and cabinet upstage, stage right (left of the drawing): a DI from the amp and, if wanted, a mic on the cabinet.",
      x: 105, y: 138, r: 22,
      labelX: 105, labelY: 182, labelAnchor: "middle",
    },
    {
      id: "guitar-rig",
      label: "Guitar rig",
      detail: "The guitar amplifier upstage, stage left (right of the drawing), with a microphone close to its speaker.",
      x: 450, y: 134, r: 22,
      labelX: 450, labelY: 178, labelAnchor: "middle",
    },
    {
      id: "keys-rig",
      label: "Keys",
      detail: "The keyboard downstage, stage right (left of the drawing), fed to the stage box through a pair of DIs.",
      x: 116, y: 244, r: 22,
      labelX: 116, labelY: 292, labelAnchor: "middle",
    },
    {
      id: "stage-box",
      label: "Stage box",
      detail: "The stage box at the right-hand edge of the stage, where every input is patched into the multicore.",
      x: 514, y: 229, r: 22,
      labelX: 504, labelY: 282, labelAnchor: "end",
    },
  ],
};
