import type { ComponentProps } from "react";
import { controlClassName } from "./control-styles";
import { cx } from "./cx";

/** A single-line text input. Pair it with FormField for its label, hint and error. */
export function Input({ className, type = "text", ...props }: ComponentProps<"input">) {
  // :read-only also matches checkboxes and selects, so only text controls get the read-only well.
  return <input type={type} className={controlClassName(cx("read-only:bg-surface-sunken", className))} {...props} />;
}
