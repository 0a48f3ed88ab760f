import type { ReactNode } from "react";
import { cx } from "./cx";
import { AlertIcon } from "./icons";

/** A field's error as written by a server action: one message or zod's list of messages. */
export type FieldError = string | readonly string[] | ReactNode;

export function hasFieldError(error: FieldError | undefined): boolean {
  if (error === undefined || error === null || error === false || error === "") return false;
  if (Array.isArray(error)) return error.length > 0;
  return true;
}

/** Hint under a label, referenced by the control's aria-describedby. */
export function FieldHint({ id, children, className }: { id: string; children: ReactNode; className?: string }) {
  return (
    <p id={id} className={cx("text-body-sm text-ink-muted", className)}>
      {children}
    </p>
  );
}

/**
 * Error text for a field: an icon and the word "Error" (for screen readers) beside the message,
 * so the state is not carried by colour alone (WCAG 1.4.1, 3.3.1).
 */
export function FieldErrorMessage({ id, error, className }: { id: string; error: FieldError; className?: string }) {
  const messages = Array.isArray(error) ? (error as readonly string[]) : [error as ReactNode];
  return (
    <div id={id} className={cx("flex items-start gap-1.5 text-body-sm font-semibold text-danger", className)}>
      <AlertIcon className="mt-0.5" />
      <div>
        {messages.map((message, index) => (
          <p key={index}>
            <span className="sr-only">Error: </span>
            {message}
          </p>
        ))}
      </div>
    </div>
  );
}

/** Joins the ids a control should be described by, skipping absent ones. */
export function describedBy(...ids: ReadonlyArray<string | false | undefined>): string | undefined {
  const present = ids.filter(Boolean);
  return present.length > 0 ? present.join(" ") : undefined;
}
