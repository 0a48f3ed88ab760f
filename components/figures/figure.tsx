"use client";
// <Figure name="…" {...props} /> for lessons and pages: renders the named interactive figure
// (loaded lazily through the registry), or a visible error box for an unknown name.
// A client component on purpose: next/dynamic then splits each figure into its own chunk, so a
// server-rendered lesson ships only the figures it uses. Props from a server lesson must be
// plain values (name, pattern, distanceM…); callbacks can only come from client code.
import { FIGURE_NAMES, isFigureName } from "./figure-names";
import { FIGURE_COMPONENTS } from "./lazy-figures";

export type FigureProps = { name: string } & Record<string, unknown>;

export function Figure({ name, ...props }: FigureProps) {
  if (!isFigureName(name)) return <UnknownFigure name={name} />;
  const Component = FIGURE_COMPONENTS[name];
  return <Component {...props} />;
}

function UnknownFigure({ name }: { name: string }) {
  return (
    <div role="note" data-testid="figure-error" className="not-prose my-6 rounded-card border-2 border-danger bg-danger-soft px-4 py-3 text-body-sm text-ink">
      <p className="font-semibold text-danger">Figure not found: “{String(name)}”</p>
      <p>Known figures: {FIGURE_NAMES.join(", ")}.</p>
    </div>
  );
}
