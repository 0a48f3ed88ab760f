"use client";
// The two refund forms: a school manager asks for unused seats back; an admin decides.
import { useActionState, useId } from "react";
import { SubmitButton } from "@/components/ui/submit-button";
import type { FormState } from "@/lib/dto/result";
import type { PurchaseAction } from "./buy-course-panel";

function Answer({ state }: { state: FormState | null }) {
  if (!state) return null;
  return (
    <p role={state.ok ? "status" : "alert"} className={state.ok ? "text-body-sm" : "text-body-sm font-semibold text-danger"}>
      {state.message}
    </p>
  );
}

/**
 * Inside a table row: no visually hidden spans (absolutely positioned, they would escape the
 * table's scroll region and widen the page), so each control names its order in aria-label.
 */
export function RefundRequestForm({ orderId, orderRef, maxSeats, action }: { orderId: string; orderRef: string; maxSeats: number; action: PurchaseAction }) {
  const [state, formAction] = useActionState<FormState | null, FormData>(action, null);
  const id = useId();
  return (
    <form action={formAction} className="flex min-w-56 flex-col gap-2" data-testid={`refund-form-${orderRef}`}>
      <input type="hidden" name="orderId" value={orderId} />
      <label htmlFor={`${id}-seats`} className="text-body-sm font-semibold">
        Unused seats to refund (at most {maxSeats})
      </label>
      <input id={`${id}-seats`} aria-label={`Unused seats to refund (at most ${maxSeats}) of order ${orderRef}`} name="seats" type="number" min={1} max={maxSeats} step={1} defaultValue={1} required className="min-h-10 w-24 rounded-md border border-border bg-surface-raised px-2" />
      <label htmlFor={`${id}-reason`} className="text-body-sm font-semibold">
        Why
      </label>
      <input id={`${id}-reason`} aria-label={`Why the seats of order ${orderRef} are not needed`} name="reason" type="text" maxLength={500} required className="min-h-10 rounded-md border border-border bg-surface-raised px-2" />
      <SubmitButton size="sm" variant="secondary" aria-label={`Ask for a refund of order ${orderRef}`}>
        Ask for a refund
      </SubmitButton>
      <Answer state={state} />
    </form>
  );
}

export function RefundDecisionForm({ refundId, label, action }: { refundId: string; label: string; action: PurchaseAction }) {
  const [state, formAction] = useActionState<FormState | null, FormData>(action, null);
  const id = useId();
  return (
    <form action={formAction} className="flex min-w-56 flex-col gap-2" data-testid={`refund-decision-${refundId}`}>
      <input type="hidden" name="refundId" value={refundId} />
      <label htmlFor={`${id}-note`} className="text-body-sm font-semibold">
        Note to the school (optional)<span className="sr-only"> on {label}</span>
      </label>
      <input id={`${id}-note`} name="note" type="text" maxLength={500} className="min-h-10 rounded-md border border-border bg-surface-raised px-2" />
      <div className="flex flex-wrap gap-2">
        <SubmitButton size="sm" name="decision" value="approve">
          Approve and refund<span className="sr-only"> {label}</span>
        </SubmitButton>
        <SubmitButton size="sm" variant="secondary" name="decision" value="reject">
          Reject<span className="sr-only"> {label}</span>
        </SubmitButton>
      </div>
      <Answer state={state} />
    </form>
  );
}
