// The figure registry: each stable name with its title, summary, formula source and a lazily
// loaded component, so a lesson page ships only the figures it renders.
import dynamic from "next/dynamic";
import { createElement, type ComponentType } from "react";
import { FIGURE_META, FIGURE_NAMES, type FigureMeta, type FigureName } from "./figure-names";
import { FigureLoading } from "./figure-loading";
import type { DirectBoxFigureProps } from "./direct-box-figure";
import type { DistanceLevelFigureProps } from "./distance-level-figure";
import type { FeedbackMarginFigureProps } from "./feedback-margin-figure";
import type { NoiseDoseFigureProps } from "./noise-dose-figure";
import type { PhantomPowerFigureProps } from "./phantom-power-figure";
import type { PickupPatternFigureProps } from "./pickup-pattern/pickup-pattern-figure";
import type { ProximityFigureProps } from "./proximity-figure";
import type { TwoMicsFigureProps } from "./two-mics-figure";

export { FIGURE_NAMES, isFigureName, type FigureName } from "./figure-names";

/**
 * Props every figure accepts: a starting state and a change callback (the Bench mirrors state
 * into the URL), plus the lesson shorthands some figures read (pattern, distanceM, nearM, farM).
 */
export interface FigureComponentProps {
  initialState?: object;
  onStateChange?: (state: never) => void;
  [shorthand: string]: unknown;
}

export interface FigureEntry extends FigureMeta {
  component: ComponentType<FigureComponentProps>;
}

const loading = () => createElement(FigureLoading);

// One dynamic() call per figure, each with a literal import path, so the bundler splits them.
// The figures' own prop types differ; the registry hands them out under the common shape.
const COMPONENTS = {
  "pickup-pattern": dynamic<PickupPatternFigureProps>(() => import("./pickup-pattern/pickup-pattern-figure").then((module) => module.PickupPatternFigure), { loading }),
  proximity: dynamic<ProximityFigureProps>(() => import("./proximity-figure").then((module) => module.ProximityFigure), { loading }),
  "two-mics": dynamic<TwoMicsFigureProps>(() => import("./two-mics-figure").then((module) => module.TwoMicsFigure), { loading }),
  "distance-level": dynamic<DistanceLevelFigureProps>(() => import("./distance-level-figure").then((module) => module.DistanceLevelFigure), { loading }),
  "direct-box": dynamic<DirectBoxFigureProps>(() => import("./direct-box-figure").then((module) => module.DirectBoxFigure), { loading }),
  "phantom-power": dynamic<PhantomPowerFigureProps>(() => import("./phantom-power-figure").then((module) => module.PhantomPowerFigure), { loading }),
  "feedback-margin": dynamic<FeedbackMarginFigureProps>(() => import("./feedback-margin-figure").then((module) => module.FeedbackMarginFigure), { loading }),
  "noise-dose": dynamic<NoiseDoseFigureProps>(() => import("./noise-dose-figure").then((module) => module.NoiseDoseFigure), { loading }),
} as unknown as Record<FigureName, ComponentType<FigureComponentProps>>;

export const FIGURES: Readonly<Record<FigureName, FigureEntry>> = Object.fromEntries(
  FIGURE_NAMES.map((name) => [name, { ...FIGURE_META[name], component: COMPONENTS[name] }]),
) as Record<FigureName, FigureEntry>;
