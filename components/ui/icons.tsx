import type { ComponentProps, ReactNode } from "react";
import { cx } from "./cx";

/* Small inline glyphs, drawn with currentColor so they follow text colour and forced-colours
   mode. Decorative by default: the text beside them carries the meaning (WCAG 1.1.1, 1.4.1). */

type IconProps = Omit<ComponentProps<"svg">, "children">;

function Glyph({ className, children, ...props }: IconProps & { children: ReactNode }) {
  return (
    <svg
      viewBox="0 0 20 20"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      className={cx("size-[1.125em] shrink-0", className)}
      {...props}
    >
      {children}
    </svg>
  );
}

export function CheckIcon(props: IconProps) {
  return (
    <Glyph {...props}>
      <path d="M4.5 10.5l3.5 3.5 7.5-8" />
    </Glyph>
  );
}

export function CloseIcon(props: IconProps) {
  return (
    <Glyph {...props}>
      <path d="M5 5l10 10M15 5L5 15" />
    </Glyph>
  );
}

/** Exclamation in a triangle: errors and dangers. */
export function AlertIcon(props: IconProps) {
  return (
    <Glyph {...props}>
      <path d="M10 2.75L18 17H2L10 2.75z" />
      <path d="M10 8v4M10 14.75v.01" />
    </Glyph>
  );
}

/** Exclamation in a circle: cautions. */
export function CautionIcon(props: IconProps) {
  return (
    <Glyph {...props}>
      <circle cx="10" cy="10" r="7.5" />
      <path d="M10 6v5M10 13.75v.01" />
    </Glyph>
  );
}

/** "i" in a circle: notes. */
export function InfoIcon(props: IconProps) {
  return (
    <Glyph {...props}>
      <circle cx="10" cy="10" r="7.5" />
      <path d="M10 9v5M10 6.25v.01" />
    </Glyph>
  );
}

export function ChevronDownIcon(props: IconProps) {
  return (
    <Glyph {...props}>
      <path d="M5.5 8l4.5 4.5L14.5 8" />
    </Glyph>
  );
}

/** Spinning arc; the spin stops under prefers-reduced-motion (the arc itself still shows). */
export function SpinnerIcon({ className, ...props }: IconProps) {
  return (
    <Glyph className={cx("motion-safe:animate-spin", className)} {...props}>
      <path d="M10 2.5a7.5 7.5 0 1 1-7.5 7.5" />
    </Glyph>
  );
}
