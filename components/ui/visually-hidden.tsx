import type { ComponentProps } from "react";
import { cx } from "./cx";

/** Text for screen readers only (still read, still selectable by assistive tech). */
export function VisuallyHidden({ className, ...props }: ComponentProps<"span">) {
  return <span className={cx("sr-only", className)} {...props} />;
}
