import type { ComponentProps } from "react";
import { controlClassName } from "./control-styles";
import { cx } from "./cx";

/** Multi-line text. Grows vertically only, so a page never scrolls sideways (WCAG 1.4.10). */
export function Textarea({ className, rows = 4, ...props }: ComponentProps<"textarea">) {
  return <textarea rows={rows} className={controlClassName(cx("resize-y read-only:bg-surface-sunken", className))} {...props} />;
}
