import Link from "next/link";
import { AccountMenu } from "./account-menu";
import { SearchBox } from "./search-box";
import { PUBLIC_NAV } from "./nav-links";

export function SiteHeader() {
  return (
    <header className="border-b border-rule bg-surface-raised print:hidden">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-surface-raised focus:p-2">
        Skip to content
      </a>
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-3">
        <div className="flex flex-wrap items-center gap-4">
          <Link href="/" className="flex min-h-10 items-center gap-2 font-bold tracking-tight text-ink" aria-label="Axisline home">
            <AxislineMark />
            <span className="text-lg">Axisline</span>
          </Link>
          <nav aria-label="Main">
            <ul className="flex flex-wrap gap-1 text-sm">
              <li>
                <Link href="/courses" className="inline-flex min-h-10 items-center rounded-md px-2 text-ink-muted hover:text-ink">
                  Courses
                </Link>
              </li>
              <li>
                <Link href="/bench" className="inline-flex min-h-10 items-center rounded-md px-2 text-ink-muted hover:text-ink">
                  Bench
                </Link>
              </li>
              {PUBLIC_NAV.map((l) => (
                <li key={l.href}>
                  <Link href={l.href} className="inline-flex min-h-10 items-center rounded-md px-2 text-ink-muted hover:text-ink">
                    {l.label}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
        </div>
        <SearchBox className="order-last w-full md:order-none md:w-72" />
        <AccountMenu />
      </div>
    </header>
  );
}

/** Our mark: a polar axis with a cardioid trace. */
function AxislineMark() {
  return (
    <svg width="28" height="28" viewBox="0 0 32 32" aria-hidden="true">
      <circle cx="16" cy="16" r="14" fill="none" stroke="currentColor" strokeOpacity="0.35" strokeWidth="1.5" />
      <line x1="16" y1="2" x2="16" y2="30" stroke="currentColor" strokeOpacity="0.35" strokeWidth="1.5" />
      <path d="M16 16 C 4 16, 4 2, 16 2 C 28 2, 28 16, 16 16 Z" fill="var(--color-accent)" stroke="var(--color-accent-line)" strokeWidth="1.5" />
    </svg>
  );
}
