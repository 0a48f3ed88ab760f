// <Figure name="pickup-pattern" pattern="cardioid" />: an interactive figure in a lesson.
// PLACEHOLDER until components/figures/figure.tsx exists: a box with the figure's title.
export type LessonFigureProps = { name: string } & Record<string, string | number | boolean | undefined>;

const TITLES: Record<string, string> = {
  "pickup-pattern": "Pickup patterns",
  proximity: "Proximity effect",
  "two-mics": "Two microphones on one source",
  "distance-level": "Distance and level",
  "direct-box": "The direct box",
  "phantom-power": "Phantom power",
  "feedback-margin": "Feedback margin",
  "noise-dose": "Noise dose",
};

export const FIGURE_NAMES = Object.keys(TITLES);

export function Figure({ name }: LessonFigureProps) {
  return (
    <div role="img" aria-label={`Figure: ${TITLES[name] ?? name}`} className="not-prose my-8 rounded-card border border-dashed border-border bg-surface-sunken p-6 text-center text-ink-muted">
      Figure: {TITLES[name] ?? name}
    </div>
  );
}
