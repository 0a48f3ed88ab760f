// A schematic stage plan (not to scale) seen from above: talker and mic on stage, the main
// loudspeaker at the stage edge, the farthest listener at the back, each distance labelled.
import type { UnitSystem } from "./units-preference";
import { formatLength } from "./parts/display-units";

export interface FeedbackStagePlanProps {
  dsM: number;
  d0M: number;
  d1M: number;
  d2M: number;
  eadM: number;
  indoor: boolean;
  system: UnitSystem;
  description: string;
}

const TALKER = { x: 70, y: 110 };
const MIC = { x: 118, y: 110 };
const SPEAKER = { x: 190, y: 40 };
const LISTENER = { x: 440, y: 110 };

function Label({ x, y, children, anchor = "middle" }: { x: number; y: number; children: string; anchor?: "start" | "middle" | "end" }) {
  return (
    <text x={x} y={y} fontSize={13} textAnchor={anchor} fill="var(--color-ink, currentColor)" paintOrder="stroke" stroke="var(--color-surface-raised, white)" strokeWidth={4}>
      {children}
    </text>
  );
}

export function FeedbackStagePlan({ dsM, d0M, d1M, d2M, eadM, indoor, system, description }: FeedbackStagePlanProps) {
  const line = "var(--color-ink-muted, currentColor)";
  return (
    <svg viewBox="0 0 480 200" role="img" aria-label={description} className="mx-auto block h-auto w-full max-w-2xl text-ink" fontFamily="inherit" data-testid="feedback-plan">
      <g aria-hidden="true">
        <rect x={6} y={6} width={468} height={188} rx={6} fill="none" stroke="currentColor" strokeWidth={indoor ? 3 : 1} strokeDasharray={indoor ? undefined : "2 6"} />
        <text x={14} y={188} fontSize={12} fill={line}>
          {indoor ? "room walls" : "open air"}
        </text>
        <rect x={16} y={62} width={150} height={100} rx={4} fill="currentColor" fillOpacity={0.05} stroke="var(--color-rule, currentColor)" />
        <text x={24} y={156} fontSize={12} fill={line}>
          stage
        </text>
        <line x1={TALKER.x} y1={TALKER.y} x2={LISTENER.x} y2={LISTENER.y} stroke={line} strokeWidth={1.5} strokeDasharray="5 4" />
        <line x1={MIC.x} y1={MIC.y} x2={SPEAKER.x} y2={SPEAKER.y} stroke="var(--color-trace-4, currentColor)" strokeWidth={2} />
        <line x1={SPEAKER.x} y1={SPEAKER.y} x2={LISTENER.x} y2={LISTENER.y} stroke="var(--color-trace-2, currentColor)" strokeWidth={2} />
        <line x1={LISTENER.x - 50} y1={LISTENER.y + 34} x2={LISTENER.x} y2={LISTENER.y + 34} stroke="var(--color-trace-3, currentColor)" strokeWidth={2} />
        <circle cx={TALKER.x} cy={TALKER.y} r={12} fill="var(--color-secondary-soft, white)" stroke="var(--color-trace-2, currentColor)" strokeWidth={2} />
        <text x={TALKER.x} y={TALKER.y + 5} fontSize={13} fontWeight={700} textAnchor="middle" fill="currentColor">
          T
        </text>
        <rect x={MIC.x - 5} y={MIC.y - 8} width={10} height={16} rx={4} fill="var(--color-accent-soft, white)" stroke="var(--color-accent-line, currentColor)" strokeWidth={2} />
        <rect x={SPEAKER.x - 16} y={SPEAKER.y - 12} width={32} height={24} rx={3} fill="currentColor" fillOpacity={0.12} stroke="currentColor" strokeWidth={2} />
        <circle cx={LISTENER.x} cy={LISTENER.y} r={10} fill="var(--color-surface-raised, white)" stroke="currentColor" strokeWidth={2} />
        <Label x={TALKER.x} y={TALKER.y + 30}>talker</Label>
        <Label x={MIC.x + 8} y={MIC.y + 28}>mic</Label>
        <Label x={SPEAKER.x} y={SPEAKER.y - 18}>loudspeaker</Label>
        <Label x={LISTENER.x} y={LISTENER.y - 18}>listener</Label>
        <Label x={(TALKER.x + MIC.x) / 2} y={TALKER.y + 48}>{`Dₛ ${formatLength(dsM, system)}`}</Label>
        <Label x={(MIC.x + SPEAKER.x) / 2 + 16} y={(MIC.y + SPEAKER.y) / 2 + 6} anchor="start">{`D₁ ${formatLength(d1M, system)}`}</Label>
        <Label x={(SPEAKER.x + LISTENER.x) / 2} y={(SPEAKER.y + LISTENER.y) / 2 - 8}>{`D₂ ${formatLength(d2M, system)}`}</Label>
        <Label x={(TALKER.x + LISTENER.x) / 2 + 40} y={TALKER.y + 20}>{`D₀ ${formatLength(d0M, system)}`}</Label>
        <Label x={LISTENER.x - 25} y={LISTENER.y + 54}>{`EAD ${formatLength(eadM, system)}`}</Label>
      </g>
    </svg>
  );
}
