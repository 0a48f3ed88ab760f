// Shown while a figure's code loads (only on the client, after navigation; the server renders
// the figure itself). Keeps the space so the page does not jump.
// Only the background layer pulses: pulsing the whole box took the text's opacity to 0.55 with
// it, about 2.4:1 against the page at the low point (WCAG 1.4.3 asks 4.5:1), which axe caught.
export function FigureLoading() {
  return (
    <div role="status" className="not-prose relative my-6 flex min-h-80 items-center justify-center overflow-hidden rounded-card border border-rule text-body-sm text-ink-muted">
      <div aria-hidden="true" className="absolute inset-0 bg-surface-sunken motion-safe:animate-skeleton" />
      <span className="relative">Loading the figure…</span>
    </div>
  );
}
