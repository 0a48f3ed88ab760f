// Guitar cabinet front (grille cloth see-through) and a side section of one speaker,
// with the on-axis line and an angled off-axis microphone.
import { GUITAR_CABINET_DIAGRAM, GUITAR_CABINET_PARTS as P } from "./data/guitar-cabinet";
import { resolveDiagramFrame, type DiagramDrawingProps } from "./diagram-frame";
import { DiagramSvg } from "./diagram-svg";
import { LeaderNote, NoteText } from "./drawing-parts";
import { MicGlyph } from "./mic-glyph";
import { BODY_FILL_OPACITY, DETAIL } from "./palette";

interface Rect {
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

/** 45° hatch lines (x + y = c) clipped to a rectangle by arithmetic, so no clip path is needed. */
function hatchSegments(rect: Rect, spacing: number): { x1: number; y1: number; x2: number; y2: number }[] {
  const segments = [];
  for (let c = rect.left + rect.top + spacing; c < rect.right + rect.bottom; c += spacing) {
    const xStart = Math.max(rect.left, c - rect.bottom);
    const xEnd = Math.min(rect.right, c - rect.top);
    if (xEnd > xStart) segments.push({ x1: xStart, y1: c - xStart, x2: xEnd, y2: c - xEnd });
  }
  return segments;
}

/** One speaker seen from the front: frame, surround, cone with radial ribs, dust cap. */
function SpeakerFront({ cx, cy }: { cx: number; cy: number }) {
  const r = P.speakerRadius;
  const ribAnglesDeg = [0, 45, 90, 135, 180, 225, 270, 315];
  return (
    <g>
      <circle cx={cx} cy={cy} r={r} strokeWidth={2} />
      <circle cx={cx} cy={cy} r={r - 5} stroke={DETAIL} strokeWidth={1.5} />
      <circle cx={cx} cy={cy} r={r - 11} stroke={DETAIL} strokeWidth={1} />
      <g stroke={DETAIL} strokeWidth={0.75} opacity={0.7}>
        {ribAnglesDeg.map((angleDeg) => {
          const radians = (angleDeg * Math.PI) / 180;
          const inner = P.dustCapRadius + 4;
          const outer = r - 13;
          const round = (value: number) => Math.round(value * 10) / 10;
          return (
            <line
              key={angleDeg}
              x1={round(cx + Math.cos(radians) * inner)} y1={round(cy + Math.sin(radians) * inner)}
              x2={round(cx + Math.cos(radians) * outer)} y2={round(cy + Math.sin(radians) * outer)}
            />
          );
        })}
      </g>
      <circle cx={cx} cy={cy} r={P.dustCapRadius} fill="currentColor" fillOpacity={0.12} strokeWidth={1.75} />
    </g>
  );
}

function CabinetFront() {
  const cab = P.cabinet;
  const grille = P.grille;
  return (
    <g>
      <rect x={cab.left} y={cab.top} width={cab.right - cab.left} height={cab.bottom - cab.top} rx={8} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} strokeWidth={3} />
      <rect x={grille.left} y={grille.top} width={grille.right - grille.left} height={grille.bottom - grille.top} rx={3} stroke={DETAIL} strokeWidth={1.5} />
      <g stroke={DETAIL} strokeWidth={0.6} opacity={0.45}>
        {hatchSegments(grille, 11).map((s) => (
          <line key={`${s.x1}-${s.y1}`} x1={s.x1} y1={s.y1} x2={s.x2} y2={s.y2} />
        ))}
      </g>
      {P.speakerCentres.map((centre) => (
        <SpeakerFront key={centre.cx} cx={centre.cx} cy={centre.cy} />
      ))}
      <NoteText x={(cab.left + cab.right) / 2} y={cab.bottom + 28}>Cabinet front</NoteText>
    </g>
  );
}

