"use client";

import * as TabsPrimitive from "@radix-ui/react-tabs";
import type { ComponentProps } from "react";
import { cx } from "./cx";

/* Radix Tabs supplies the WAI-ARIA tabs pattern: roles, aria-selected/controls, arrow keys,
   Home/End. We add the look: the selected tab gets a 3 px amber bar and bold weight,
   so selection is shown by shape and weight, not colour alone (WCAG 1.4.1). */

export function Tabs({ className, ...props }: ComponentProps<typeof TabsPrimitive.Root>) {
  return <TabsPrimitive.Root className={cx("flex flex-col gap-4", className)} {...props} />;
}

export type TabsListProps = ComponentProps<typeof TabsPrimitive.List> & {
  /** Names the tab list for screen readers, e.g. "Lesson views". */
  "aria-label": string;
};

export function TabsList({ className, ...props }: TabsListProps) {
  return (
    <TabsPrimitive.List
      className={cx("flex max-w-full gap-1 overflow-x-auto border-b border-rule", className)}
      {...props}
    />
  );
}

export function TabsTrigger({ className, ...props }: ComponentProps<typeof TabsPrimitive.Trigger>) {
  return (
    <TabsPrimitive.Trigger
      className={cx(
        "relative -mb-px inline-flex min-h-control-md min-w-target items-center px-3 text-body whitespace-nowrap",
        "rounded-t-control text-ink-muted transition-colors duration-150 hover:bg-surface-sunken hover:text-ink",
        "after:absolute after:inset-x-2 after:bottom-0 after:h-[3px] after:rounded-pill after:bg-transparent",
        "data-[state=active]:font-semibold data-[state=active]:text-ink data-[state=active]:after:bg-accent-line",
        "disabled:cursor-not-allowed disabled:opacity-55",
        "focus-visible:outline-offset-[-3px]",
        className,
      )}
      {...props}
    />
  );
}

export function TabsContent({ className, ...props }: ComponentProps<typeof TabsPrimitive.Content>) {
  return <TabsPrimitive.Content className={cx("rounded-control", className)} {...props} />;
}
