import type { DiagramSpec } from "../diagram-types";

// Drum kit seen from above, from behind the drummer: the front of the kit (audience side)
// is at the top, the drummer's throne at the bottom. Left and right are the drummer's.
export const DRUM_KIT_POSITION_IDS = [
  "kick-inside",
  "kick-outside",
  "snare-top",
  "snare-bottom",
  "hihat",
  "tom-rack",
  "tom-floor",
  "overhead-left",
  "overhead-right",
] as const;
export type DrumKitPositionId = (typeof DRUM_KIT_POSITION_IDS)[number];

/** Drum and cymbal outlines, viewBox units; the drawing and the mic marks share them. */
export const DRUM_KIT_PARTS = {
  kick: { left: 195, right: 365, front: 178, back: 318 },
  rackTom: { cx: 238, cy: 212, rx: 40, ry: 33 },
  snare: { cx: 196, cy: 372, r: 40 },
  hiHat: { cx: 90, cy: 336, r: 36 },
  floorTom: { cx: 424, cy: 384, r: 48 },
  crash: { cx: 116, cy: 182, r: 62 },
  ride: { cx: 452, cy: 236, r: 70 },
  throne: { cx: 300, cy: 458, r: 22 },
} as const;

export const DRUM_KIT_DIAGRAM: DiagramSpec<DrumKitPositionId> = {
  title: "Drum kit from above, with microphone positions",
  description:
    "A four-piece drum kit (kick, snare, one rack tom, one floor tom) with hi-hat and two cymbals, drawn from above, seen from behind the drummer, so the audience side is at the top. " +
    "The kick drum lies in the middle pointing toward the audience, with its pedal at the drummer's end. " +
    "The snare sits between the drummer's knees on the left of the kick, the hi-hat further left, " +
    "a rack tom is mounted over the kick, and the floor tom stands on the drummer's right. " +
    "A crash cymbal is above the hi-hat on the left and a ride cymbal is above the floor tom on the right. " +
    "Left and right are the drummer's left and right.",
  viewBox: { width: 560, height: 500 },
  positions: [
    {
      id: "kick-inside",
      label: "Kick inside",
      detail: "Inside the kick drum, through the port, aimed at the beater's strike point.",
      x: 304, y: 240, r: 22,
      labelX: 304, labelY: 284, labelAnchor: "middle",
    },
    {
      id: "kick-outside",
      label: "Kick outside",
      detail: "Just outside the front (resonant) head of the kick drum, on the audience side.",
      x: 300, y: 152, r: 22,
      labelX: 300, labelY: 118, labelAnchor: "middle",
    },
    {
      id: "snare-top",
      label: "Snare top",
      detail: "Above the snare's top head near the far rim, between the hi-hat and the rack tom, aimed at the middle of the head.",
      x: 214, y: 342, r: 20,
      labelX: 262, labelY: 378, labelAnchor: "start",
    },
    {
      id: "snare-bottom",
      label: "Snare bottom (below)",
      detail: "Underneath the snare, aimed up at the snare wires; usually polarity-inverted against the top mic.",
      x: 180, y: 402, r: 20,
      labelX: 140, labelY: 450, labelAnchor: "middle",
    },
    {
      id: "hihat",
      label: "Hi-hat",
      detail: "Above the hi-hat's top cymbal on the edge away from the drummer, aimed down and away from the snare.",
      x: 78, y: 308, r: 20,
      labelX: 24, labelY: 272, labelAnchor: "start",
    },
    {
      id: "tom-rack",
      label: "Rack tom",
      detail: "On the rim of the rack tom, a few centimetres above the head, aimed toward its centre.",
      x: 226, y: 196, r: 20,
      labelX: 236, labelY: 154, labelAnchor: "middle",
    },
    {
      id: "tom-floor",
      label: "Floor tom",
      detail: "On the rim of the floor tom, a few centimetres above the head, aimed toward its centre.",
      x: 414, y: 352, r: 20,
      labelX: 536, labelY: 346, labelAnchor: "end",
    },
    {
      id: "overhead-left",
      label: "Overhead L",
      detail: "Overhead on the drummer's left, above the crash and hi-hat side of the kit.",
      x: 166, y: 100, r: 22,
      labelX: 110, labelY: 60, labelAnchor: "middle",
    },
    {
      id: "overhead-right",
      label: "Overhead R",
      detail: "Overhead on the drummer's right, above the ride and floor-tom side of the kit.",
      x: 420, y: 100, r: 22,
      labelX: 470, labelY: 60, labelAnchor: "middle",
    },
  ],
};
