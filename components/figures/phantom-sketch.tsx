// The phantom feed: the supply through one resistor R into each signal leg, the mic drawing I,
// and the return through pin 1.
import { formatNumber, formatOhms } from "./parts/format";

export interface PhantomSketchProps {
  supplyV: number;
  resistorOhms: number;
  currentMa: number;
  voltsAtMic: number | null;
  description: string;
}

function Resistor({ x, y }: { x: number; y: number }) {
  return <path d={`M ${x} ${y} l 8 -8 l 10 16 l 10 -16 l 10 16 l 10 -16 l 8 8`} fill="none" stroke="currentColor" strokeWidth={2} />;
}

export function PhantomSketch({ supplyV, resistorOhms, currentMa, voltsAtMic, description }: PhantomSketchProps) {
  const muted = "var(--color-ink-muted, currentColor)";
  return (
    <svg viewBox="0 0 480 196" role="img" aria-label={description} className="mx-auto block h-auto w-full max-w-2xl text-ink" fontFamily="inherit" data-testid="phantom-sketch">
      <g aria-hidden="true">
        <rect x={8} y={40} width={104} height={110} rx={8} fill="currentColor" fillOpacity={0.06} stroke="currentColor" strokeWidth={2} />
        <text x={60} y={32} fontSize={16} textAnchor="middle" fill={muted}>
          supply
        </text>
        <text x={60} y={100} fontSize={19} textAnchor="middle" fill="currentColor" fontWeight={700}>
          {`${formatNumber(supplyV, 1)} V`}
        </text>
        <line x1={112} y1={70} x2={150} y2={70} stroke="currentColor" strokeWidth={2} />
        <line x1={112} y1={120} x2={150} y2={120} stroke="currentColor" strokeWidth={2} />
        <line x1={150} y1={70} x2={150} y2={120} stroke="currentColor" strokeWidth={2} />
        <line x1={150} y1={70} x2={170} y2={70} stroke="currentColor" strokeWidth={2} />
        <line x1={150} y1={120} x2={170} y2={120} stroke="currentColor" strokeWidth={2} />
        <Resistor x={170} y={70} />
        <Resistor x={170} y={120} />
        <text x={199} y={54} fontSize={16} textAnchor="middle" fill={muted}>
          {`R ${formatOhms(resistorOhms)}`}
        </text>
        <text x={199} y={146} fontSize={16} textAnchor="middle" fill={muted}>
          {`R ${formatOhms(resistorOhms)}`}
        </text>
        <line x1={226} y1={70} x2={360} y2={70} stroke="currentColor" strokeWidth={2} />
        <line x1={226} y1={120} x2={360} y2={120} stroke="currentColor" strokeWidth={2} />
        <line x1={60} y1={150} x2={60} y2={168} stroke="currentColor" strokeWidth={2} />
        <line x1={416} y1={150} x2={416} y2={168} stroke="currentColor" strokeWidth={2} />
        <line x1={60} y1={168} x2={416} y2={168} stroke="currentColor" strokeWidth={2} strokeDasharray="6 4" />
        <text x={292} y={62} fontSize={16} textAnchor="middle" fill={muted}>
          pin 2
        </text>
        <text x={292} y={112} fontSize={16} textAnchor="middle" fill={muted}>
          pin 3
        </text>
        <text x={238} y={190} fontSize={16} textAnchor="middle" fill={muted}>
          pin 1: the return
        </text>
        <path d="M 250 92 l 30 0 m -8 -6 l 8 6 l -8 6" fill="none" stroke="var(--color-trace-2, currentColor)" strokeWidth={2} />
        <text x={265} y={86} fontSize={16} textAnchor="middle" fill="var(--color-trace-2, currentColor)" fontWeight={700}>
          {`${formatNumber(currentMa, 1)} mA`}
        </text>
        <rect x={360} y={40} width={112} height={110} rx={8} fill="var(--color-accent-soft, transparent)" stroke="var(--color-accent-line, currentColor)" strokeWidth={2} />
        <text x={416} y={32} fontSize={16} textAnchor="middle" fill={muted}>
          mic
        </text>
        <text x={416} y={100} fontSize={19} textAnchor="middle" fill="currentColor" fontWeight={700}>
          {voltsAtMic === null ? "—" : `${formatNumber(voltsAtMic, 1)} V`}
        </text>
      </g>
    </svg>
  );
}
