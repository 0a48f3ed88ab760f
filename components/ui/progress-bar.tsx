import { useId, type ReactNode } from "react";
import { cx } from "./cx";

export type ProgressBarProps = {
  /** Visible name, e.g. "Band-miking course". */
  label: ReactNode;
  valueNow: number;
  valueMin?: number;
  valueMax?: number;
  /** Words for the value, e.g. "7 of 12 lessons"; defaults to the whole percentage. */
  valueText?: string;
  className?: string;
};

/** Fraction done, as a whole percentage clamped to 0–100. */
export function progressPercent(valueNow: number, valueMin: number, valueMax: number): number {
  if (!(valueMax > valueMin)) return 0;
  const fraction = (valueNow - valueMin) / (valueMax - valueMin);
  return Math.round(Math.min(1, Math.max(0, fraction)) * 100);
}

/**
 * role="progressbar" with aria-valuenow/min/max/valuetext (WAI-ARIA 1.2) and the same value in
 * visible text, so the bar is never the only way to read it.
 */
export function ProgressBar({ label, valueNow, valueMin = 0, valueMax = 100, valueText, className }: ProgressBarProps) {
  const labelId = `progress-${useId()}`;
  const clampedNow = Math.min(valueMax, Math.max(valueMin, valueNow));
  const percent = progressPercent(valueNow, valueMin, valueMax);
  const spokenValue = valueText ?? `${percent}%`;

  return (
    <div className={cx("flex flex-col gap-1.5", className)}>
      <div className="flex items-baseline justify-between gap-4 text-body-sm">
        <span id={labelId} className="font-semibold text-ink">
          {label}
        </span>
        <span className="font-mono text-ink-muted tabular-nums">{spokenValue}</span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={labelId}
        aria-valuenow={clampedNow}
        aria-valuemin={valueMin}
        aria-valuemax={valueMax}
        aria-valuetext={spokenValue}
        className="h-3 overflow-hidden rounded-pill border border-border bg-surface-sunken"
      >
        <div className="h-full bg-accent-line transition-[width] duration-300" style={{ width: `${percent}%` }} />
      </div>
    </div>
  );
}
