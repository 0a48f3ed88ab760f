"use client";
import { usePathname } from "next/navigation";
import { useRef, useState, type FocusEvent, type KeyboardEvent, type MouseEvent } from "react";
import { cx } from "@/components/ui/cx";
import { SITE_MENU_BUTTON_ID, SITE_MENU_ID } from "./site-menu-ids";

/**
 * Below Tailwind's lg (1024 px) the header's links, search and account sit in a panel that a
 * "Menu" button shows and hides: the WAI-ARIA APG disclosure pattern (a native button with
 * aria-expanded and aria-controls; focus stays on the button, and Tab walks into the panel, which
 * follows it in the DOM). Escape closes it and gives focus back to the button; following a link,
 * searching, moving to another page or tabbing out of the header close it too.
 * From lg up the button is gone and the panel is always shown, laid out as two rows (site links
 * and search; the role's links and the account), so one set of elements serves every width.
 */
export function HeaderMenu({ children }: { children: React.ReactNode }) {
  const pathname = usePathname();
  // The page the menu was opened on: going to another page closes it, with no effect needed.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn !== null && openOn === pathname;
  const button = useRef<HTMLButtonElement>(null);

  function close(returnFocus: boolean) {
    setOpenOn(null);
    if (returnFocus) button.current?.focus();
  }
  function onKeyDown(event: KeyboardEvent) {
    if (open && event.key === "Escape") {
      event.preventDefault();
      close(true);
    }
  }
  function onBlur(event: FocusEvent) {
    // Only when focus lands on something outside (a click on the panel's background moves it nowhere).
    const next = event.relatedTarget;
    if (open && next instanceof Node && !event.currentTarget.contains(next)) close(false);
  }
  function onClick(event: MouseEvent) {
    // A same-page link (/#for-schools on the home page) changes no pathname, so a link click closes it.
    if (event.target instanceof Element && event.target.closest("a")) close(false);
  }

  return (
    <div className="contents" onKeyDown={onKeyDown} onBlur={onBlur}>
      <button
        ref={button}
        id={SITE_MENU_BUTTON_ID}
        type="button"
        aria-expanded={open}
        aria-controls={SITE_MENU_ID}
        onClick={() => setOpenOn(open ? null : pathname)}
        className="inline-flex min-h-10 items-center gap-2 rounded-control border border-border bg-surface-raised px-3 font-semibold text-ink hover:bg-surface-sunken lg:hidden"
      >
        <MenuGlyph open={open} />
        Menu
      </button>
      <div
        id={SITE_MENU_ID}
        onClick={onClick}
        onSubmit={() => close(false)}
        className={cx(
          open ? "flex" : "hidden",
          "mt-3 basis-full flex-col gap-3 border-t border-rule pt-3",
          "lg:mt-0 lg:grid lg:flex-1 lg:basis-auto lg:grid-cols-[minmax(0,1fr)_auto] lg:items-center lg:gap-x-4 lg:gap-y-3 lg:border-0 lg:pt-0",
        )}
      >
        {children}
      </div>
    </div>
  );
}

/** Three rules, or a cross while the panel is open (the button's name stays "Menu"; aria-expanded says which). */
function MenuGlyph({ open }: { open: boolean }) {
  return (
    <svg width="18" height="18" viewBox="0 0 18 18" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round">
      {open ? <path d="M4 4l10 10M14 4L4 14" /> : <path d="M2 4h14M2 9h14M2 14h14" />}
    </svg>
  );
}
