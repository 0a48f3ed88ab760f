"use client";
// One small server-action form for the certificate pages (claim, show/hide the name, revoke): hidden
// fields, an optional reason box, a button, and the answer as a sentence beside it. Works before
// scripts load; a refusal keeps what was typed.
import { useActionState, useId } from "react";
import { FieldErrorMessage } from "@/components/ui/field-message";
import { FormField } from "@/components/ui/form-field";
import { SubmitButton } from "@/components/ui/submit-button";
import { Textarea } from "@/components/ui/textarea";
import type { FormState } from "@/lib/dto/result";

export type CertificateActionState = FormState | null;
export type CertificateAction = (state: CertificateActionState, form: FormData) => Promise<CertificateActionState>;

export function CertificateActionForm({
  action,
  fields,
  label,
  labelDetail,
  variant = "primary",
  reason,
  loadingText,
}: {
  action: CertificateAction;
  fields: Record<string, string>;
  label: string;
  /** Read by screen readers after the label, e.g. the course it is for. */
  labelDetail?: string;
  variant?: "primary" | "secondary" | "danger";
  /** A reason box (revocation): its label. */
  reason?: string;
  loadingText: string;
}) {
  const [state, formAction] = useActionState(action, null);
  const id = useId();
  const messageId = `${id}-message`;
  const refusal = state && !state.ok ? state.message : null;
  return (
    <form action={formAction} className="flex flex-col gap-2">
      {Object.entries(fields).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      {reason && (
        <FormField label={reason} name="reason" required error={state?.fieldErrors?.reason} hint="Shown on the public verification page.">
          {(control) => <Textarea rows={2} maxLength={300} {...control} />}
        </FormField>
      )}
      <SubmitButton variant={variant} className="self-start" aria-describedby={state?.message ? messageId : undefined} loadingText={loadingText}>
        {label}
        {labelDetail && <span className="sr-only">: {labelDetail}</span>}
      </SubmitButton>
      {refusal && !state?.fieldErrors?.reason && <FieldErrorMessage id={messageId} error={refusal} />}
      {state?.ok && state.message && (
        <p id={messageId} role="status" className="text-body-sm text-success">
          {state.message}
        </p>
      )}
    </form>
  );
}
