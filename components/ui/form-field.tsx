import { useId, type ReactNode } from "react";
import { cx } from "./cx";
import { describedBy, FieldErrorMessage, FieldHint, hasFieldError, type FieldError } from "./field-message";

/** Spread these onto the control: they tie it to its label, hint and error. */
export type FieldControlProps = {
  id: string;
  name: string;
  required?: boolean;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
};

export type FormFieldProps = {
  label: ReactNode;
  /** The form-data key the server action reads. */
  name: string;
  /** Defaults to a generated id. */
  id?: string;
  hint?: ReactNode;
  /** The server action's message(s) for this field; shown and announced with the control. */
  error?: FieldError;
  required?: boolean;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
};

/**
 * Label + control + hint + error, wired with for/id, aria-describedby and aria-invalid
 * (WCAG 1.3.1, 3.3.1, 3.3.2). No client state: it renders on the server from the action's
 * returned errors, and the control posts under its plain `name`.
 *
 *   <FormField label="E-mail" name="email" error={state.errors?.email}>
 *     {(control) => <Input type="email" autoComplete="email" {...control} />}
 *   </FormField>
 */
export function FormField({ label, name, id, hint, error, required, className, children }: FormFieldProps) {
  const generatedId = useId();
  const controlId = id ?? `field-${generatedId}`;
  const hintId = `${controlId}-hint`;
  const errorId = `${controlId}-error`;
  const invalid = hasFieldError(error);

  return (
    <div className={cx("flex flex-col gap-1.5", className)}>
      <label htmlFor={controlId} className="text-body font-semibold text-ink">
        {label}
        {required && <span className="font-normal text-ink-muted"> (required)</span>}
      </label>
      {hint && <FieldHint id={hintId}>{hint}</FieldHint>}
      {children({
        id: controlId,
        name,
        required: required || undefined,
        "aria-describedby": describedBy(hint ? hintId : undefined, invalid && errorId),
        "aria-invalid": invalid ? true : undefined,
      })}
      {invalid && <FieldErrorMessage id={errorId} error={error} />}
    </div>
  );
}
