// Level against distance on a log distance axis (metres or feet): the inverse-square line, with
// the reference, the current distance and the target distance marked.
import type { UnitSystem } from "./units-preference";
import { lengthToDisplay, lengthUnit } from "./parts/display-units";

const WIDTH = 480;
const HEIGHT = 250;
const MARGIN = { left: 50, right: 26, top: 26, bottom: 38 };

export interface LevelDistancePoint {
  distanceM: number;
  levelDb: number;
}

export interface DistanceLevelPlotProps {
  curve: readonly LevelDistancePoint[];
  reference: LevelDistancePoint;
  current: LevelDistancePoint;
  target: LevelDistancePoint;
  system: UnitSystem;
  description: string;
}

export function DistanceLevelPlot({ curve, reference, current, target, system, description }: DistanceLevelPlotProps) {
  const fromDisplay = lengthToDisplay(curve[0].distanceM, system);
  const toDisplay = lengthToDisplay(curve[curve.length - 1].distanceM, system);
  const levels = curve.map((sample) => sample.levelDb);
  const maxDb = Math.ceil(Math.max(...levels) / 10) * 10;
  const minDb = Math.floor(Math.min(...levels) / 10) * 10;
  const left = MARGIN.left;
  const right = WIDTH - MARGIN.right;
  const top = MARGIN.top;
  const bottom = HEIGHT - MARGIN.bottom;
  const round2 = (value: number) => Math.round(value * 100) / 100;
  const x = (distanceM: number) => round2(left + ((right - left) * Math.log10(lengthToDisplay(distanceM, system) / fromDisplay)) / Math.log10(toDisplay / fromDisplay));
  const y = (levelDb: number) => round2(bottom - ((bottom - top) * (levelDb - minDb)) / (maxDb - minDb || 1));
  const decadeTicks: number[] = [];
  for (let exponent = Math.ceil(Math.log10(fromDisplay)); exponent <= Math.floor(Math.log10(toDisplay)); exponent += 1) decadeTicks.push(10 ** exponent);
  const levelTicks: number[] = [];
  const levelStep = maxDb - minDb > 60 ? 20 : 10;
  for (let levelDb = minDb; levelDb <= maxDb; levelDb += levelStep) levelTicks.push(levelDb);
  const unit = lengthUnit(system);
  const path = curve.map((sample, index) => `${index === 0 ? "M" : "L"} ${x(sample.distanceM).toFixed(2)} ${y(sample.levelDb).toFixed(2)}`).join(" ");
  // Tick positions are display-unit values; convert the x function's input back through metres.
  const xDisplay = (value: number) => round2(left + ((right - left) * Math.log10(value / fromDisplay)) / Math.log10(toDisplay / fromDisplay));

  return (
    <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-label={description} className="block h-auto w-full text-ink" fontFamily="inherit" data-testid="distance-level-plot">
      <g aria-hidden="true">
        {decadeTicks.map((value) => (
          <g key={value}>
            <line x1={xDisplay(value)} x2={xDisplay(value)} y1={top} y2={bottom} stroke="var(--color-rule, currentColor)" />
            <text x={xDisplay(value)} y={bottom + 22} fontSize={19} textAnchor="middle" fill="var(--color-ink-muted, currentColor)">
              {value >= 1 ? value.toFixed(0) : value.toString()}
            </text>
          </g>
        ))}
        {levelTicks.map((levelDb) => (
          <g key={levelDb}>
            <line x1={left} x2={right} y1={y(levelDb)} y2={y(levelDb)} stroke="var(--color-rule, currentColor)" />
            <text x={left - 6} y={y(levelDb) + 6} fontSize={19} textAnchor="end" fill="var(--color-ink-muted, currentColor)">
              {levelDb}
            </text>
          </g>
        ))}
        <text x={right} y={HEIGHT - 2} fontSize={16} textAnchor="end" fill="var(--color-ink-muted, currentColor)">
          {unit}
        </text>
        <text x={left - 6} y={14} textAnchor="end" fontSize={16} fill="var(--color-ink-muted, currentColor)">
          dB
        </text>
        <rect x={left} y={top} width={right - left} height={bottom - top} fill="none" stroke="var(--color-border, currentColor)" />
        <path d={path} fill="none" stroke="var(--color-trace-1, currentColor)" strokeWidth={3} />
        <line x1={x(current.distanceM)} y1={y(current.levelDb)} x2={x(target.distanceM)} y2={y(target.levelDb)} stroke="var(--color-trace-4, currentColor)" strokeWidth={2} strokeDasharray="4 4" />
        <rect x={x(reference.distanceM) - 6} y={y(reference.levelDb) - 6} width={12} height={12} fill="var(--color-surface-raised, white)" stroke="var(--color-ink, currentColor)" strokeWidth={2} />
        <circle cx={x(current.distanceM)} cy={y(current.levelDb)} r={7} fill="var(--color-trace-2, currentColor)" stroke="var(--color-surface-raised, white)" strokeWidth={2} />
        <circle cx={x(target.distanceM)} cy={y(target.levelDb)} r={7} fill="none" stroke="var(--color-trace-4, currentColor)" strokeWidth={3} />
      </g>
    </svg>
  );
}
