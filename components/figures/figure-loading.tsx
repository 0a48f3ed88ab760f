// Shown while a figure's code loads (only on the client, after navigation; the server renders
// the figure itself). Keeps the space so the page does not jump.
export function FigureLoading() {
  return (
    <div role="status" className="not-prose my-6 flex min-h-80 items-center justify-center rounded-card border border-rule bg-surface-sunken text-body-sm text-ink-muted motion-safe:animate-skeleton">
      Loading the figure…
    </div>
  );
}
