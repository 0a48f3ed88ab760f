import type { DiagramSpec } from "../diagram-types";

// Left: the front of a two-speaker guitar cabinet, grille cloth drawn see-through.
// Right: a side section of one speaker, facing right, with an angled (off-axis) microphone.
export const GUITAR_CABINET_POSITION_IDS = ["cone-centre", "cone-edge", "off-axis"] as const;
export type GuitarCabinetPositionId = (typeof GUITAR_CABINET_POSITION_IDS)[number];

export const GUITAR_CABINET_PARTS = {
  cabinet: { left: 16, right: 300, top: 64, bottom: 318 },
  grille: { left: 28, right: 288, top: 76, bottom: 306 },
  speakerRadius: 60,
  speakerCentres: [
    { cx: 88, cy: 191 },
    { cx: 228, cy: 191 },
  ],
  dustCapRadius: 16,
  /** Side section of one speaker; the cone's axis is the line y = axisY. */
  side: {
    axisY: 196,
    magnet: { left: 350, right: 382, top: 172, bottom: 220 },
    voiceCoilX: 392,
    voiceCoilHalfHeight: 12,
    rimX: 458,
    rimHalfHeight: 58,
    flangeX: 466,
    baffleX: 472,
    grilleX: 480,
    baffleTop: 84,
    baffleBottom: 308,
  },
  offAxisMic: { capsuleX: 504, capsuleY: 240 },
} as const;

export const GUITAR_CABINET_DIAGRAM: DiagramSpec<GuitarCabinetPositionId> = {
  title: "Guitar cabinet front and speaker side section, with microphone positions",
  description:
    "On the left, the front of a guitar cabinet with two speakers, the grille cloth drawn see-through so the speakers show. " +
    "Each speaker has a dust cap at its centre, the paper cone around it and a flexible surround at its outer edge. " +
    "On the right, a side section through one speaker facing right: the magnet at the back, the dust cap at the centre of the cone, " +
    "the cone widening to the surround and frame, then the baffle and the grille cloth. " +
    "A dashed line shows the speaker's axis, and a small microphone in front of the grille is angled to it.",
  viewBox: { width: 560, height: 370 },
  positions: [
    {
      id: "cone-centre",
      label: "Cone centre",
      detail: "Close to the grille, on the speaker's axis in line with the dust cap: the brightest placement.",
      x: 88, y: 191, r: 20,
      labelX: 70, labelY: 44, labelAnchor: "middle",
    },
    {
      id: "cone-edge",
      label: "Cone edge",
      detail: "Close to the grille, moved out from the dust cap toward the edge of the cone: darker and fuller.",
      x: 119, y: 160, r: 20,
      labelX: 156, labelY: 44, labelAnchor: "start",
    },
    {
      id: "off-axis",
      label: "Off axis",
      detail: "In front of the grille but angled to the speaker's axis, aimed back toward the dust cap: softens the top end.",
      x: 504, y: 240, r: 20,
      labelX: 556, labelY: 224, labelAnchor: "end",
    },
  ],
};
