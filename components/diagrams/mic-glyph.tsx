// A small side-view microphone: capsule (grille) at (x, y), body trailing behind it.
import { ACCENT } from "./palette";

export interface MicGlyphProps {
  /** Capsule front, viewBox units. */
  readonly x: number;
  readonly y: number;
  /** Direction the mic points (its axis), degrees, 0 = toward +x, measured clockwise on screen. */
  readonly aimDeg: number;
  /** Overall length, viewBox units. */
  readonly length?: number;
}

export function MicGlyph({ x, y, aimDeg, length = 46 }: MicGlyphProps) {
  const capsule = length * 0.3;
  // Drawn pointing toward -x (capsule at the origin, body to the right), then rotated to aim.
  const rotationDeg = aimDeg - 180;
  return (
    <g transform={`translate(${x} ${y}) rotate(${rotationDeg})`} stroke={ACCENT}>
      <rect x={0} y={-7} width={capsule} height={14} rx={6} fill={ACCENT} fillOpacity={0.25} strokeWidth={2} />
      <line x1={capsule * 0.35} y1={-6} x2={capsule * 0.35} y2={6} strokeWidth={1} />
      <line x1={capsule * 0.7} y1={-6} x2={capsule * 0.7} y2={6} strokeWidth={1} />
      <path d={`M ${capsule} -5 L ${length} -3.5 L ${length} 3.5 L ${capsule} 5 Z`} fill={ACCENT} fillOpacity={0.12} strokeWidth={2} />
      <line x1={length} y1={0} x2={length + 14} y2={0} strokeWidth={2} />
    </g>
  );
}
