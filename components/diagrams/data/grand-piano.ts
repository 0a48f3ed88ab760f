import type { DiagramSpec } from "../diagram-types";

// A grand piano seen from above: keyboard at the bottom, bass strings along the straight side
// (left), treble along the curved rim (right). The lid is hinged on the straight side and opens
// toward the audience on the right.
export const GRAND_PIANO_POSITION_IDS = ["pair-low", "pair-high", "single-centre", "lid-closed-boundary"] as const;
export type GrandPianoPositionId = (typeof GRAND_PIANO_POSITION_IDS)[number];

/** Outer case outline: straight side (spine) at x 130, tail at the top, curved rim on the right. */
export const GRAND_PIANO_CASE_PATH =
  "M 130 372 L 130 80 Q 130 40 172 40 L 210 42 C 290 48 300 150 345 205 C 385 255 430 275 430 330 L 430 372 Z";
/** Inner rim (the edge of the soundboard area), just inside the case. */
export const GRAND_PIANO_INNER_PATH =
  "M 142 352 L 142 84 Q 142 52 174 52 L 208 54 C 280 62 288 160 334 214 C 372 260 418 282 418 330 L 418 352 Z";

export const GRAND_PIANO_PARTS = {
  spineX: 130,
  trebleX: 430,
  keyboard: { left: 120, right: 440, top: 372, bottom: 420 },
  hammerLineY: 352,
  bench: { left: 220, right: 340, top: 438, bottom: 458 },
  hingeYs: [100, 200, 334],
  /** Horizontal scale of the raised lid's outline seen from above (the lid tilts up about the spine). */
  raisedLidScale: 0.78,
} as const;

export const GRAND_PIANO_DIAGRAM: DiagramSpec<GrandPianoPositionId> = {
  title: "Grand piano from above, lid open, with microphone positions",
  description:
    "A grand piano drawn from above with the keyboard at the bottom and the pianist's bench below it. " +
    "The straight side of the case is on the left, where the longest bass strings run and the lid is hinged; " +
    "the curved rim is on the right, on the treble side, where the lid is propped open toward the audience. " +
    "The strings run from the hammer line just behind the keyboard back toward the tail. " +
    "The raised lid is shown as a dashed outline.",
  viewBox: { width: 560, height: 470 },
  positions: [
    {
      id: "pair-low",
      label: "Pair, low",
      detail: "One of a spaced pair, over the bass and lower-middle strings, a little behind the hammers.",
      x: 208, y: 298, r: 22,
      labelX: 118, labelY: 304, labelAnchor: "end",
    },
    {
      id: "pair-high",
      label: "Pair, high",
      detail: "The other of the pair, over the treble strings, a little behind the hammers.",
      x: 346, y: 298, r: 22,
      labelX: 446, labelY: 304, labelAnchor: "start",
    },
    {
      id: "single-centre",
      label: "Single, centre",
      detail: "A single microphone over the middle of the strings, where the whole compass is heard together.",
      x: 276, y: 202, r: 22,
      labelX: 356, labelY: 170, labelAnchor: "start",
    },
    {
      id: "lid-closed-boundary",
      label: "Boundary, lid closed",
      detail: "A boundary microphone on the underside of the lid, for use with the lid closed or on the short stick.",
      x: 226, y: 140, r: 22,
      labelX: 232, labelY: 26, labelAnchor: "start",
    },
  ],
};
