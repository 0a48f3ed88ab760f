// Club stage plan from above: backline, vocal and wedge, stage box, audience edge, FOH direction.
import { STAGE_PLAN_DIAGRAM, STAGE_PLAN_PARTS as P } from "./data/stage-plan";
import { resolveDiagramFrame, type DiagramDrawingProps } from "./diagram-frame";
import { DiagramSvg } from "./diagram-svg";
import { Arrow, NoteText } from "./drawing-parts";
import { BODY_FILL_OPACITY, DETAIL } from "./palette";

interface Box {
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

function BoxShape({ box, rx = 3, strokeWidth = 2 }: { box: Box; rx?: number; strokeWidth?: number }) {
  return (
    <rect
      x={box.left} y={box.top} width={box.right - box.left} height={box.bottom - box.top} rx={rx}
      fill="currentColor" fillOpacity={BODY_FILL_OPACITY} strokeWidth={strokeWidth}
    />
  );
}

/** A speaker cabinet from above; the thick line is its front, facing the audience. */
function Cabinet({ box }: { box: Box }) {
  return (
    <g>
      <BoxShape box={box} />
      <line x1={box.left + 3} y1={box.bottom} x2={box.right - 3} y2={box.bottom} strokeWidth={5} />
    </g>
  );
}

/** Drum riser with a small kit outline on it (kick pointing downstage). */
function DrumRiser() {
  const r = P.riser;
  const cx = (r.left + r.right) / 2;
  return (
    <g>
      <BoxShape box={r} rx={2} strokeWidth={2.5} />
      <g stroke={DETAIL} strokeWidth={1.5}>
        <rect x={cx - 13} y={r.top + 14} width={26} height={34} rx={2} />
        <circle cx={cx - 30} cy={r.top + 52} r={10} />
        <circle cx={cx + 32} cy={r.top + 54} r={12} />
        <circle cx={cx - 50} cy={r.top + 38} r={9} />
        <circle cx={cx - 42} cy={r.top + 16} r={12} />
        <circle cx={cx + 44} cy={r.top + 20} r={14} />
      </g>
    </g>
  );
}

function Keyboard() {
  const k = P.keyboard;
  const keyCount = 14;
  const keyWidth = (k.right - k.left) / keyCount;
  return (
    <g>
      <BoxShape box={k} rx={2} />
      <g stroke={DETAIL} strokeWidth={1}>
        {Array.from({ length: keyCount - 1 }, (_, index) => {
          const x = k.left + keyWidth * (index + 1);
          return <line key={index} x1={x} y1={k.top + 10} x2={x} y2={k.bottom} />;
        })}
      </g>
    </g>
  );
}

/** Mic stand from above: three legs around the stand. */
function VocalStand() {
  const { cx, cy } = P.vocalStand;
  const legLength = 16;
  return (
    <g stroke={DETAIL} strokeWidth={2}>
      {[90, 210, 330].map((angleDeg) => {
        const radians = (angleDeg * Math.PI) / 180;
        const x2 = Math.round((cx + Math.cos(radians) * legLength) * 10) / 10;
        const y2 = Math.round((cy - Math.sin(radians) * legLength) * 10) / 10;
        return <line key={angleDeg} x1={cx} y1={cy} x2={x2} y2={y2} />;
      })}
    </g>
  );
}

/** Floor wedge from above: the wide sloped face (upstage side) faces the singer. */
function Wedge() {
  const w = P.wedge;
  const half = w.width / 2;
  const top = w.cy - w.depth / 2;
  const bottom = w.cy + w.depth / 2;
  return (
    <g>
      <polygon
        points={`${w.cx - half},${top} ${w.cx + half},${top} ${w.cx + half - 8},${bottom} ${w.cx - half + 8},${bottom}`}
        fill="currentColor" fillOpacity={BODY_FILL_OPACITY}
      />
      <line x1={w.cx - half + 3} y1={top} x2={w.cx + half - 3} y2={top} strokeWidth={5} />
    </g>
  );
}

function StageBoxAndMulticore() {
  const b = P.stageBox;
  const cableX = (b.left + b.right) / 2;
  return (
    <g>
      <BoxShape box={b} rx={2} strokeWidth={2.5} />
      <path d={`M ${cableX} ${b.bottom} L ${cableX} 420`} strokeWidth={4} strokeDasharray="10 6" stroke={DETAIL} />
      <NoteText x={cableX - 10} y={392} anchor="end">Multicore to FOH</NoteText>
    </g>
  );
}

export function StagePlanDiagram(props: DiagramDrawingProps) {
  const frame = resolveDiagramFrame("stage-plan", STAGE_PLAN_DIAGRAM, props);
  const s = P.stage;
  return (
    <DiagramSvg frame={frame}>
      <NoteText x={(s.left + s.right) / 2} y={s.top - 14}>Upstage (back wall)</NoteText>
      {/* Stage right is the band's right as they face the audience: the left of this drawing. */}
      <NoteText x={s.left} y={s.top - 14} anchor="start">Stage right</NoteText>
      <NoteText x={s.right} y={s.top - 14} anchor="end">Stage left</NoteText>
      <rect x={s.left} y={s.top} width={s.right - s.left} height={s.audienceEdge - s.top} fill="currentColor" fillOpacity={0.03} strokeWidth={1.5} />
      <line x1={s.left - 8} y1={s.audienceEdge} x2={s.right + 8} y2={s.audienceEdge} strokeWidth={5} />
      <NoteText x={s.left} y={s.audienceEdge + 24} anchor="start">Audience edge</NoteText>
      <DrumRiser />
      <Cabinet box={P.bassCab} />
      <Cabinet box={P.guitarCab} />
      <Keyboard />
      <VocalStand />
      <Wedge />
      <StageBoxAndMulticore />
      <Arrow fromX={P.frontOfHouseArrowX} fromY={s.audienceEdge + 14} toX={P.frontOfHouseArrowX} toY={s.audienceEdge + 74} headLength={14} strokeWidth={2.5} />
      <NoteText x={P.frontOfHouseArrowX - 14} y={s.audienceEdge + 56} anchor="end">To front of house</NoteText>
    </DiagramSvg>
  );
}
