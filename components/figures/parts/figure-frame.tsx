"use client";
// The shell every figure shares: a <figure> with its caption, the unit toggle where lengths or
// temperatures appear, and a container query so the layout follows the space it is given
// (a lesson column or the full-width Bench), down to 320 px.
import { useId, useSyncExternalStore, type ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import { UnitToggle } from "../units-preference";

export interface FigureFrameProps {
  name: string;
  title: string;
  summary?: ReactNode;
  /** Show the metric/imperial toggle. */
  usesUnits?: boolean;
  children: ReactNode;
  className?: string;
}

const subscribeToNothing = () => () => {};

/** False during server rendering and hydration, true once the figure responds to input. */
function useHydrated(): boolean {
  return useSyncExternalStore(subscribeToNothing, () => true, () => false);
}

export function FigureFrame({ name, title, summary, usesUnits = false, children, className }: FigureFrameProps) {
  const captionId = useId();
  const hydrated = useHydrated();
  return (
    <figure
      aria-labelledby={captionId}
      data-figure={name}
      // Lets tests (and styles) wait until the controls are live.
      data-hydrated={hydrated ? "true" : "false"}
      className={cx("not-prose @container my-6 flex min-w-0 flex-col gap-4 rounded-card border border-rule bg-surface-raised p-3 text-ink shadow-raised sm:p-5", className)}
    >
      <div className="flex flex-wrap items-start justify-between gap-3">
        <figcaption id={captionId} className="flex min-w-0 flex-col gap-0.5">
          <span className="text-title-3 text-ink">{title}</span>
          {summary && <span className="text-body-sm text-ink-muted">{summary}</span>}
        </figcaption>
        {usesUnits && <UnitToggle />}
      </div>
      {children}
    </figure>
  );
}

/** Plot beside controls when the figure is wide enough, stacked otherwise. */
export function FigureColumns({ children, className }: { children: ReactNode; className?: string }) {
  return <div className={cx("grid min-w-0 gap-5 @3xl:grid-cols-2 @3xl:items-start", className)}>{children}</div>;
}

export function ControlStack({ children, label }: { children: ReactNode; label: string }) {
  return (
    <div role="group" aria-label={label} className="flex min-w-0 flex-col gap-4">
      {children}
    </div>
  );
}
