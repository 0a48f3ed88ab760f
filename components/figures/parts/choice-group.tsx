"use client";
// A controlled group of native radios in a fieldset (arrow keys move the choice; WCAG 1.3.1).
// Each option is a 24 px-tall pill, so the whole label is the target (WCAG 2.5.8).
import { useId, type ReactNode } from "react";
import { cx } from "@/components/ui/cx";

export interface ChoiceOption<Value extends string> {
  value: Value;
  label: ReactNode;
}

export interface ChoiceGroupProps<Value extends string> {
  legend: ReactNode;
  options: readonly ChoiceOption<Value>[];
  /** The chosen value; a value not among the options (e.g. "custom") leaves every radio unchecked. */
  value: string;
  onChange: (value: Value) => void;
  testId?: string;
  className?: string;
}

export function ChoiceGroup<Value extends string>({ legend, options, value, onChange, testId, className }: ChoiceGroupProps<Value>) {
  const name = `choice-${useId()}`;
  return (
    <fieldset className={cx("flex min-w-0 flex-col gap-1.5", className)} data-testid={testId}>
      <legend className="mb-1 text-body-sm font-semibold text-ink">{legend}</legend>
      <div className="flex flex-wrap gap-1.5">
        {options.map((option) => {
          const checked = option.value === value;
          return (
            <label
              key={option.value}
              className={cx(
                "inline-flex min-h-8 cursor-pointer items-center gap-1.5 rounded-control border px-2.5 text-body-sm",
                "has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus",
                checked ? "border-accent-line bg-accent-soft font-semibold text-ink" : "border-border bg-surface-raised text-ink hover:bg-surface-sunken",
              )}
            >
              <input
                type="radio"
                name={name}
                value={option.value}
                checked={checked}
                onChange={() => onChange(option.value)}
                className="size-4 accent-[var(--color-accent-line)] focus-visible:outline-none"
              />
              {option.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
