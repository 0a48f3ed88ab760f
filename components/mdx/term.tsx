"use client";
// <Term id="proximity-effect">proximity effect</Term>: a link to the glossary entry whose
// definition appears on hover and on keyboard focus. WCAG 1.4.13: the definition can be dismissed
// with Escape without moving pointer or focus, the pointer can move onto it without it vanishing,
// and it stays until hover or focus leaves. It is also the link's accessible description.
import { useCallback, useEffect, useId, useLayoutEffect, useRef, useState, type ReactNode } from "react";

export type TermProps = {
  id: string;
  /** Added by the content pipeline from content/glossary.json. */
  term?: string;
  definition?: string;
  children?: ReactNode;
};

/** Gap kept between the definition box and the viewport edge, CSS px. */
const EDGE_GAP_PX = 8;

export function Term({ id, term, definition, children }: TermProps) {
  const tipId = `term-${useId()}`;
  const [hovered, setHovered] = useState(false);
  const [focused, setFocused] = useState(false);
  const [dismissed, setDismissed] = useState(false);
  const [shiftPx, setShiftPx] = useState(0);
  const tipRef = useRef<HTMLSpanElement>(null);
  const open = Boolean(definition) && (hovered || focused) && !dismissed;

  const dismissOnEscape = useCallback((event: KeyboardEvent) => {
    if (event.key === "Escape") setDismissed(true);
  }, []);

  useEffect(() => {
    if (!open) return;
    document.addEventListener("keydown", dismissOnEscape);
    return () => document.removeEventListener("keydown", dismissOnEscape);
  }, [open, dismissOnEscape]);

  // Keep the box inside the viewport on narrow screens (no sideways scrolling, WCAG 1.4.10).
  useLayoutEffect(() => {
    if (!open || !tipRef.current) return;
    const rect = tipRef.current.getBoundingClientRect();
    const overflow = rect.right - shiftPx - (window.innerWidth - EDGE_GAP_PX);
    setShiftPx(overflow > 0 ? -Math.min(overflow, Math.max(0, rect.left - shiftPx - EDGE_GAP_PX)) : 0);
    // shiftPx is read, not tracked: measuring again after our own shift would loop.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open]);

  const reset = () => setDismissed(false);

  return (
    <span
      className="relative inline"
      data-term={id}
      onMouseEnter={() => {
        reset();
        setHovered(true);
      }}
      onMouseLeave={() => setHovered(false)}
      onFocus={() => {
        reset();
        setFocused(true);
      }}
      onBlur={(event) => {
        if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setFocused(false);
      }}
      // Focus case handled here at once; the document listener covers hover with focus elsewhere.
      onKeyDown={(event) => {
        if (event.key === "Escape" && open) setDismissed(true);
      }}
    >
      <a
        href={`/glossary#${id}`}
        aria-describedby={definition ? tipId : undefined}
        className="decoration-dotted underline-offset-4 [text-decoration-thickness:1.5px] hover:decoration-solid"
      >
        {children}
      </a>
      {definition ? (
        <span
          ref={tipRef}
          id={tipId}
          role="tooltip"
          data-state={open ? "open" : "closed"}
          style={open ? { transform: `translateX(${shiftPx}px)` } : undefined}
          className={
            open
              ? "absolute top-full left-0 z-30 block w-72 max-w-[calc(100vw-1rem)] pt-1 print:hidden"
              : "sr-only"
          }
        >
          <span className="block rounded-control border border-border bg-surface-raised px-3 py-2 text-left text-body-sm font-normal text-ink not-italic shadow-overlay">
            <strong className="font-semibold">{term ?? children}</strong>: {definition}
          </span>
        </span>
      ) : null}
    </span>
  );
}
