// The figures' lazily loaded components, one chunk each. Client components import this module,
// not registry.ts, so the first load of a page carries only the loaders, not every figure's
// title and descriptions (figure-meta.ts).
import dynamic from "next/dynamic";
import { createElement, type ComponentType } from "react";
import type { FigureName } from "./figure-names";
import { FigureLoading } from "./figure-loading";
import type { DirectBoxFigureProps } from "./direct-box-figure";
import type { DistanceLevelFigureProps } from "./distance-level-figure";
import type { FeedbackMarginFigureProps } from "./feedback-margin-figure";
import type { GainStructureFigureProps } from "./gain-structure-figure";
import type { NoiseDoseFigureProps } from "./noise-dose-figure";
import type { PhantomPowerFigureProps } from "./phantom-power-figure";
import type { PickupPatternFigureProps } from "./pickup-pattern/pickup-pattern-figure";
import type { ProximityFigureProps } from "./proximity-figure";
import type { TwoMicsFigureProps } from "./two-mics-figure";

/**
 * Props every figure accepts: a starting state and a change callback (the Bench mirrors state
 * into the URL), plus the lesson shorthands some figures read (pattern, distanceM, nearM, farM).
 */
export interface FigureComponentProps {
  initialState?: object;
  onStateChange?: (state: never) => void;
  [shorthand: string]: unknown;
}

const loading = () => createElement(FigureLoading);

// One dynamic() call per figure, each with a literal import path, so the bundler splits them.
// The figures' own prop types differ; the registry hands them out under the common shape.
export const FIGURE_COMPONENTS = {
  "pickup-pattern": dynamic<PickupPatternFigureProps>(() => import("./pickup-pattern/pickup-pattern-figure").then((module) => module.PickupPatternFigure), { loading }),
  proximity: dynamic<ProximityFigureProps>(() => import("./proximity-figure").then((module) => module.ProximityFigure), { loading }),
  "two-mics": dynamic<TwoMicsFigureProps>(() => import("./two-mics-figure").then((module) => module.TwoMicsFigure), { loading }),
  "distance-level": dynamic<DistanceLevelFigureProps>(() => import("./distance-level-figure").then((module) => module.DistanceLevelFigure), { loading }),
  "direct-box": dynamic<DirectBoxFigureProps>(() => import("./direct-box-figure").then((module) => module.DirectBoxFigure), { loading }),
  "phantom-power": dynamic<PhantomPowerFigureProps>(() => import("./phantom-power-figure").then((module) => module.PhantomPowerFigure), { loading }),
  "feedback-margin": dynamic<FeedbackMarginFigureProps>(() => import("./feedback-margin-figure").then((module) => module.FeedbackMarginFigure), { loading }),
  "noise-dose": dynamic<NoiseDoseFigureProps>(() => import("./noise-dose-figure").then((module) => module.NoiseDoseFigure), { loading }),
  "gain-structure": dynamic<GainStructureFigureProps>(() => import("./gain-structure-figure").then((module) => module.GainStructureFigure), { loading }),
} as unknown as Record<FigureName, ComponentType<FigureComponentProps>>;

