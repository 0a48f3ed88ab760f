import type { ComponentProps } from "react";
import { cx } from "./cx";
import { SpinnerIcon } from "./icons";

export type ButtonVariant = "primary" | "secondary" | "ghost" | "danger";
export type ButtonSize = "sm" | "md" | "lg";

export type ButtonStyleOptions = {
  variant?: ButtonVariant;
  size?: ButtonSize;
  className?: string;
};

// Every variant keeps a border (transparent where unseen) so forced-colours mode draws an edge.
const variantClasses: Record<ButtonVariant, string> = {
  primary: "bg-accent text-accent-ink border-accent-line hover:bg-accent-hover",
  secondary: "bg-surface-raised text-ink border-border hover:bg-surface-sunken",
  ghost: "bg-transparent text-ink border-transparent hover:bg-surface-sunken",
  // Mixing toward ink darkens in light and lightens in dark: contrast with danger-ink only grows.
  danger:
    "bg-danger text-danger-ink border-danger hover:bg-[color-mix(in_oklab,var(--color-danger)_85%,var(--color-ink))]",
};

// Smallest is 32 px tall: above the 24 × 24 px minimum of WCAG 2.2 SC 2.5.8.
const sizeClasses: Record<ButtonSize, string> = {
  sm: "min-h-control-sm px-3 text-body-sm gap-1.5",
  md: "min-h-control-md px-4 text-body gap-2",
  lg: "min-h-control-lg px-5 text-lead gap-2.5",
};

/** The button look, shared with LinkButton. */
export function buttonClassName({ variant = "primary", size = "md", className }: ButtonStyleOptions = {}) {
  return cx(
    "inline-flex min-w-target items-center justify-center rounded-control border font-semibold",
    "text-center no-underline transition-colors duration-150 select-none",
    "disabled:cursor-not-allowed disabled:opacity-55",
    // A loading button is busy, not unavailable: it keeps full colour (and its contrast).
    "aria-disabled:not-data-loading:cursor-not-allowed aria-disabled:not-data-loading:opacity-55",
    variantClasses[variant],
    sizeClasses[size],
    className,
  );
}

export type ButtonProps = ComponentProps<"button"> &
  Omit<ButtonStyleOptions, "className"> & {
    /** Shows a spinner and blocks pointer presses; the label stays so the button keeps its name. */
    loading?: boolean;
    /** Read after the label while loading. */
    loadingText?: string;
  };

/**
 * A button. `type` defaults to "button" so a button inside a form never submits by accident;
 * pass `type="submit"` (or use SubmitButton) for the form's action.
 */
export function Button({
  variant,
  size,
  loading = false,
  loadingText = "working…",
  type = "button",
  className,
  children,
  ...props
}: ButtonProps) {
  return (
    <button
      {...props}
      type={type}
      // aria-disabled rather than disabled while loading: a disabled button drops keyboard focus.
      aria-disabled={loading || props["aria-disabled"] || undefined}
      data-loading={loading || undefined}
      className={buttonClassName({ variant, size, className: cx(loading && "pointer-events-none", className) })}
    >
      {loading && <SpinnerIcon />}
      {children}
      {loading && <span className="sr-only">, {loadingText}</span>}
    </button>
  );
}
