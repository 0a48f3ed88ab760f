// The source and the two mics on a line, spaced to scale, with their distances labelled.
import type { UnitSystem } from "./units-preference";
import { formatLength } from "./parts/display-units";

const WIDTH = 480;
const LEFT = 34;
const RIGHT = 440;

function MicMark({ x, label }: { x: number; label: string }) {
  return (
    <g>
      <rect x={x - 6} y={26} width={12} height={16} rx={5} fill="var(--color-accent-soft, white)" stroke="var(--color-accent-line, currentColor)" strokeWidth={2} />
      <line x1={x} y1={42} x2={x} y2={56} stroke="var(--color-accent-line, currentColor)" strokeWidth={2} />
      <text x={x} y={18} fontSize={17} textAnchor="middle" fill="var(--color-ink, currentColor)">
        {label}
      </text>
    </g>
  );
}

export function TwoMicsSketch({ nearM, farM, system }: { nearM: number; farM: number; system: UnitSystem }) {
  const xNear = LEFT + ((RIGHT - LEFT) * nearM) / farM;
  return (
    <svg
      viewBox={`0 0 ${WIDTH} 96`}
      role="img"
      aria-label={`To scale: the source, the near mic ${formatLength(nearM, system)} away and the far mic ${formatLength(farM, system)} away.`}
      className="mx-auto block h-auto w-full max-w-xl text-ink"
      fontFamily="inherit"
    >
      <g aria-hidden="true">
        <circle cx={LEFT} cy={36} r={11} fill="var(--color-secondary-soft, white)" stroke="var(--color-trace-2, currentColor)" strokeWidth={2} />
        <text x={LEFT} y={41} fontSize={17} fontWeight={700} textAnchor="middle" fill="var(--color-ink, currentColor)">
          S
        </text>
        <line x1={LEFT} y1={64} x2={RIGHT} y2={64} stroke="var(--color-border, currentColor)" strokeWidth={1} />
        <MicMark x={xNear} label="near" />
        <MicMark x={RIGHT} label="far" />
        <text x={(LEFT + xNear) / 2} y={90} fontSize={17} textAnchor="middle" fill="var(--color-ink-muted, currentColor)">
          {formatLength(nearM, system)}
        </text>
        <text x={RIGHT} y={90} fontSize={17} textAnchor="end" fill="var(--color-ink-muted, currentColor)">
          {formatLength(farM, system)}
        </text>
      </g>
    </svg>
  );
}
