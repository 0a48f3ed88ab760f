// Shared types for Axisline's own SVG diagrams. Pure data: no React import, so
// server code and quiz graders can use it.

/** How a position label's text is anchored to its (labelX, labelY) point. */
export type LabelAnchor = "start" | "middle" | "end";

/** A marked microphone (or input) position, in viewBox units. */
export interface DiagramPosition<Id extends string = string> {
  /** Stable id used by lessons (highlight="...") and by hotspot quiz answers. */
  readonly id: Id;
  /** Short visible label drawn beside the mark. */
  readonly label: string;
  /** One sentence for the text alternative: where the position is and why. */
  readonly detail: string;
  /** Centre of the mark and of the hotspot, viewBox units. */
  readonly x: number;
  readonly y: number;
  /** Hotspot radius, viewBox units (the quiz target; the drawn mark is smaller). */
  readonly r: number;
  /** Where the label text sits, viewBox units; a leader line joins it to the mark. */
  readonly labelX: number;
  readonly labelY: number;
  readonly labelAnchor: LabelAnchor;
}

export interface DiagramSpec<Id extends string = string> {
  readonly title: string;
  /** Text alternative describing the whole drawing (positions are described separately). */
  readonly description: string;
  /** Drawing size in viewBox units; the SVG scales to its container's width. */
  readonly viewBox: { readonly width: number; readonly height: number };
  readonly positions: readonly DiagramPosition<Id>[];
}
