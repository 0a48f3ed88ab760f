// <Diagram name="drum-kit" highlight="kick-inside,snare-top" caption="..." />: the lesson-facing
// component (server-renderable). It picks the drawing and wraps it in a <figure> when captioned.
import type { ReactElement } from "react";
import type { DiagramDrawingProps } from "./diagram-frame";
import { DrumKitDiagram } from "./drum-kit";
import { GrandPianoDiagram } from "./grand-piano";
import { GuitarCabinetDiagram } from "./guitar-cabinet";
import { DIAGRAM_NAMES, isDiagramName, type DiagramName } from "./registry";
import { StagePlanDiagram } from "./stage-plan";

export interface DiagramProps extends DiagramDrawingProps {
  /** One of DIAGRAM_NAMES; typed loosely because MDX passes plain strings. */
  readonly name: DiagramName | (string & {});
  readonly caption?: string;
  readonly className?: string;
}

function DiagramDrawing({ name, ...drawingProps }: DiagramDrawingProps & { name: DiagramName }): ReactElement {
  switch (name) {
    case "stage-plan":
      return <StagePlanDiagram {...drawingProps} />;
    case "drum-kit":
      return <DrumKitDiagram {...drawingProps} />;
    case "grand-piano":
      return <GrandPianoDiagram {...drawingProps} />;
    case "guitar-cabinet":
      return <GuitarCabinetDiagram {...drawingProps} />;
  }
}

export function Diagram({ name, caption, className, ...drawingProps }: DiagramProps) {
  // An unknown name is a content error: fail loudly so content checks and builds catch it.
  if (!isDiagramName(name)) {
    throw new Error(`Unknown diagram "${name}". Known diagrams: ${DIAGRAM_NAMES.join(", ")}.`);
  }
  const drawing = <DiagramDrawing name={name} {...drawingProps} />;
  if (caption === undefined || caption.trim() === "") {
    return className ? <div className={className}>{drawing}</div> : drawing;
  }
  return (
    <figure className={className} data-diagram-figure={name}>
      {drawing}
      <figcaption>{caption}</figcaption>
    </figure>
  );
}
