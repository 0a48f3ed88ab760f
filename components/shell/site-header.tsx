import Link from "next/link";
import { AccountLinks, RoleNav } from "./account-menu";
import { HeaderMenu } from "./header-menu";
import { SearchBox } from "./search-box";
import { PUBLIC_NAV } from "./nav-links";
import { SITE_MENU_BUTTON_ID, SITE_MENU_ID } from "./site-menu-ids";

const SITE_LINKS = [{ href: "/courses", label: "Courses" }, { href: "/bench", label: "Bench" }, ...PUBLIC_NAV];

/**
 * Phones and tablets (below lg, 1024 px): the brand and a "Menu" button, 65 px high, that opens
 * the links, search and account (HeaderMenu). From lg up: two rows, site links and search, then
 * the role's links and the account. Its height never depends on /api/me: the account part is
 * 40 px high whether loading, signed out or signed in, and on phones it is inside the closed panel.
 */
export function SiteHeader() {
  return (
    <header className="border-b border-rule bg-surface-raised print:hidden">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-surface-raised focus:p-2">
        Skip to content
      </a>
      {/* Without JavaScript the button can't open anything, so the panel is simply shown. */}
      <noscript>
        <style>{`@media (width < 64rem) { #${SITE_MENU_ID} { display: flex } #${SITE_MENU_BUTTON_ID} { display: none } }`}</style>
      </noscript>
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-x-4 px-4 py-3 lg:flex-nowrap lg:items-start">
        <Link href="/" className="flex min-h-10 shrink-0 items-center gap-2 font-bold tracking-tight text-ink" aria-label="Axisline home">
          <AxislineMark />
          <span className="text-lg">Axisline</span>
        </Link>
        <HeaderMenu>
          <nav aria-label="Main" className="lg:col-start-1 lg:row-start-1">
            <ul className="grid grid-cols-2 gap-1 lg:flex lg:flex-wrap lg:text-sm">
              {SITE_LINKS.map((l) => (
                <li key={l.href}>
                  <Link href={l.href} className="inline-flex min-h-10 items-center rounded-md px-2 text-ink-muted hover:text-ink">
                    {l.label}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
          <SearchBox className="w-full lg:col-start-2 lg:row-start-1 lg:w-80" />
          <RoleNav className="border-t border-rule pt-3 lg:col-start-1 lg:row-start-2 lg:border-0 lg:pt-0" />
          <AccountLinks className="lg:col-start-2 lg:row-start-2 lg:max-w-[22rem] lg:justify-self-end" />
        </HeaderMenu>
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
