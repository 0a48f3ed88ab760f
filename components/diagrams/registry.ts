// Axisline's diagram registry: pure data (no React), shared by the drawings, the lesson
// renderer's <Diagram>, and the quiz graders for hotspot questions. Coordinates are viewBox units.
import type { DiagramPosition, DiagramSpec } from "./diagram-types";
import { DRUM_KIT_DIAGRAM, DRUM_KIT_POSITION_IDS } from "./data/drum-kit";
import { GRAND_PIANO_DIAGRAM, GRAND_PIANO_POSITION_IDS } from "./data/grand-piano";
import { GUITAR_CABINET_DIAGRAM, GUITAR_CABINET_POSITION_IDS } from "./data/guitar-cabinet";
import { STAGE_PLAN_DIAGRAM, STAGE_PLAN_POSITION_IDS } from "./data/stage-plan";

export type { DiagramPosition, DiagramSpec, LabelAnchor } from "./diagram-types";

export const DIAGRAM_NAMES = ["stage-plan", "drum-kit", "grand-piano", "guitar-cabinet"] as const;
export type DiagramName = (typeof DIAGRAM_NAMES)[number];

/** Position ids of each diagram, as typed tuples. */
export const DIAGRAM_POSITION_IDS = {
  "stage-plan": STAGE_PLAN_POSITION_IDS,
  "drum-kit": DRUM_KIT_POSITION_IDS,
  "grand-piano": GRAND_PIANO_POSITION_IDS,
  "guitar-cabinet": GUITAR_CABINET_POSITION_IDS,
} as const satisfies Record<DiagramName, readonly string[]>;

export type DiagramPositionId<Name extends DiagramName> = (typeof DIAGRAM_POSITION_IDS)[Name][number];

export const DIAGRAMS: { readonly [Name in DiagramName]: DiagramSpec<DiagramPositionId<Name>> } = {
  "stage-plan": STAGE_PLAN_DIAGRAM,
  "drum-kit": DRUM_KIT_DIAGRAM,
  "grand-piano": GRAND_PIANO_DIAGRAM,
  "guitar-cabinet": GUITAR_CABINET_DIAGRAM,
};

export function isDiagramName(value: string): value is DiagramName {
  return (DIAGRAM_NAMES as readonly string[]).includes(value);
}

export function getDiagram(name: DiagramName): DiagramSpec {
  return DIAGRAMS[name];
}

export function findPosition(name: DiagramName, positionId: string): DiagramPosition | undefined {
  return getDiagram(name).positions.find((position) => position.id === positionId);
}

/** True when a point (viewBox units) lies inside a position's hotspot circle; for graders of click answers. */
export function isInsideHotspot(position: DiagramPosition, x: number, y: number): boolean {
  return Math.hypot(x - position.x, y - position.y) <= position.r;
}
