// <Figure name="pickup-pattern" pattern="cardioid" />: an interactive figure in a lesson, drawn by
// components/figures. On paper the controls mean nothing, so print shows the figure's text
// alternative instead: what it shows, what it computes and the state the lesson starts it in.
import { Figure as InteractiveFigure } from "@/components/figures/figure";
import { FIGURE_META } from "@/components/figures/figure-meta";
import { isFigureName } from "@/components/figures/figure-names";

export type LessonFigureProps = { name: string } & Record<string, string | number | boolean | undefined>;

/** "pattern supercardioid, nearM 0.3" — the lesson's starting props, for the printed text. */
function startingState(props: Record<string, unknown>): string {
  return Object.entries(props)
    .filter(([, value]) => ["string", "number", "boolean"].includes(typeof value))
    .map(([key, value]) => `${key} ${String(value)}`)
    .join(", ");
}

export function Figure({ name, ...props }: LessonFigureProps) {
  const meta = isFigureName(name) ? FIGURE_META[name] : undefined;
  const start = startingState(props);
  return (
    <>
      <div className="print:hidden">
        <InteractiveFigure name={name} {...props} />
      </div>
      {meta ? (
        <div className="my-6 hidden rounded-card border border-black p-4 text-body-sm print:block">
          <p className="font-semibold">Figure: {meta.title}</p>
          <p>{meta.summary}</p>
          <p>{meta.computes}</p>
          {start ? <p>Starting state in this lesson: {start}.</p> : null}
          <p>Source: {meta.formulaSource}</p>
        </div>
      ) : null}
    </>
  );
}
