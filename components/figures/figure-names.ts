// The stable names lessons use in <Figure name="…">. Plain data (no React). What the Bench says
// about each figure is in figure-meta.ts, kept apart so client code that only needs the names
// (the lazy figure loaders) doesn't ship every figure's descriptions.

export const FIGURE_NAMES = [
  "pickup-pattern",
  "proximity",
  "two-mics",
  "distance-level",
  "direct-box",
  "phantom-power",
  "feedback-margin",
  "noise-dose",
  "gain-structure",
] as const;

export type FigureName = (typeof FIGURE_NAMES)[number];

export function isFigureName(value: string): value is FigureName {
  return (FIGURE_NAMES as readonly string[]).includes(value);
}
