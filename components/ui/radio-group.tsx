import { useId, type ReactNode } from "react";
import { toggleBoxClassName } from "./checkbox";
import { cx } from "./cx";
import { describedBy, FieldErrorMessage, FieldHint, hasFieldError, type FieldError } from "./field-message";

export type RadioOption = {
  value: string;
  label: ReactNode;
  hint?: ReactNode;
  disabled?: boolean;
};

export type RadioGroupProps = {
  legend: ReactNode;
  name: string;
  options: readonly RadioOption[];
  defaultValue?: string;
  hint?: ReactNode;
  error?: FieldError;
  required?: boolean;
  orientation?: "vertical" | "horizontal";
  className?: string;
};

/**
 * One choice from a few, as native radios in a fieldset/legend (WCAG 1.3.1): arrow keys
 * move between options and the form posts the chosen `value` under `name`.
 * role="radiogroup" is an allowed role for <fieldset> and is the role that may carry aria-invalid.
 */
export function RadioGroup({
  legend,
  name,
  options,
  defaultValue,
  hint,
  error,
  required,
  orientation = "vertical",
  className,
}: RadioGroupProps) {
  const groupId = `radios-${useId()}`;
  const legendId = `${groupId}-legend`;
  const hintId = `${groupId}-hint`;
  const errorId = `${groupId}-error`;
  const invalid = hasFieldError(error);

  return (
    <fieldset
      role="radiogroup"
      aria-labelledby={legendId}
      aria-describedby={describedBy(hint ? hintId : undefined, invalid && errorId)}
      aria-invalid={invalid || undefined}
      aria-required={required || undefined}
      className={cx("flex flex-col gap-2", className)}
    >
      <legend id={legendId} className="mb-1 text-body font-semibold text-ink">
        {legend}
        {required && <span className="font-normal text-ink-muted"> (required)</span>}
      </legend>
      {hint && <FieldHint id={hintId}>{hint}</FieldHint>}
      <div className={cx("flex gap-x-6 gap-y-2", orientation === "vertical" ? "flex-col" : "flex-row flex-wrap")}>
        {options.map((option, index) => {
          // Index, not value, in the id: a value may contain characters an id reference cannot.
          const optionId = `${groupId}-${index}`;
          const optionHintId = `${optionId}-hint`;
          return (
            <div key={option.value} className="flex items-start gap-3">
              <span className="relative inline-grid shrink-0 place-items-center">
                <input
                  type="radio"
                  id={optionId}
                  name={name}
                  value={option.value}
                  defaultChecked={defaultValue === option.value}
                  disabled={option.disabled}
                  required={required}
                  aria-describedby={option.hint ? optionHintId : undefined}
                  className={cx(toggleBoxClassName, "rounded-full")}
                />
                {/* The dot: a shape, so the chosen option never depends on colour. */}
                <span
                  aria-hidden="true"
                  className="pointer-events-none absolute hidden size-2.5 rounded-full bg-accent-ink peer-checked:block"
                />
              </span>
              <span className="flex min-h-target flex-col justify-center">
                <label htmlFor={optionId} className="cursor-pointer text-body text-ink">
                  {option.label}
                </label>
                {option.hint && (
                  <span id={optionHintId} className="text-body-sm text-ink-muted">
                    {option.hint}
                  </span>
                )}
              </span>
            </div>
          );
        })}
      </div>
      {invalid && <FieldErrorMessage id={errorId} error={error} />}
    </fieldset>
  );
}
