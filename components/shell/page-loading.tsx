export function PageLoading() {
  return (
    <div role="status" aria-live="polite" className="space-y-3 py-8">
      <span className="sr-only">Loading…</span>
      <div className="h-8 w-1/2 animate-pulse rounded bg-surface-sunken" />
      <div className="h-4 w-3/4 animate-pulse rounded bg-surface-sunken" />
      <div className="h-4 w-2/3 animate-pulse rounded bg-surface-sunken" />
    </div>
  );
}
