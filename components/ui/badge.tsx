import type { ComponentProps } from "react";
import { cx } from "./cx";
import { AlertIcon, CautionIcon, CheckIcon, InfoIcon } from "./icons";

export type BadgeTone = "neutral" | "accent" | "secondary" | "success" | "caution" | "danger" | "note";

const toneClasses: Record<BadgeTone, string> = {
  neutral: "bg-surface-sunken text-ink-muted border-border",
  accent: "bg-accent-soft text-accent-text border-accent-line",
  secondary: "bg-secondary-soft text-secondary-text border-secondary",
  success: "bg-success-soft text-success border-success",
  caution: "bg-caution-soft text-caution border-caution",
  danger: "bg-danger-soft text-danger border-danger",
  note: "bg-note-soft text-note border-note",
};

const toneIcons = { success: CheckIcon, caution: CautionIcon, danger: AlertIcon, note: InfoIcon } as const;

export type BadgeProps = ComponentProps<"span"> & {
  tone?: BadgeTone;
  /** Adds the tone's glyph, for status badges seen at a glance (the words still say it). */
  withIcon?: boolean;
  /** Lets a long label wrap inside the screen (a lesson's list of safety topics on a phone). */
  wraps?: boolean;
};

/** A short status label. The words carry the meaning; tone only reinforces it (WCAG 1.4.1). */
export function Badge({ tone = "neutral", withIcon = false, wraps = false, className, children, ...props }: BadgeProps) {
  const Icon = withIcon && tone in toneIcons ? toneIcons[tone as keyof typeof toneIcons] : null;
  return (
    <span
      className={cx(
        "inline-flex items-center gap-1 rounded-tag border px-2 py-0.5 text-caption font-semibold",
        wraps ? "max-w-full" : "whitespace-nowrap",
        toneClasses[tone],
        className,
      )}
      {...props}
    >
      {Icon && <Icon className="size-[1em] shrink-0" />}
      {children}
    </span>
  );
}
