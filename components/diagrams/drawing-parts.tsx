// Small drawing pieces shared by the diagrams: captions inside the drawing and arrows.
// Arrowheads are polygons rather than SVG <marker>s so no element ids are needed.
import type { ReactNode } from "react";
import { DETAIL, INK, NOTE_FONT_SIZE } from "./palette";

export interface NoteTextProps {
  readonly x: number;
  readonly y: number;
  readonly anchor?: "start" | "middle" | "end";
  readonly children: ReactNode;
  readonly italic?: boolean;
}

/** A small caption inside a drawing (part names, directions). */
export function NoteText({ x, y, anchor = "middle", italic = false, children }: NoteTextProps) {
  return (
    <text
      x={x} y={y} textAnchor={anchor} fill={INK} stroke="none" opacity={0.85}
      fontSize={NOTE_FONT_SIZE} fontStyle={italic ? "italic" : undefined}
    >
      {children}
    </text>
  );
}

export interface ArrowProps {
  readonly fromX: number;
  readonly fromY: number;
  readonly toX: number;
  readonly toY: number;
  readonly headLength?: number;
  readonly strokeWidth?: number;
  readonly color?: string;
  readonly dashed?: boolean;
}

/** A straight arrow with a filled head at (toX, toY). */
export function Arrow({ fromX, fromY, toX, toY, headLength = 12, strokeWidth = 2, color = "currentColor", dashed = false }: ArrowProps) {
  const angle = Math.atan2(toY - fromY, toX - fromX);
  const halfWidth = headLength * 0.45;
  const baseX = toX - Math.cos(angle) * headLength;
  const baseY = toY - Math.sin(angle) * headLength;
  const leftX = baseX + Math.sin(angle) * halfWidth;
  const leftY = baseY - Math.cos(angle) * halfWidth;
  const rightX = baseX - Math.sin(angle) * halfWidth;
  const rightY = baseY + Math.cos(angle) * halfWidth;
  const r = (value: number) => Math.round(value * 10) / 10;
  return (
    <g stroke={color} fill={color}>
      <line x1={fromX} y1={fromY} x2={r(baseX)} y2={r(baseY)} strokeWidth={strokeWidth} strokeDasharray={dashed ? "6 5" : undefined} />
      <polygon points={`${toX},${toY} ${r(leftX)},${r(leftY)} ${r(rightX)},${r(rightY)}`} strokeWidth={1} />
    </g>
  );
}

export interface LeaderNoteProps {
  readonly text: string;
  /** Text position (baseline), viewBox units. */
  readonly x: number;
  readonly y: number;
  /** The point on the part the leader touches. */
  readonly toX: number;
  readonly toY: number;
  readonly anchor?: "start" | "middle" | "end";
}

/** A part name with a thin leader to the part; the leader leaves from above or below the text. */
export function LeaderNote({ text, x, y, toX, toY, anchor = "middle" }: LeaderNoteProps) {
  const fromY = toY < y ? y - NOTE_FONT_SIZE + 1 : y + 5;
  return (
    <g>
      <line x1={x} y1={fromY} x2={toX} y2={toY} stroke={DETAIL} strokeWidth={1} />
      <NoteText x={x} y={y} anchor={anchor}>{text}</NoteText>
    </g>
  );
}
