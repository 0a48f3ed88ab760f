import type { ComponentProps } from "react";
import { controlClassName } from "./control-styles";
import { cx } from "./cx";
import { ChevronDownIcon } from "./icons";

export type SelectProps = ComponentProps<"select"> & {
  /** Classes for the wrapper (layout); the native <select> fills it. */
  className?: string;
};

/** A native <select> (keyboard, screen-reader and mobile pickers for free) with our chevron. */
export function Select({ className, children, ...props }: SelectProps) {
  return (
    <div className={cx("relative", className)}>
      <select className={controlClassName("appearance-none pr-10")} {...props}>
        {children}
      </select>
      <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-ink-muted" />
    </div>
  );
}
