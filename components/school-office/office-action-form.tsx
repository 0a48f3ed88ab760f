"use client";
// One small school-office action (withdraw, reclaim, move, assign): hidden ids, the controls the
// page passes in, a button, and the server's sentence announced beside it.
import { useActionState, type ReactNode } from "react";
import type { ButtonVariant } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { SubmitButton } from "@/components/ui/submit-button";
import type { FormState } from "@/lib/dto/result";

export type OfficeAction = (state: FormState, form: FormData) => Promise<FormState>;

export function OfficeActionForm({
  action,
  hidden,
  submitLabel,
  variant = "secondary",
  children,
  testId,
}: {
  action: OfficeAction;
  hidden: Record<string, string>;
  submitLabel: ReactNode;
  variant?: ButtonVariant;
  children?: ReactNode;
  testId?: string;
}) {
  const [state, formAction] = useActionState(action, { ok: false, message: null });
  return (
    <form action={formAction} className="flex flex-col gap-2" data-testid={testId}>
      {Object.entries(hidden).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <div className="flex flex-wrap items-end gap-3">
        {children}
        <SubmitButton variant={variant} size="sm" loadingText="working">
          {submitLabel}
        </SubmitButton>
      </div>
      {state.message && (
        <Notice tone={state.ok ? "success" : "danger"} announce label={state.ok ? "Done" : "Not done"}>
          <p>{state.message}</p>
        </Notice>
      )}
    </form>
  );
}
