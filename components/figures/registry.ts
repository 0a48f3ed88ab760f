// The figure registry: each stable name with its title, summary, formula source and a lazily
// loaded component, so a lesson page ships only the figures it renders.
import type { ComponentType } from "react";
import { FIGURE_META, type FigureMeta } from "./figure-meta";
import { FIGURE_NAMES, type FigureName } from "./figure-names";
import { FIGURE_COMPONENTS, type FigureComponentProps } from "./lazy-figures";

export { FIGURE_NAMES, isFigureName, type FigureName } from "./figure-names";
export type { FigureComponentProps } from "./lazy-figures";

export interface FigureEntry extends FigureMeta {
  component: ComponentType<FigureComponentProps>;
}

export const FIGURES: Readonly<Record<FigureName, FigureEntry>> = Object.fromEntries(
  FIGURE_NAMES.map((name) => [name, { ...FIGURE_META[name], component: FIGURE_COMPONENTS[name] }]),
) as Record<FigureName, FigureEntry>;
