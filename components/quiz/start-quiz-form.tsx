"use client";
// Start (or resume) button of one quiz: a server-action form, so it works before scripts load;
// a refusal (no seat, no attempts left) comes back as a sentence next to the button.
import { useActionState } from "react";
import { FieldErrorMessage } from "@/components/ui/field-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { FormState } from "@/lib/dto/result";

/** A refusal's sentence (success navigates to the player, so it never comes back here). */
export type StartQuizState = FormState;
export type StartQuizAction = (state: StartQuizState, formData: FormData) => Promise<StartQuizState>;

export function StartQuizForm({ action, bankId, quizTitle, resume }: { action: StartQuizAction; bankId: string; quizTitle: string; resume: boolean }) {
  const [state, formAction] = useActionState(action, { ok: true, message: null });
  const errorId = `start-error-${bankId}`;
  const refusal = state.ok ? null : state.message;
  return (
    <form action={formAction} className="flex flex-col gap-2">
      <input type="hidden" name="bankId" value={bankId} />
      <SubmitButton variant={resume ? "secondary" : "primary"} className="self-start" aria-describedby={refusal ? errorId : undefined} loadingText="opening the quiz">
        {resume ? "Resume" : "Start"}
        <span className="sr-only">: {quizTitle}</span>
      </SubmitButton>
      {refusal && <FieldErrorMessage id={errorId} error={refusal} />}
    </form>
  );
}
