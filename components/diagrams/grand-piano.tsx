// Grand piano from above, lid open: case with straight (hinge) side and curved rim, strings,
// hammer line, keyboard, and the raised lid as a dashed outline.
import {
  GRAND_PIANO_CASE_PATH,
  GRAND_PIANO_DIAGRAM,
  GRAND_PIANO_INNER_PATH,
  GRAND_PIANO_PARTS as P,
} from "./data/grand-piano";
import { resolveDiagramFrame, type DiagramDrawingProps } from "./diagram-frame";
import { DiagramSvg } from "./diagram-svg";
import { Arrow, LeaderNote, NoteText } from "./drawing-parts";
import { BODY_FILL_OPACITY, DETAIL } from "./palette";

/** Strings: treble and middle run straight back from the hammers; the bass group crosses over them at an angle. */
function Strings({ clipId }: { clipId: string }) {
  const hammerY = P.hammerLineY;
  const straight = Array.from({ length: 26 }, (_, index) => 206 + index * 8);
  const bass = Array.from({ length: 9 }, (_, index) => 150 + index * 7);
  return (
    <g clipPath={`url(#${clipId})`} stroke={DETAIL}>
      {straight.map((x) => (
        <line key={`s${x}`} x1={x} y1={hammerY} x2={x} y2={20} strokeWidth={1} />
      ))}
      {bass.map((x) => (
        <line key={`b${x}`} x1={x} y1={hammerY - 6} x2={x + 70} y2={56} strokeWidth={1.75} />
      ))}
    </g>
  );
}

function Keyboard() {
  const k = P.keyboard;
  const whiteCount = 36;
  const keysLeft = k.left + 12;
  const keysRight = k.right - 12;
  const whiteWidth = (keysRight - keysLeft) / whiteCount;
  // Black keys follow the octave pattern after C and D, and after F, G and A.
  const blackAfter = new Set([0, 1, 3, 4, 5]);
  return (
    <g>
      <rect x={k.left} y={k.top} width={k.right - k.left} height={k.bottom - k.top} rx={3} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} />
      <g stroke={DETAIL} strokeWidth={0.75}>
        {Array.from({ length: whiteCount - 1 }, (_, index) => {
          const x = Math.round((keysLeft + whiteWidth * (index + 1)) * 10) / 10;
          return <line key={index} x1={x} y1={k.top + 6} x2={x} y2={k.bottom - 4} />;
        })}
      </g>
      <g fill="currentColor" stroke="none" opacity={0.7}>
        {Array.from({ length: whiteCount - 1 }, (_, index) => index)
          .filter((index) => blackAfter.has(index % 7))
          .map((index) => {
            const x = keysLeft + whiteWidth * (index + 1) - whiteWidth * 0.3;
            return <rect key={index} x={Math.round(x * 10) / 10} y={k.top + 6} width={Math.round(whiteWidth * 6) / 10} height={24} />;
          })}
      </g>
      <line x1={keysLeft} y1={k.top + 6} x2={keysRight} y2={k.top + 6} strokeWidth={1.5} />
    </g>
  );
}

function Hinges() {
  return (
    <g>
      {P.hingeYs.map((y) => (
        <rect key={y} x={P.spineX - 5} y={y - 12} width={10} height={24} rx={2} fill="currentColor" stroke="none" opacity={0.8} />
      ))}
      <NoteText x={P.spineX - 12} y={P.hingeYs[0] + 5} anchor="end">Lid hinges</NoteText>
    </g>
  );
}

export function GrandPianoDiagram(props: DiagramDrawingProps) {
  const frame = resolveDiagramFrame("grand-piano", GRAND_PIANO_DIAGRAM, props);
  const clipId = `${frame.idPrefix}-strings`;
  const lidScale = P.raisedLidScale;
  // The raised lid seen from above: the case outline pulled toward the hinge line.
  const lidTransform = `translate(${P.spineX} 0) scale(${lidScale} 1) translate(${-P.spineX} 0)`;
  const bench = P.bench;
  return (
    <DiagramSvg frame={frame}>
      <defs>
        <clipPath id={clipId}>
          <path d={GRAND_PIANO_INNER_PATH} />
        </clipPath>
      </defs>
      <path d={GRAND_PIANO_CASE_PATH} fill="currentColor" fillOpacity={BODY_FILL_OPACITY} strokeWidth={3} />
      <path d={GRAND_PIANO_INNER_PATH} stroke={DETAIL} strokeWidth={1.25} />
      <Strings clipId={clipId} />
      <line x1={142} y1={P.hammerLineY} x2={418} y2={P.hammerLineY} strokeWidth={4} stroke={DETAIL} />
      <NoteText x={P.trebleX + 12} y={P.hammerLineY + 5} anchor="start">Hammer line</NoteText>
      <path d={GRAND_PIANO_CASE_PATH} transform={lidTransform} strokeDasharray="7 6" strokeWidth={1.5} vectorEffect="non-scaling-stroke" />
      <LeaderNote text="Raised lid (dashed)" x={352} y={112} toX={262} toY={132} anchor="start" />
      <Hinges />
      <Keyboard />
      <rect x={bench.left} y={bench.top} width={bench.right - bench.left} height={bench.bottom - bench.top} rx={3} strokeDasharray="5 4" />
      <NoteText x={bench.right + 10} y={bench.bottom - 4} anchor="start">Pianist</NoteText>
      <Arrow fromX={452} fromY={236} toX={540} toY={236} headLength={12} />
      <NoteText x={496} y={226}>Audience</NoteText>
    </DiagramSvg>
  );
}
