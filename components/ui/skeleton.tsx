import type { ComponentProps, ReactNode } from "react";
import { cx } from "./cx";

/** A grey placeholder shape; hidden from assistive tech (LoadingRegion speaks for it). */
export function Skeleton({ className, ...props }: Omit<ComponentProps<"div">, "children">) {
  return (
    <div
      aria-hidden="true"
      className={cx("h-4 animate-skeleton rounded-control bg-rule", className)}
      {...props}
    />
  );
}

export type LoadingRegionProps = {
  /** Read once by screen readers, e.g. "Loading the review queue". */
  label?: string;
  children: ReactNode;
  className?: string;
};

/** Wraps skeletons in a polite status region (WCAG 4.1.3) that says what is loading. */
export function LoadingRegion({ label = "Loading…", children, className }: LoadingRegionProps) {
  return (
    <div role="status" className={cx("flex flex-col gap-3", className)}>
      <span className="sr-only">{label}</span>
      {children}
    </div>
  );
}
