import { useId, type ComponentProps, type ReactNode } from "react";
import { cx } from "./cx";
import { describedBy, FieldErrorMessage, hasFieldError, type FieldError } from "./field-message";
import { CheckIcon } from "./icons";

export type CheckboxProps = Omit<ComponentProps<"input">, "type" | "children"> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: FieldError;
};

/** Box drawn by us; the check mark is a shape, so "checked" never depends on colour (WCAG 1.4.1). */
export const toggleBoxClassName = cx(
  "peer size-6 shrink-0 appearance-none border-2 border-border bg-surface-raised", // 24 px: WCAG 2.5.8
  "transition-colors duration-150 hover:border-ink",
  "checked:border-accent-line checked:bg-accent",
  "disabled:cursor-not-allowed disabled:opacity-55",
  "aria-invalid:border-danger",
);

/** A single checkbox with its label (the whole row is clickable). Posts `value` (default "on") under `name`. */
export function Checkbox({ label, hint, error, id, className, ...props }: CheckboxProps) {
  const generatedId = useId();
  const inputId = id ?? `checkbox-${generatedId}`;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  const invalid = hasFieldError(error);

  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <div className="flex items-start gap-3">
        <span className="relative inline-grid shrink-0 place-items-center">
          <input
            type="checkbox"
            id={inputId}
            aria-describedby={describedBy(hint ? hintId : undefined, invalid && errorId)}
            aria-invalid={invalid || undefined}
            className={cx(toggleBoxClassName, "rounded-tag")}
            {...props}
          />
          <CheckIcon className="pointer-events-none absolute hidden size-5 text-accent-ink peer-checked:block" />
        </span>
        <span className="flex min-h-target flex-col justify-center">
          <label htmlFor={inputId} className="cursor-pointer text-body text-ink">
            {label}
          </label>
          {hint && (
            <span id={hintId} className="text-body-sm text-ink-muted">
              {hint}
            </span>
          )}
        </span>
      </div>
      {invalid && <FieldErrorMessage id={errorId} error={error} className="pl-9" />}
    </div>
  );
}
