"use client";
// Point at a marked position on one of our diagrams. DiagramHotspot is a radiogroup: Tab into it,
// arrow keys move between the positions, Enter or Space picks one. Positions are drawn as letters;
// when the bank labels them with names, a key below lists letter and name.
import { DiagramHotspot } from "@/components/diagrams/hotspot-layer";
import { positionLetter } from "@/components/diagrams/diagram-frame";
import { isDiagramName } from "@/components/diagrams/registry";
import { QuestionFrame, type QuestionProps } from "./question-frame";

export function HotspotQuestion({ question, answer, onAnswer, disabled, number, total }: QuestionProps<"hotspot">) {
  const selectedId = answer?.pick.by === "region" ? answer.pick.regionId : null;
  const selected = question.regions.find((r) => r.id === selectedId);
  const lettered = question.regions.every((r, i) => r.label === `Position ${positionLetter(i)}`);
  const pick = (regionId: string) => onAnswer({ kind: "hotspot", pick: { by: "region", regionId } }, { debounceMs: 150 });

  return (
    <QuestionFrame
      question={question}
      number={number}
      total={total}
      instructions="Pick one marked position on the diagram: click it, or Tab to the diagram, move with the arrow keys and press Enter or Space."
    >
      {isDiagramName(question.diagram) ? (
        <div className="mx-auto w-full max-w-xl rounded-control border border-rule bg-surface p-2">
          <DiagramHotspot
            name={question.diagram}
            label={`Positions for question ${number}`}
            selectableIds={question.regions.map((r) => r.id)}
            selectedId={selectedId}
            onSelect={pick}
            disabled={disabled}
          />
        </div>
      ) : (
        <p className="text-body-sm text-ink-muted">The diagram could not be drawn; choose a position from the list.</p>
      )}
      {(!lettered || !isDiagramName(question.diagram)) && (
        <ul className="grid gap-1 text-body-sm sm:grid-cols-2" aria-label="Key to the marked positions">
          {question.regions.map((r, i) => (
            <li key={r.id}>
              <span className="font-mono font-semibold">{positionLetter(i)}</span>: {r.label}
              {!isDiagramName(question.diagram) && (
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
