"use client";
// Extra time on a timed quiz for one apprentice (WCAG 2.2 SC 2.2.1), through a server action.
import { useActionState, useId } from "react";
import { FieldErrorMessage } from "@/components/ui/field-message";
import { Input } from "@/components/ui/input";
import { Notice } from "@/components/ui/notice";
import { Select } from "@/components/ui/select";
import { SubmitButton } from "@/components/ui/submit-button";
import type { FormState } from "@/lib/dto/result";

export type ExtensionState = FormState;
export type ExtensionAction = (state: ExtensionState, formData: FormData) => Promise<ExtensionState>;
export type ExtensionTarget = { userId: string; name: string; className: string; extraMinutes: number };

export function ExtensionForm({ action, bankId, targets, timeLimitMinutes }: { action: ExtensionAction; bankId: string; targets: ExtensionTarget[]; timeLimitMinutes: number }) {
  const [state, formAction] = useActionState(action, { ok: false, message: null });
  const base = `extension-${useId()}`;
  const errors = state.fieldErrors ?? {};
  return (
    <form action={formAction} className="flex flex-col gap-4" aria-describedby={`${base}-hint`}>
      <p id={`${base}-hint`} className="text-body-sm text-ink-muted">
        The quiz allows {timeLimitMinutes} minutes. Extra minutes apply to the apprentice&apos;s next attempt and to one already under way; 0 removes them.
      </p>
      <input type="hidden" name="bankId" value={bankId} />
      <div className="flex flex-wrap items-end gap-4">
        <div className="flex min-w-56 flex-col gap-1.5">
          <label htmlFor={`${base}-user`} className="font-semibold">
            Apprentice
          </label>
          <Select id={`${base}-user`} name="userId" required aria-invalid={errors.userId ? true : undefined} aria-describedby={errors.userId ? `${base}-user-error` : undefined} defaultValue="">
            <option value="" disabled>
              Choose an apprentice…
            </option>
            {targets.map((t) => (
              <option key={t.userId} value={t.userId}>
                {t.name} ({t.className}){t.extraMinutes > 0 ? `: ${t.extraMinutes} extra minutes now` : ""}
              </option>
            ))}
          </Select>
          {errors.userId && <FieldErrorMessage id={`${base}-user-error`} error={errors.userId} />}
        </div>
        <div className="flex w-40 flex-col gap-1.5">
          <label htmlFor={`${base}-minutes`} className="font-semibold">
            Extra minutes
          </label>
          <Input id={`${base}-minutes`} name="extraMinutes" inputMode="numeric" required defaultValue="10" aria-invalid={errors.extraMinutes ? true : undefined} aria-describedby={errors.extraMinutes ? `${base}-minutes-error` : undefined} />
          {errors.extraMinutes && <FieldErrorMessage id={`${base}-minutes-error`} error={errors.extraMinutes} />}
        </div>
        <SubmitButton loadingText="saving">Give extra time</SubmitButton>
      </div>
      {state.message && (
        <Notice tone={state.ok ? "success" : "danger"} announce label={state.ok ? "Saved" : "Not saved"}>
          <p>{state.message}</p>
        </Notice>
      )}
    </form>
  );
}
