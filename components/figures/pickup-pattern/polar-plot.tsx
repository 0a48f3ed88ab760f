"use client";
// Polar plot of a first-order pattern in dB (0 dB at the rim, −30 dB at the centre), seen from
// above with the mic pointing up. Sources sit outside the rim; they can be dragged as a
// convenience, but the range inputs beside the plot are the keyboard and single-pointer way.
import { useRef, useState, type PointerEvent } from "react";
import { patternResponse, polarTrace } from "@/lib/acoustics";

const RIM = 150;
const FLOOR_DB = -30;
const RINGS_DB = [0, -6, -12, -18, -24];
const SOURCE_RING = RIM + 52;
const TRACE = "var(--color-trace-1, currentColor)";
const GRID = "var(--color-rule, currentColor)";
const MUTED = "var(--color-ink-muted, currentColor)";

export interface PolarSource {
  id: string;
  /** One or two letters drawn in the marker. */
  mark: string;
  label: string;
  angleDeg: number;
  levelDb: number;
}

export interface PolarPlotProps {
  a: number;
  nullAnglesDeg: readonly number[];
  sources: readonly PolarSource[];
  /** Text alternative describing the current state. */
  description: string;
  onMoveSource?: (id: string, angleDeg: number) => void;
}

function radiusForDb(levelDb: number): number {
  const clamped = Math.max(FLOOR_DB, Math.min(0, levelDb));
  return (RIM * (clamped - FLOOR_DB)) / -FLOOR_DB;
}

/** Screen position of a bearing (0° up, clockwise) at a radius. */
function point(angleDeg: number, radius: number): [number, number] {
  const angleRad = (angleDeg * Math.PI) / 180;
  // Rounded to 0.1 px: Math.sin may differ in the last bit between server and browser (hydration),
  // and a finer figure only makes the server-rendered page heavier.
  return [Math.round(radius * Math.sin(angleRad) * 10) / 10, Math.round(-radius * Math.cos(angleRad) * 10) / 10];
}

/** The trace as path segments, split where the polarity flips (inverted parts are dashed). */
function traceSegments(a: number): { d: string; inverted: boolean }[] {
  const segments: { d: string; inverted: boolean }[] = [];
  let current: { points: string[]; inverted: boolean } | null = null;
  // 1° steps: at this plot's radius a step spans under 4 px, so the trace still looks smooth.
  for (const sample of polarTrace({ a, points: 361 })) {
    const inverted = patternResponse({ a, angleDeg: sample.angleDeg }) < 0;
    const [x, y] = point(sample.angleDeg, radiusForDb(sample.levelDb));
    const xy = `${x} ${y}`;
    if (!current || current.inverted !== inverted) {
      if (current) segments.push({ d: `M ${current.points.join(" L ")} L ${xy}`, inverted: current.inverted });
      current = { points: [xy], inverted };
    } else {
      current.points.push(xy);
    }
  }
  if (current) segments.push({ d: `M ${current.points.join(" L ")}`, inverted: current.inverted });
  return segments;
}

function MicAtCentre() {
  return (
    <g stroke="currentColor" strokeWidth={2} fill="none" aria-hidden="true">
      <rect x={-6} y={-12} width={12} height={14} rx={5} fill="var(--color-surface-raised, white)" />
      <path d="M -4 2 L -3 22 L 3 22 L 4 2" fill="var(--color-surface-raised, white)" />
    </g>
  );
}

