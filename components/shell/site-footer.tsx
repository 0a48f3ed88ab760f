export function SiteFooter() {
  return (
    <footer className="border-t border-rule bg-surface-raised print:hidden">
      <div className="mx-auto max-w-6xl px-4 py-6 text-sm text-ink-muted">
        <p>Axisline trains live-sound technicians. Safety guidance here never replaces local codes, venue rules or licensed practice.</p>
      </div>
    </footer>
  );
}