function SpeakerSection() {
  const s = P.side;
  const yTop = s.axisY - s.rimHalfHeight;
  const yBottom = s.axisY + s.rimHalfHeight;
  const coilTop = s.axisY - s.voiceCoilHalfHeight;
  const coilBottom = s.axisY + s.voiceCoilHalfHeight;
  const m = s.magnet;
  return (
    <g>
      {/* Magnet and back plate */}
      <rect x={m.left} y={m.top} width={m.right - m.left} height={m.bottom - m.top} rx={3} fill="currentColor" fillOpacity={0.2} strokeWidth={2} />
      {/* Basket (frame) */}
      <g stroke={DETAIL} strokeWidth={1.5}>
        <line x1={m.right} y1={m.top + 2} x2={s.flangeX} y2={yTop - 6} />
        <line x1={m.right} y1={m.bottom - 2} x2={s.flangeX} y2={yBottom + 6} />
      </g>
      {/* Cone: from the voice coil out to the rim, slightly curved */}
      <path d={`M ${s.voiceCoilX} ${coilTop} Q ${(s.voiceCoilX + s.rimX) / 2 + 4} ${(coilTop + yTop) / 2 - 4} ${s.rimX} ${yTop}`} strokeWidth={2.5} />
      <path d={`M ${s.voiceCoilX} ${coilBottom} Q ${(s.voiceCoilX + s.rimX) / 2 + 4} ${(coilBottom + yBottom) / 2 + 4} ${s.rimX} ${yBottom}`} strokeWidth={2.5} />
      {/* Surround: a half-roll joining cone to frame */}
      <path d={`M ${s.rimX} ${yTop} A 4 4 0 0 1 ${s.flangeX} ${yTop - 2}`} strokeWidth={2} />
      <path d={`M ${s.rimX} ${yBottom} A 4 4 0 0 0 ${s.flangeX} ${yBottom + 2}`} strokeWidth={2} />
      <line x1={s.flangeX} y1={yTop - 10} x2={s.flangeX} y2={yBottom + 10} strokeWidth={3} />
      {/* Voice coil former and dust cap */}
      <rect x={m.right} y={coilTop} width={s.voiceCoilX - m.right} height={coilBottom - coilTop} stroke={DETAIL} strokeWidth={1} />
      <path d={`M ${s.voiceCoilX} ${coilTop} Q ${s.voiceCoilX + 18} ${s.axisY} ${s.voiceCoilX} ${coilBottom}`} fill="currentColor" fillOpacity={0.12} strokeWidth={2} />
      {/* Baffle with its cut-out, and the grille cloth in front */}
      <line x1={s.baffleX} y1={s.baffleTop} x2={s.baffleX} y2={yTop - 12} strokeWidth={5} />
      <line x1={s.baffleX} y1={yBottom + 12} x2={s.baffleX} y2={s.baffleBottom} strokeWidth={5} />
      <line x1={s.grilleX} y1={s.baffleTop} x2={s.grilleX} y2={s.baffleBottom} stroke={DETAIL} strokeWidth={1.5} strokeDasharray="3 4" />
      <LeaderNote text="Magnet" x={m.left + 8} y={m.bottom + 44} toX={m.left + 10} toY={m.bottom + 2} />
      <LeaderNote text="Dust cap" x={m.right - 2} y={s.axisY - 50} toX={s.voiceCoilX + 8} toY={s.axisY - 6} anchor="end" />
      <LeaderNote text="Cone" x={s.voiceCoilX + 30} y={yBottom + 40} toX={s.voiceCoilX + 36} toY={coilBottom + 20} />
      <LeaderNote text="Surround" x={s.rimX - 36} y={yTop - 30} toX={s.rimX + 1} toY={yTop - 4} />
      <NoteText x={s.grilleX + 6} y={s.baffleTop - 8} anchor="start">Grille</NoteText>
      <NoteText x={(m.left + s.grilleX + 60) / 2} y={P.cabinet.bottom + 28}>Side section, one speaker</NoteText>
    </g>
  );
}

function OffAxisMic() {
  const s = P.side;
  const mic = P.offAxisMic;
  const capX = s.voiceCoilX + 8;
  const aimDeg = (Math.atan2(s.axisY - mic.capsuleY, capX - mic.capsuleX) * 180) / Math.PI;
  return (
    <g>
      {/* The speaker's axis, and the mic's axis aimed back at the dust cap */}
      <line x1={capX} y1={s.axisY} x2={552} y2={s.axisY} stroke={DETAIL} strokeWidth={1.25} strokeDasharray="8 5" />
      <NoteText x={552} y={s.axisY - 8} anchor="end">Axis</NoteText>
      <line x1={mic.capsuleX} y1={mic.capsuleY} x2={capX} y2={s.axisY} stroke={DETAIL} strokeWidth={1.25} strokeDasharray="2 4" />
      <MicGlyph x={mic.capsuleX} y={mic.capsuleY} aimDeg={Math.round(aimDeg * 10) / 10} length={40} />
    </g>
  );
}

export function GuitarCabinetDiagram(props: DiagramDrawingProps) {
  const frame = resolveDiagramFrame("guitar-cabinet", GUITAR_CABINET_DIAGRAM, props);
  return (
    <DiagramSvg frame={frame}>
      <CabinetFront />
      <SpeakerSection />
      <OffAxisMic />
    </DiagramSvg>
  );
}