export function PolarPlot({ a, nullAnglesDeg, sources, description, onMoveSource }: PolarPlotProps) {
  const svgRef = useRef<SVGSVGElement>(null);
  const [draggingId, setDraggingId] = useState<string | null>(null);
  const segments = traceSegments(a);

  function bearingFromPointer(event: PointerEvent<SVGSVGElement>): number | null {
    const svg = svgRef.current;
    const matrix = svg?.getScreenCTM();
    if (!svg || !matrix) return null;
    const local = new DOMPoint(event.clientX, event.clientY).matrixTransform(matrix.inverse());
    const bearingDeg = (Math.atan2(local.x, -local.y) * 180) / Math.PI;
    return (Math.round(bearingDeg) + 360) % 360;
  }

  return (
    <svg
      ref={svgRef}
      viewBox="-230 -230 460 460"
      role="img"
      aria-label={description}
      className="mx-auto block h-auto w-full max-w-[30rem] touch-manipulation text-ink"
      onPointerMove={(event) => {
        if (!draggingId || !onMoveSource) return;
        const bearingDeg = bearingFromPointer(event);
        if (bearingDeg !== null) onMoveSource(draggingId, bearingDeg);
      }}
      onPointerUp={() => setDraggingId(null)}
      onPointerCancel={() => setDraggingId(null)}
      fontFamily="inherit"
    >
      <g aria-hidden="true">
        {RINGS_DB.map((ringDb) => (
          <circle key={ringDb} r={radiusForDb(ringDb)} fill="none" stroke={ringDb === 0 ? "var(--color-border, currentColor)" : GRID} strokeWidth={ringDb === 0 ? 1.5 : 1} />
        ))}
        {[0, 30, 60, 90, 120, 150].map((angleDeg) => {
          const [x1, y1] = point(angleDeg, RIM);
          const [x2, y2] = point(angleDeg + 180, RIM);
          return <line key={angleDeg} x1={x1} y1={y1} x2={x2} y2={y2} stroke={GRID} strokeWidth={1} />;
        })}
        {RINGS_DB.slice(1).map((ringDb) => {
          const [x, y] = point(15, radiusForDb(ringDb));
          return (
            <text key={ringDb} x={x + 3} y={y} fontSize={16} fill={MUTED}>
              {`\u2212${-ringDb}`}
            </text>
          );
        })}
        <text x={point(15, RIM)[0] + 3} y={point(15, RIM)[1] - 2} fontSize={16} fill={MUTED}>
          0 dB
        </text>
        {[0, 90, 180, 270].map((angleDeg) => {
          const [x, y] = point(angleDeg, RIM + 16);
          return (
            <text key={angleDeg} x={x} y={y + 6} fontSize={17} textAnchor="middle" fill={MUTED}>
              {`${angleDeg}°`}
            </text>
          );
        })}
        {nullAnglesDeg.map((angleDeg) => {
          const [x, y] = point(angleDeg, RIM);
          return <line key={angleDeg} x1={0} y1={0} x2={x} y2={y} stroke={MUTED} strokeWidth={1.5} strokeDasharray="2 5" />;
        })}
        {segments.map((segment, index) => (
          <path
            key={index}
            d={segment.d}
            fill="none"
            stroke={TRACE}
            strokeWidth={3.5}
            strokeLinejoin="round"
            strokeDasharray={segment.inverted ? "9 6" : undefined}
          />
        ))}
        <MicAtCentre />
      </g>
      {sources.map((source) => {
        const [tx, ty] = point(source.angleDeg, radiusForDb(source.levelDb));
        const [sx, sy] = point(source.angleDeg, SOURCE_RING);
        const [rx, ry] = point(source.angleDeg, RIM);
        return (
          <g key={source.id} aria-hidden="true">
            <line x1={rx} y1={ry} x2={sx} y2={sy} stroke={MUTED} strokeWidth={1} />
            <line x1={0} y1={0} x2={rx} y2={ry} stroke="var(--color-trace-2, currentColor)" strokeWidth={1.5} strokeOpacity={0.7} />
            <circle cx={tx} cy={ty} r={5.5} fill="var(--color-trace-2, currentColor)" stroke="var(--color-surface-raised, white)" strokeWidth={1.5} />
            <g
              transform={`translate(${sx} ${sy})`}
              style={{ cursor: onMoveSource ? (draggingId === source.id ? "grabbing" : "grab") : undefined, touchAction: "none" }}
              onPointerDown={(event) => {
                if (!onMoveSource) return;
                event.preventDefault();
                svgRef.current?.setPointerCapture(event.pointerId);
                setDraggingId(source.id);
              }}
            >
              <circle r={17} fill="var(--color-secondary-soft, white)" stroke="var(--color-trace-2, currentColor)" strokeWidth={2} />
              <text y={7} fontSize={19} fontWeight={700} textAnchor="middle" fill="var(--color-ink, currentColor)">
                {source.mark}
              </text>
            </g>
          </g>
        );
      })}
    </svg>
  );
}
