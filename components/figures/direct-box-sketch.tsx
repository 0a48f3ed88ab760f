// Instrument → DI transformer (N:1) → mic preamp, with the level and impedance at each side and
// the pin 1 (shield) link that the ground-lift switch opens.
import { formatDb, formatNumber, formatOhms } from "./parts/format";

export interface DirectBoxSketchProps {
  sourceLevelDbu: number;
  sourceImpedanceOhms: number;
  preampLevelDbu: number;
  preampInputOhms: number;
  reflectedLoadOhms: number;
  turnsRatio: number;
  groundLift: boolean;
  description: string;
}

function Coil({ x, turns }: { x: number; turns: number }) {
  const loops = Math.max(2, Math.min(8, turns));
  const height = 60;
  const step = height / loops;
  const d = Array.from({ length: loops }, () => `a ${step / 2} ${step / 2} 0 0 1 0 ${step}`).join(" ");
  return <path d={`M ${x} ${70} ${d}`} fill="none" stroke="currentColor" strokeWidth={2} />;
}

export function DirectBoxSketch(props: DirectBoxSketchProps) {
  const muted = "var(--color-ink-muted, currentColor)";
  return (
    <svg viewBox="0 0 480 200" role="img" aria-label={props.description} className="mx-auto block h-auto w-full max-w-2xl text-ink" fontFamily="inherit" data-testid="direct-box-sketch">
      <g aria-hidden="true">
        <rect x={8} y={60} width={96} height={80} rx={8} fill="currentColor" fillOpacity={0.06} stroke="currentColor" strokeWidth={2} />
        <text x={56} y={54} fontSize={16} textAnchor="middle" fill={muted}>
          instrument
        </text>
        <text x={56} y={95} fontSize={16} textAnchor="middle" fill="currentColor">
          {formatDb(props.sourceLevelDbu, { unit: "dBu", digits: 0 })}
        </text>
        <text x={56} y={115} fontSize={16} textAnchor="middle" fill="currentColor">
          {formatOhms(props.sourceImpedanceOhms)}
        </text>
        <line x1={104} y1={100} x2={160} y2={100} stroke="currentColor" strokeWidth={2} />
        <text x={132} y={160} fontSize={14} textAnchor="middle" fill={muted}>
          sees
        </text>
        <text x={132} y={176} fontSize={15} textAnchor="middle" fill="var(--color-trace-2, currentColor)" fontWeight={700}>
          {formatOhms(props.reflectedLoadOhms)}
        </text>
        <rect x={160} y={40} width={130} height={120} rx={8} fill="var(--color-accent-soft, transparent)" stroke="var(--color-accent-line, currentColor)" strokeWidth={2} />
        <text x={225} y={34} fontSize={16} textAnchor="middle" fill={muted}>
          DI box
        </text>
        <Coil x={192} turns={Math.round(props.turnsRatio / 2) + 2} />
        <Coil x={240} turns={2} />
        <line x1={214} y1={64} x2={214} y2={136} stroke="currentColor" strokeWidth={1.5} />
        <line x1={220} y1={64} x2={220} y2={136} stroke="currentColor" strokeWidth={1.5} />
        <text x={217} y={155} fontSize={16} textAnchor="middle" fill="currentColor" fontWeight={700}>
          {`${formatNumber(props.turnsRatio, props.turnsRatio % 1 === 0 ? 0 : 1)}:1`}
        </text>
        <line x1={290} y1={90} x2={372} y2={90} stroke="currentColor" strokeWidth={2} />
        <text x={331} y={82} fontSize={14} textAnchor="middle" fill={muted}>
          pins 2, 3
        </text>
        {props.groundLift ? (
          <g>
            <line x1={290} y1={125} x2={318} y2={125} stroke="currentColor" strokeWidth={2} />
            <line x1={344} y1={125} x2={372} y2={125} stroke="currentColor" strokeWidth={2} />
            <text x={331} y={146} fontSize={14} textAnchor="middle" fill="var(--color-caution, currentColor)" fontWeight={700}>
              pin 1
            </text>
            <text x={331} y={162} fontSize={14} textAnchor="middle" fill="var(--color-caution, currentColor)" fontWeight={700}>
              lifted
            </text>
          </g>
        ) : (
          <g>
            <line x1={290} y1={125} x2={372} y2={125} stroke="currentColor" strokeWidth={2} />
            <text x={331} y={146} fontSize={14} textAnchor="middle" fill={muted}>
              pin 1
            </text>
            <text x={331} y={162} fontSize={14} textAnchor="middle" fill={muted}>
              (shield)
            </text>
          </g>
        )}
        <rect x={372} y={60} width={100} height={80} rx={8} fill="currentColor" fillOpacity={0.06} stroke="currentColor" strokeWidth={2} />
        <text x={422} y={54} fontSize={16} textAnchor="middle" fill={muted}>
          mic preamp
        </text>
        <text x={422} y={95} fontSize={16} textAnchor="middle" fill="currentColor">
          {formatDb(props.preampLevelDbu, { unit: "dBu", digits: 1 })}
        </text>
        <text x={422} y={115} fontSize={16} textAnchor="middle" fill="currentColor">
          {formatOhms(props.preampInputOhms)}
        </text>
      </g>
    </svg>
  );
}
