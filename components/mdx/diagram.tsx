// <Diagram name="drum-kit" highlight="…" caption="…" />: our SVG drawings, framed for a lesson.
// On paper the drawing prints with its text alternative beneath (the marked positions in words).
import { Diagram as DiagramDrawing } from "@/components/diagrams/diagram";
import { resolveDiagramFrame } from "@/components/diagrams/diagram-frame";
import { DIAGRAMS, isDiagramName } from "@/components/diagrams/registry";

export type LessonDiagramProps = { name: string; highlight?: string; caption?: string };

export function Diagram({ name, highlight, caption }: LessonDiagramProps) {
  const description = isDiagramName(name) ? resolveDiagramFrame(name, DIAGRAMS[name], { highlight }).descriptionText : undefined;
  return (
    <div className="not-prose my-8 rounded-card border border-rule bg-surface-raised p-4 text-ink [&_figcaption]:mt-3 [&_figcaption]:text-body-sm [&_figcaption]:text-ink-muted">
      <DiagramDrawing name={name} highlight={highlight} caption={caption} />
      {description ? <p className="mt-3 hidden text-body-sm print:block">{description}</p> : null}
    </div>
  );
}
