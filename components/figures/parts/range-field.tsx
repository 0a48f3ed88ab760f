"use client";
// Sliders for the figures. A native range input is keyboard-operable for free (arrows, Page
// Up/Down, Home/End) and is a single-pointer control (WCAG 2.1.1, 2.5.7). It is 24 px tall
// (WCAG 2.5.8) and says its value in words through aria-valuetext.
import { useId, type ReactNode } from "react";
import { cx } from "@/components/ui/cx";

const rangeClassName = "h-6 w-full cursor-pointer accent-[var(--color-accent-line)]";

export interface RangeFieldProps {
  label: ReactNode;
  value: number;
  min: number;
  max: number;
  step: number;
  /** The value as shown and read out, e.g. "0.30 m". */
  valueText: string;
  onChange: (value: number) => void;
  hint?: ReactNode;
  testId?: string;
  className?: string;
}

/** A labelled linear slider with its value beside the label. */
export function RangeField({ label, value, min, max, step, valueText, onChange, hint, testId, className }: RangeFieldProps) {
  const id = useId();
  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <div className="flex items-baseline justify-between gap-3">
        <label htmlFor={id} className="text-body-sm font-semibold text-ink">
          {label}
        </label>
        <output htmlFor={id} className="font-mono text-body-sm whitespace-nowrap text-ink">
          {valueText}
        </output>
      </div>
      <input
        id={id}
        type="range"
        min={min}
        max={max}
        step={step}
        value={value}
        aria-valuetext={valueText}
        aria-describedby={hint ? `${id}-hint` : undefined}
        data-testid={testId}
        onChange={(event) => onChange(Number(event.currentTarget.value))}
        className={rangeClassName}
      />
      {hint && (
        <p id={`${id}-hint`} className="text-caption text-ink-muted">
          {hint}
        </p>
      )}
    </div>
  );
}

export interface SeriesRangeFieldProps extends Omit<RangeFieldProps, "min" | "max" | "step" | "value" | "onChange"> {
  /** Allowed values in ascending order; the slider moves through them one by one. */
  series: readonly number[];
  value: number;
  onChange: (value: number) => void;
}

/** Index of the series entry nearest to `value` (on a log scale, since series are geometric). */
export function nearestSeriesIndex(series: readonly number[], value: number): number {
  let bestIndex = 0;
  let bestDistance = Infinity;
  series.forEach((entry, index) => {
    const distance = value > 0 && entry > 0 ? Math.abs(Math.log(entry / value)) : Math.abs(entry - value);
    if (distance < bestDistance) {
      bestDistance = distance;
      bestIndex = index;
    }
  });
  return bestIndex;
}

/** A slider over a list of round values (1, 1.2, 1.5, 2…), for quantities that span decades. */
export function SeriesRangeField({ series, value, onChange, ...rest }: SeriesRangeFieldProps) {
  return (
    <RangeField
      {...rest}
      min={0}
      max={series.length - 1}
      step={1}
      value={nearestSeriesIndex(series, value)}
      onChange={(index) => onChange(series[index])}
    />
  );
}

/** Round mantissas per decade: fine enough for 3:1, 0.35 m or 0.7 m, coarse enough to sweep decades. */
const MANTISSAS = [1, 1.2, 1.4, 1.5, 1.6, 1.8, 2, 2.2, 2.5, 2.8, 3, 3.5, 4, 4.5, 5, 6, 7, 8, 9];

/** Round values from `min` to `max` inclusive, both ends included even if not round. */
export function roundSeries(min: number, max: number, mantissas: readonly number[] = MANTISSAS): number[] {
  const values = new Set<number>([min]);
  for (let exponent = Math.floor(Math.log10(min)); exponent <= Math.ceil(Math.log10(max)); exponent += 1) {
    for (const mantissa of mantissas) {
      const value = Number((mantissa * 10 ** exponent).toPrecision(3));
      if (value > min && value < max) values.add(value);
    }
  }
  values.add(max);
  return [...values].sort((left, right) => left - right);
}
