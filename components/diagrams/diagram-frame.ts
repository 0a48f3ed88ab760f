// Resolves the common props of every drawing into what the SVG needs: which positions are drawn,
// which are highlighted, the letter of each (for quiz mode) and the text alternative.
import type { DiagramPosition, DiagramSpec } from "./diagram-types";
import { diagramIdPrefix } from "./diagram-ids";
import { parseHighlight, type HighlightInput } from "./highlight";

/** names: visible position names; letters: A, B, C… (quiz mode, names would give answers away); none: marks only. */
export type LabelMode = "names" | "letters" | "none";

export interface DiagramDrawingProps {
  /** Position ids to emphasise: an array, or a comma-separated string from MDX. */
  readonly highlight?: HighlightInput;
  readonly labelMode?: LabelMode;
  /** Draw only these positions (default: all). */
  readonly onlyPositions?: readonly string[];
  /** Prefix for element ids; defaults to one derived from the props. */
  readonly idPrefix?: string;
}

export interface ShownPosition {
  readonly position: DiagramPosition;
  readonly highlighted: boolean;
  /** "A", "B", … in drawing order; used in letters mode. */
  readonly letter: string;
}

export interface DiagramFrame {
  readonly name: string;
  readonly spec: DiagramSpec;
  readonly idPrefix: string;
  readonly labelMode: LabelMode;
  readonly anyHighlighted: boolean;
  readonly shown: readonly ShownPosition[];
  readonly descriptionText: string;
}

/** Letter for the n-th shown position (0 → "A"); positions per diagram stay well under 26. */
export function positionLetter(index: number): string {
  return String.fromCharCode("A".charCodeAt(0) + index);
}

export function resolveDiagramFrame(name: string, spec: DiagramSpec, props: DiagramDrawingProps): DiagramFrame {
  const labelMode = props.labelMode ?? "names";
  const highlightIds = new Set(parseHighlight(props.highlight));
  const only = props.onlyPositions ? new Set(props.onlyPositions) : undefined;
  const shown = spec.positions
    .filter((position) => only === undefined || only.has(position.id))
    .map((position, index) => ({ position, highlighted: highlightIds.has(position.id), letter: positionLetter(index) }));
  const idPrefix =
    props.idPrefix ?? diagramIdPrefix(name, [labelMode, ...highlightIds, "|", ...(props.onlyPositions ?? [])].join(","));
  return {
    name,
    spec,
    idPrefix,
    labelMode,
    anyHighlighted: shown.some((item) => item.highlighted),
    shown,
    descriptionText: describeDiagram(spec, shown, labelMode),
  };
}

/** The <desc> text: the drawing, then its positions (by name unless the names would answer a quiz). */
export function describeDiagram(spec: DiagramSpec, shown: readonly ShownPosition[], labelMode: LabelMode): string {
  if (labelMode === "letters") {
    const first = shown[0]?.letter ?? "A";
    const last = shown[shown.length - 1]?.letter ?? "A";
    return `${spec.description} ${shown.length} positions are marked with the letters ${first} to ${last}.`;
  }
  if (labelMode === "none") {
    return `${spec.description} ${shown.length} positions are marked.`;
  }
  const listed = shown.map(({ position }) => `${position.label}: ${position.detail}`).join(" ");
  const highlighted = shown.filter((item) => item.highlighted).map(({ position }) => position.label);
  const emphasis = highlighted.length > 0 ? ` Highlighted: ${highlighted.join(", ")}.` : "";
  return `${spec.description} Marked positions. ${listed}${emphasis}`;
}
