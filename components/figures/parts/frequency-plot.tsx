"use client";
// A level-versus-frequency plot, 20 Hz to 20 kHz on a log axis, drawn in SVG with the site's
// colour variables (light and dark). Traces come from lib/acoustics curves; −∞ is clamped.
import { useId, type ReactNode } from "react";

export interface FrequencyTrace {
  id: string;
  points: readonly { frequencyHz: number; levelDb: number }[];
  color: string;
  width?: number;
  dashed?: boolean;
}

export interface FrequencyPlotProps {
  traces: readonly FrequencyTrace[];
  minDb: number;
  maxDb: number;
  gridStepDb: number;
  description: string;
  /** Vertical marks (e.g. notch frequencies), drawn thin and dashed. */
  markersHz?: readonly number[];
  /** Extra drawing in plot coordinates (receives the scale functions). */
  overlay?: (scale: PlotScale) => ReactNode;
  testId?: string;
}

export interface PlotScale {
  x: (frequencyHz: number) => number;
  y: (levelDb: number) => number;
  left: number;
  right: number;
  top: number;
  bottom: number;
}

const WIDTH = 480;
const HEIGHT = 280;
const MARGIN = { left: 50, right: 14, top: 26, bottom: 38 };
const FROM_HZ = 20;
const TO_HZ = 20_000;
const GRID_HZ = [20, 50, 100, 200, 500, 1000, 2000, 5000, 10_000, 20_000];
const LABELLED_HZ: Record<number, string> = { 20: "20", 100: "100", 1000: "1k", 10_000: "10k" };

/** Two decimals: enough for a drawing, and identical on server and client (hydration). */
const round2 = (value: number) => Math.round(value * 100) / 100;

function scaleFor(minDb: number, maxDb: number): PlotScale {
  const left = MARGIN.left;
  const right = WIDTH - MARGIN.right;
  const top = MARGIN.top;
  const bottom = HEIGHT - MARGIN.bottom;
  return {
    left,
    right,
    top,
    bottom,
    x: (frequencyHz) => round2(left + ((right - left) * Math.log10(frequencyHz / FROM_HZ)) / Math.log10(TO_HZ / FROM_HZ)),
    y: (levelDb) => {
      const clamped = Math.max(minDb, Math.min(maxDb, levelDb));
      return round2(bottom - ((bottom - top) * (clamped - minDb)) / (maxDb - minDb));
    },
  };
}

// 0.1 px is below what a screen shows; finer figures only make the server-rendered page heavier.
const px = (value: number) => String(Math.round(value * 10) / 10);

function tracePath(points: FrequencyTrace["points"], scale: PlotScale): string {
  return points.map((sample, index) => `${index === 0 ? "M" : "L"} ${px(scale.x(sample.frequencyHz))} ${px(scale.y(sample.levelDb))}`).join(" ");
}

export function FrequencyPlot({ traces, minDb, maxDb, gridStepDb, description, markersHz = [], overlay, testId }: FrequencyPlotProps) {
  const scale = scaleFor(minDb, maxDb);
  const gridDb: number[] = [];
  for (let levelDb = Math.ceil(minDb / gridStepDb) * gridStepDb; levelDb <= maxDb; levelDb += gridStepDb) gridDb.push(levelDb);
  const clipId = `plot-clip-${useId().replace(/[^a-zA-Z0-9_-]/g, "")}`;
  return (
    <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-label={description} data-testid={testId} className="block h-auto w-full text-ink" fontFamily="inherit">
      <defs>
        <clipPath id={clipId}>
          <rect x={scale.left} y={scale.top - 2} width={scale.right - scale.left} height={scale.bottom - scale.top + 4} />
        </clipPath>
      </defs>
      <g aria-hidden="true">
        {GRID_HZ.map((frequencyHz) => (
          <line key={frequencyHz} x1={scale.x(frequencyHz)} x2={scale.x(frequencyHz)} y1={scale.top} y2={scale.bottom} stroke="var(--color-rule, currentColor)" strokeWidth={1} />
        ))}
        {gridDb.map((levelDb) => (
          <g key={levelDb}>
            <line x1={scale.left} x2={scale.right} y1={scale.y(levelDb)} y2={scale.y(levelDb)} stroke={levelDb === 0 ? "var(--color-border, currentColor)" : "var(--color-rule, currentColor)"} strokeWidth={levelDb === 0 ? 1.5 : 1} />
            <text x={scale.left - 6} y={scale.y(levelDb) + 6} fontSize={19} textAnchor="end" fill="var(--color-ink-muted, currentColor)">
              {levelDb > 0 ? `+${levelDb}` : levelDb < 0 ? `\u2212${-levelDb}` : "0"}
            </text>
          </g>
        ))}
        {Object.entries(LABELLED_HZ).map(([frequencyHz, label]) => (
          <text key={frequencyHz} x={scale.x(Number(frequencyHz))} y={scale.bottom + 22} fontSize={19} textAnchor="middle" fill="var(--color-ink-muted, currentColor)">
            {label}
          </text>
        ))}
        <text x={scale.right} y={HEIGHT - 2} fontSize={16} textAnchor="end" fill="var(--color-ink-muted, currentColor)">
          Hz
        </text>
        <text x={scale.left - 6} y={14} textAnchor="end" fontSize={16} fill="var(--color-ink-muted, currentColor)">
          dB
        </text>
        <g clipPath={`url(#${clipId})`}>
          {markersHz.map((frequencyHz) => (
            <line key={frequencyHz} x1={scale.x(frequencyHz)} x2={scale.x(frequencyHz)} y1={scale.top} y2={scale.bottom} stroke="var(--color-trace-4, currentColor)" strokeWidth={1.5} strokeDasharray="3 4" />
          ))}
          {traces.map((trace) => (
            <path key={trace.id} d={tracePath(trace.points, scale)} fill="none" stroke={trace.color} strokeWidth={trace.width ?? 3} strokeDasharray={trace.dashed ? "7 5" : undefined} strokeLinejoin="round" />
          ))}
          {overlay?.(scale)}
        </g>
        <rect x={scale.left} y={scale.top} width={scale.right - scale.left} height={scale.bottom - scale.top} fill="none" stroke="var(--color-border, currentColor)" strokeWidth={1} />
      </g>
    </svg>
  );
}
