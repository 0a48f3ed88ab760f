// The chain drawn as columns: each stage's usable window from its noise floor up to its clip
// point, the signal level as a dot on a line through the chain, and the noise as a dashed line.
// dBu on the left axis, dBFS (under the chosen alignment) on the right. Drawing only: the
// numbers arrive computed (gain-structure-chain.ts).
import type { ChainPoint } from "./gain-structure-chain";
import { formatNumber } from "./parts/format";

export interface GainStructurePlotProps {
  points: readonly ChainPoint[];
  fullScaleDbu: number;
  description: string;
}

const WIDTH = 480;
const HEIGHT = 344;
const LEFT = 50;
const RIGHT = 430;
const TOP = 28;
const BOTTOM = 300;
const MAX_DBU = 30;
const MIN_DBU = -140;

const y = (levelDbu: number) => TOP + ((MAX_DBU - Math.max(MIN_DBU, Math.min(MAX_DBU, levelDbu))) / (MAX_DBU - MIN_DBU)) * (BOTTOM - TOP);

/** Short names under the columns, so they fit a 320 px screen; the table gives the full ones. */
const PLOT_LABELS: Record<ChainPoint["id"], string> = { mic: "Mic", pad: "Pad", preamp: "Preamp", channel: "Fader", bus: "Bus", converter: "A/D" };

const MUTED = "var(--color-ink-muted, currentColor)";
const DANGER = "var(--color-danger, currentColor)";
const SIGNAL = "var(--color-trace-1, currentColor)";
const NOISE = "var(--color-trace-3, currentColor)";

function Axes({ fullScaleDbu }: { fullScaleDbu: number }) {
  const dbuTicks = [20, 0, -20, -40, -60, -80, -100, -120, -140];
  // dBFS ticks every 20 dB down from full scale, where they fall on the dBu scale.
  const dbfsTicks = [0, -20, -40, -60, -80, -100, -120, -140].filter((dbfs) => fullScaleDbu + dbfs >= MIN_DBU);
  return (
    <g>
      <line x1={LEFT} x2={LEFT} y1={TOP} y2={BOTTOM} stroke={MUTED} strokeWidth={1} />
      <line x1={RIGHT} x2={RIGHT} y1={TOP} y2={BOTTOM} stroke={MUTED} strokeWidth={1} />
      {dbuTicks.map((tick) => (
        <g key={`u${tick}`}>
          <line x1={LEFT} x2={RIGHT} y1={y(tick)} y2={y(tick)} stroke="currentColor" strokeOpacity={0.08} />
          <text x={LEFT - 6} y={y(tick) + 5} fontSize={14} textAnchor="end" fill={MUTED}>
            {formatNumber(tick, 0)}
          </text>
        </g>
      ))}
      {dbfsTicks.map((tick) => (
        <text key={`f${tick}`} x={RIGHT + 6} y={y(fullScaleDbu + tick) + 5} fontSize={14} fill={MUTED}>
          {formatNumber(tick, 0)}
        </text>
      ))}
      <text x={LEFT - 6} y={BOTTOM + 39} fontSize={14} textAnchor="end" fill={MUTED}>
        dBu
      </text>
      <text x={RIGHT + 6} y={BOTTOM + 39} fontSize={14} fill={MUTED}>
        dBFS
      </text>
    </g>
  );
}

export function GainStructurePlot({ points, fullScaleDbu, description }: GainStructurePlotProps) {
  const step = (RIGHT - LEFT) / points.length;
  const x = (index: number) => LEFT + step * (index + 0.5);
  const signalLine = points.map((point, index) => `${x(index)},${y(point.levelDbu)}`).join(" ");
  const noiseLine = points.map((point, index) => `${x(index)},${y(point.noiseDbu)}`).join(" ");
  return (
    <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-label={description} className="mx-auto block h-auto w-full max-w-2xl text-ink" fontFamily="inherit" data-testid="gain-structure-plot">
      <g aria-hidden="true">
        <Axes fullScaleDbu={fullScaleDbu} />
        {points.map((point, index) => {
          const top = Number.isFinite(point.clipDbu) ? y(point.clipDbu) : TOP;
          return (
            <g key={point.id}>
              <rect x={x(index) - step * 0.32} y={top} width={step * 0.64} height={Math.max(0, y(point.noiseDbu) - top)} fill="currentColor" fillOpacity={0.07} rx={3} />
              {Number.isFinite(point.clipDbu) && <line x1={x(index) - step * 0.36} x2={x(index) + step * 0.36} y1={top} y2={top} stroke={DANGER} strokeWidth={3} />}
              <text x={x(index)} y={BOTTOM + 19} fontSize={15} textAnchor="middle" fill="currentColor" fontWeight={600}>
                {PLOT_LABELS[point.id]}
              </text>
            </g>
          );
        })}
        <polyline points={noiseLine} fill="none" stroke={NOISE} strokeWidth={2} strokeDasharray="5 4" />
        <polyline points={signalLine} fill="none" stroke={SIGNAL} strokeWidth={2.5} />
        {points.map((point, index) => (
          <g key={`dot-${point.id}`}>
            <circle cx={x(index)} cy={y(point.levelDbu)} r={point.clips ? 7 : 5} fill={point.clips ? DANGER : SIGNAL} stroke="var(--color-surface-raised, white)" strokeWidth={2} />
            {point.clips && (
              <text x={x(index)} y={y(point.levelDbu) - 11} fontSize={12} textAnchor="middle" fill={DANGER} fontWeight={700}>
                clips
              </text>
            )}
          </g>
        ))}
        <g fontSize={14} fill={MUTED}>
          <line x1={LEFT + 4} x2={LEFT + 24} y1={BOTTOM + 34} y2={BOTTOM + 34} stroke={SIGNAL} strokeWidth={2.5} />
          <text x={LEFT + 28} y={BOTTOM + 38}>
            signal
          </text>
          <line x1={LEFT + 80} x2={LEFT + 100} y1={BOTTOM + 34} y2={BOTTOM + 34} stroke={NOISE} strokeWidth={2} strokeDasharray="5 4" />
          <text x={LEFT + 104} y={BOTTOM + 39}>
            noise
          </text>
          <line x1={LEFT + 150} x2={LEFT + 170} y1={BOTTOM + 34} y2={BOTTOM + 34} stroke={DANGER} strokeWidth={3} />
          <text x={LEFT + 174} y={BOTTOM + 39}>
            clip point
          </text>
        </g>
      </g>
    </svg>
  );
}
