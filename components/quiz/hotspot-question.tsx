"use client";
// Point at a marked position on one of our diagrams. DiagramHotspot is a radiogroup: Tab into it,
// arrow keys move between the positions, Enter or Space picks one. Positions are drawn as letters;
// when the bank labels them with names, a key below lists letter and name.
// The question's region ids are the attempt's presented ids, which say nothing about the
// drawing: each region is matched to the diagram position at its centre (banks place every
// region on a position of its diagram), and picks go back to the server as region ids.
import { DiagramHotspot } from "@/components/diagrams/hotspot-layer";
import { positionLetter } from "@/components/diagrams/diagram-frame";
import { DIAGRAMS, isDiagramName, type DiagramName } from "@/components/diagrams/registry";
import type { ClientHotspotQuestion } from "@/lib/assessment";
import { QuestionFrame, type QuestionProps } from "./question-frame";

type Placement = { name: DiagramName; positionOf: Map<string, string>; regionAt: Map<string, string> };

/** Where each region sits on the drawing; null when the drawing can't show every region. */
function placeOnDiagram(question: ClientHotspotQuestion): Placement | null {
  if (!isDiagramName(question.diagram)) return null;
  const { positions } = DIAGRAMS[question.diagram];
  const positionOf = new Map<string, string>();
  const regionAt = new Map<string, string>();
  for (const region of question.regions) {
    const { shape } = region;
    const position = shape.type === "circle" ? positions.find((p) => p.x === shape.cx && p.y === shape.cy) : undefined;
    if (!position || regionAt.has(position.id)) return null;
    positionOf.set(region.id, position.id);
    regionAt.set(position.id, region.id);
  }
  return { name: question.diagram, positionOf, regionAt };
}

export function HotspotQuestion({ question, answer, onAnswer, disabled, number, total }: QuestionProps<"hotspot">) {
  const selectedId = answer?.pick.by === "region" ? answer.pick.regionId : null;
  const selected = question.regions.find((r) => r.id === selectedId);
  const lettered = question.regions.every((r, i) => r.label === `Position ${positionLetter(i)}`);
  const pick = (regionId: string) => onAnswer({ kind: "hotspot", pick: { by: "region", regionId } }, { debounceMs: 150 });
  const placement = placeOnDiagram(question);

  return (
    <QuestionFrame
      question={question}
      number={number}
      total={total}
      instructions="Pick one marked position on the diagram: click it, or Tab to the diagram, move with the arrow keys and press Enter or Space."
    >
      {placement ? (
        <div className="mx-auto w-full max-w-xl rounded-control border border-rule bg-surface p-2">
          <DiagramHotspot
            name={placement.name}
            label={`Positions for question ${number}`}
            selectableIds={question.regions.map((r) => placement.positionOf.get(r.id)!)}
            selectedId={selectedId ? (placement.positionOf.get(selectedId) ?? null) : null}
            onSelect={(positionId) => {
              const regionId = placement.regionAt.get(positionId);
              if (regionId) pick(regionId);
            }}
            disabled={disabled}
          />
        </div>
      ) : (
        <p className="text-body-sm text-ink-muted">The diagram could not be drawn; choose a position from the list.</p>
      )}
      {(!lettered || !placement) && (
        <ul className="grid gap-1 text-body-sm sm:grid-cols-2" aria-label="Key to the marked positions">
          {question.regions.map((r, i) => (
            <li key={r.id}>
              <span className="font-mono font-semibold">{positionLetter(i)}</span>: {r.label}
              {!placement && (
                <button type="button" className="ml-2 min-h-target underline" disabled={disabled} onClick={() => pick(r.id)} aria-pressed={r.id === selectedId}>
                  Choose
                </button>
              )}
            </li>
          ))}
        </ul>
      )}
      <p className="text-body-sm" aria-live="polite">
        {selected ? (
          <>
            <span className="font-semibold">Your choice:</span> Position {positionLetter(question.regions.indexOf(selected))}
            {!lettered && ` (${selected.label})`}
          </>
        ) : (
          "No position chosen yet."
        )}
      </p>
    </QuestionFrame>
  );
}
