// Draws the marked positions of a diagram from the registry data, so the marks and the quiz
// hotspots always share coordinates. Highlighted marks differ by shape (diamond in a ring)
// and by bold labels, not by colour alone.
import type { DiagramPosition } from "./diagram-types";
import type { DiagramFrame, ShownPosition } from "./diagram-frame";
import { ACCENT, INK, LABEL_FONT_SIZE } from "./palette";

const PLAIN_MARK_RADIUS = 8;
const HIGHLIGHT_RING_RADIUS = 15;
const HIGHLIGHT_DIAMOND_HALF = 10;
/** Non-highlighted marks recede when something else is highlighted; their labels stay readable. */
const RECEDED_MARK_OPACITY = 0.5;
const RECEDED_LABEL_OPACITY = 0.8;

/** Average glyph advance as a share of the font size, for estimating label widths (sans-serif). */
const GLYPH_WIDTH_RATIO = 0.56;

/** Estimated box of a label's text, viewBox units. */
function labelBox(position: DiagramPosition, text: string) {
  const width = text.length * LABEL_FONT_SIZE * GLYPH_WIDTH_RATIO;
  const left =
    position.labelAnchor === "start" ? position.labelX
    : position.labelAnchor === "end" ? position.labelX - width
    : position.labelX - width / 2;
  return { left, right: left + width, top: position.labelY - LABEL_FONT_SIZE * 0.75, bottom: position.labelY + LABEL_FONT_SIZE * 0.2 };
}

/** The point of the label box nearest the mark, pushed a little away from the box: where the leader ends. */
function leaderEnd(position: DiagramPosition, text: string): { x: number; y: number } {
  const box = labelBox(position, text);
  const gap = 4;
  const x = Math.min(Math.max(position.x, box.left - gap), box.right + gap);
  const y = Math.min(Math.max(position.y, box.top - gap), box.bottom + gap);
  return { x, y };
}

function LeaderLine({ item, text }: { item: ShownPosition; text: string }) {
  const { position } = item;
  const end = leaderEnd(position, text);
  const dx = end.x - position.x;
  const dy = end.y - position.y;
  const length = Math.hypot(dx, dy);
  const startGap = item.highlighted ? HIGHLIGHT_RING_RADIUS + 2 : PLAIN_MARK_RADIUS + 3;
  if (length <= startGap + 4) return null;
  const startX = position.x + (dx / length) * startGap;
  const startY = position.y + (dy / length) * startGap;
  return (
    <line
      x1={round(startX)} y1={round(startY)} x2={round(end.x)} y2={round(end.y)}
      stroke={INK} strokeWidth={1.25} opacity={0.8}
    />
  );
}

function Mark({ highlighted }: { highlighted: boolean }) {
  if (highlighted) {
    const h = HIGHLIGHT_DIAMOND_HALF;
    return (
      <>
        <circle r={HIGHLIGHT_RING_RADIUS} stroke={ACCENT} strokeWidth={3} fill="none" />
        <polygon points={`0,${-h} ${h},0 0,${h} ${-h},0`} fill={ACCENT} stroke={ACCENT} strokeWidth={1.5} />
      </>
    );
  }
  return (
    <>
      <circle r={PLAIN_MARK_RADIUS} stroke={ACCENT} strokeWidth={2.5} fill={ACCENT} fillOpacity={0.18} />
      <circle r={2.5} fill={ACCENT} stroke="none" />
    </>
  );
}

function labelText(frame: DiagramFrame, item: ShownPosition): string | null {
  if (frame.labelMode === "names") return item.position.label;
  if (frame.labelMode === "letters") return item.letter;
  return null;
}

/** Distance from a mark's centre to its letter (letters mode sits close to the mark, no leader). */
const LETTER_OFFSET = 24;

/** Where the label text goes: the data's label point for names; beside the mark, toward it, for letters. */
function labelPlacement(frame: DiagramFrame, position: DiagramPosition) {
  if (frame.labelMode !== "letters") {
    return { x: position.labelX, y: position.labelY, anchor: position.labelAnchor };
  }
  const dx = position.labelX - position.x;
  const dy = position.labelY - LABEL_FONT_SIZE * 0.35 - position.y;
  const length = Math.hypot(dx, dy) || 1;
  return {
    x: round(position.x + (dx / length) * LETTER_OFFSET),
    y: round(position.y + (dy / length) * LETTER_OFFSET + LABEL_FONT_SIZE * 0.35),
    anchor: "middle" as const,
  };
}

function round(value: number): number {
  return Math.round(value * 10) / 10;
}

export function PositionMarks({ frame }: { frame: DiagramFrame }) {
  const withLeaders = frame.labelMode === "names";
  const receded = (item: ShownPosition) => frame.anyHighlighted && !item.highlighted;
  return (
    <g data-layer="positions">
      {withLeaders ? (
        <g aria-hidden="true">
          {frame.shown.map((item) => (
            <g key={item.position.id} opacity={receded(item) ? RECEDED_MARK_OPACITY : undefined}>
              <LeaderLine item={item} text={item.position.label} />
            </g>
          ))}
        </g>
      ) : null}
      {frame.shown.map((item) => {
        const text = labelText(frame, item);
        const { position } = item;
        const placement = labelPlacement(frame, position);
        return (
          <g
            key={position.id}
            data-position-id={position.id}
            data-highlighted={item.highlighted ? "true" : "false"}
          >
            <g transform={`translate(${position.x} ${position.y})`} opacity={receded(item) ? RECEDED_MARK_OPACITY : undefined}>
              <Mark highlighted={item.highlighted} />
            </g>
            {text === null ? null : (
              <text
                x={placement.x} y={placement.y} textAnchor={placement.anchor}
                fill={INK} stroke="none" fontSize={LABEL_FONT_SIZE}
                opacity={receded(item) ? RECEDED_LABEL_OPACITY : undefined}
                fontWeight={item.highlighted || frame.labelMode === "letters" ? 700 : 500}
              >
                {text}
              </text>
            )}
          </g>
        );
      })}
    </g>
  );
}
