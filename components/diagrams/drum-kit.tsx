// Drum kit from above (drummer's view: audience side at the top), with mic positions.
import { DRUM_KIT_DIAGRAM, DRUM_KIT_PARTS as P } from "./data/drum-kit";
import { resolveDiagramFrame, type DiagramDrawingProps } from "./diagram-frame";
import { DiagramSvg } from "./diagram-svg";
import { Arrow, NoteText } from "./drawing-parts";
import { BODY_FILL_OPACITY, DETAIL } from "./palette";

function Cymbal({ cx, cy, r }: { cx: number; cy: number; r: number }) {
  return (
    <g>
      <circle cx={cx} cy={cy} r={r} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} />
      <circle cx={cx} cy={cy} r={r * 0.68} stroke={DETAIL} strokeWidth={1} />
      <circle cx={cx} cy={cy} r={r * 0.42} stroke={DETAIL} strokeWidth={1} />
      <circle cx={cx} cy={cy} r={r * 0.2} strokeWidth={1.5} />
      <circle cx={cx} cy={cy} r={2.5} fill="currentColor" stroke="none" />
    </g>
  );
}

/** A drum head seen from above: shell/hoop ring and the head inside it. */
function DrumHead({ cx, cy, rx, ry }: { cx: number; cy: number; rx: number; ry: number }) {
  return (
    <g>
      <ellipse cx={cx} cy={cy} rx={rx} ry={ry} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} strokeWidth={3} />
      <ellipse cx={cx} cy={cy} rx={rx - 6} ry={ry - 6} stroke={DETAIL} strokeWidth={1} />
    </g>
  );
}

function Kick() {
  const k = P.kick;
  const width = k.right - k.left;
  const middleX = (k.left + k.right) / 2;
  return (
    <g>
      {/* Shell, seen from above it is a rectangle: diameter across, depth along the kit's axis. */}
      <rect x={k.left} y={k.front} width={width} height={k.back - k.front} rx={4} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} />
      {/* Hoops at the resonant (front) and batter (drummer) heads. */}
      <rect x={k.left - 4} y={k.front - 5} width={width + 8} height={10} rx={3} strokeWidth={2} />
      <rect x={k.left - 4} y={k.back - 5} width={width + 8} height={10} rx={3} strokeWidth={2} />
      {/* Spurs */}
      <line x1={k.left} y1={k.front + 40} x2={k.left - 22} y2={k.front + 18} />
      <line x1={k.right} y1={k.front + 40} x2={k.right + 22} y2={k.front + 18} />
      {/* Pedal and beater at the batter head */}
      <rect x={middleX - 12} y={k.back + 8} width={24} height={34} rx={3} stroke={DETAIL} />
      <line x1={middleX} y1={k.back + 8} x2={middleX} y2={k.back - 12} stroke={DETAIL} strokeWidth={3} />
    </g>
  );
}

function HiHat() {
  const h = P.hiHat;
  return (
    <g>
      <Cymbal cx={h.cx} cy={h.cy} r={h.r} />
      {/* Pedal toward the drummer */}
      <rect x={h.cx - 10} y={h.cy + h.r + 6} width={20} height={30} rx={3} stroke={DETAIL} />
    </g>
  );
}

function Throne() {
  const t = P.throne;
  return (
    <g>
      <circle cx={t.cx} cy={t.cy} r={t.r} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} strokeDasharray="5 4" />
      <NoteText x={t.cx + t.r + 8} y={t.cy + 5} anchor="start">Drummer</NoteText>
    </g>
  );
}

export function DrumKitDiagram(props: DiagramDrawingProps) {
  const frame = resolveDiagramFrame("drum-kit", DRUM_KIT_DIAGRAM, props);
  return (
    <DiagramSvg frame={frame}>
      <Arrow fromX={280} fromY={40} toX={280} toY={12} headLength={10} />
      <NoteText x={292} y={32} anchor="start">Audience side</NoteText>
      <Cymbal cx={P.crash.cx} cy={P.crash.cy} r={P.crash.r} />
      <Cymbal cx={P.ride.cx} cy={P.ride.cy} r={P.ride.r} />
      <Kick />
      <DrumHead cx={P.rackTom.cx} cy={P.rackTom.cy} rx={P.rackTom.rx} ry={P.rackTom.ry} />
      <DrumHead cx={P.floorTom.cx} cy={P.floorTom.cy} rx={P.floorTom.r} ry={P.floorTom.r} />
      <DrumHead cx={P.snare.cx} cy={P.snare.cy} rx={P.snare.r} ry={P.snare.r} />
      <HiHat />
      <Throne />
    </DiagramSvg>
  );
}
