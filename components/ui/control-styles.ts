import { cx } from "./cx";

/**
 * The look shared by text inputs, textareas and selects. The border uses `border`
 * (≥ 3:1 against every surface, WCAG 1.4.11). An invalid control gets a thicker danger edge,
 * but the error text beside it (FormField) is what carries the state (WCAG 1.4.1).
 */
export function controlClassName(className?: string) {
  return cx(
    "block w-full min-h-control-md rounded-control border border-border bg-surface-raised px-3 py-2",
    "text-body text-ink placeholder:text-ink-muted",
    "transition-colors duration-150 hover:border-ink",
    "disabled:cursor-not-allowed disabled:bg-surface-sunken disabled:opacity-60",
    "aria-invalid:border-danger aria-invalid:shadow-[inset_0_0_0_1px_var(--color-danger)]",
    className,
  );
}
