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

const TALKER = { x: 60, y: 120 };
const MIC = { x: 106, y: 120 };
const SPEAKER = { x: 200, y: 48 };
const LISTENER = { x: 436, y: 120 };

function Label({ x, y, children, anchor = "middle" }: { x: number; y: number; children: string; anchor?: "start" | "middle" | "end" }) {
  return (
    <text x={x} y={y} fontSize={17} textAnchor={anchor} fill="var(--color-ink, currentColor)" paintOrder="stroke" stroke="var(--color-surface-raised, white)" strokeWidth={4}>
      {children}
    </text>
  );
}

export function FeedbackStagePlan({ dsM, d0M, d1M, d2M, eadM, indoor, system, description }: FeedbackStagePlanProps) {
  const line = "var(--color-ink-muted, currentColor)";
  return (
    <svg viewBox="0 0 480 220" role="img" aria-label={description} className="mx-auto block h-auto w-full max-w-2xl text-ink" fontFamily="inherit" data-testid="feedback-plan">
      <g aria-hidden="true">
        <rect x={4} y={4} width={472} height={212} rx={6} fill="none" stroke="currentColor" strokeWidth={indoor ? 3 : 1} strokeDasharray={indoor ? undefined : "2 6"} />
        <text x={12} y={208} fontSize={15} fill={line}>
          {indoor ? "room walls" : "open air"}
        </text>
        <rect x={14} y={70} width={156} height={112} rx={4} fill="currentColor" fillOpacity={0.05} stroke="var(--color-rule, currentColor)" />
        <text x={20} y={90} fontSize={15} fill={line}>
          stage
        </text>
        <line x1={TALKER.x} y1={TALKER.y} x2={LISTENER.x} y2={LISTENER.y} stroke={line} strokeWidth={1.5} strokeDasharray="5 4" />
        <line x1={MIC.x} y1={MIC.y} x2={SPEAKER.x} y2={SPEAKER.y} stroke="var(--color-trace-4, currentColor)" strokeWidth={2.5} />
        <line x1={SPEAKER.x} y1={SPEAKER.y} x2={LISTENER.x} y2={LISTENER.y} stroke="var(--color-trace-2, currentColor)" strokeWidth={2.5} />
        <line x1={LISTENER.x - 50} y1={LISTENER.y + 34} x2={LISTENER.x} y2={LISTENER.y + 34} stroke="var(--color-trace-3, currentColor)" strokeWidth={2.5} />
        <circle cx={TALKER.x} cy={TALKER.y} r={13} fill="var(--color-secondary-soft, white)" stroke="var(--color-trace-2, currentColor)" strokeWidth={2} />
        <text x={TALKER.x} y={TALKER.y + 6} fontSize={16} fontWeight={700} textAnchor="middle" fill="currentColor">
          T
        </text>
        <rect x={MIC.x - 5} y={MIC.y - 9} width={10} height={18} rx={4} fill="var(--color-accent-soft, white)" stroke="var(--color-accent-line, currentColor)" strokeWidth={2} />
        <rect x={SPEAKER.x - 17} y={SPEAKER.y - 13} width={34} height={26} rx={3} fill="currentColor" fillOpacity={0.12} stroke="currentColor" strokeWidth={2} />
        <circle cx={LISTENER.x} cy={LISTENER.y} r={11} fill="var(--color-surface-raised, white)" stroke="currentColor" strokeWidth={2} />
        <Label x={TALKER.x} y={TALKER.y + 36}>talker</Label>
        <Label x={MIC.x + 10} y={MIC.y + 36}>mic</Label>
        <Label x={SPEAKER.x} y={SPEAKER.y - 20}>loudspeaker</Label>
        <Label x={LISTENER.x} y={LISTENER.y - 20}>listener</Label>
        <Label x={(TALKER.x + MIC.x) / 2 + 10} y={TALKER.y + 58}>{`Dₛ ${formatLength(dsM, system)}`}</Label>
        <Label x={(MIC.x + SPEAKER.x) / 2 + 14} y={(MIC.y + SPEAKER.y) / 2 + 10} anchor="start">{`D₁ ${formatLength(d1M, system)}`}</Label>
        <Label x={(SPEAKER.x + LISTENER.x) / 2 + 10} y={(SPEAKER.y + LISTENER.y) / 2 - 10}>{`D₂ ${formatLength(d2M, system)}`}</Label>
        <Label x={300} y={TALKER.y + 24}>{`D₀ ${formatLength(d0M, system)}`}</Label>
        <Label x={LISTENER.x - 30} y={LISTENER.y + 58}>{`EAD ${formatLength(eadM, system)}`}</Label>
      </g>
    </svg>
  );
}
