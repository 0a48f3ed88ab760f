"use server";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { redirect } from "next/navigation";
import type { StartQuizState } from "@/components/quiz/start-quiz-form";
import { startAttempt } from "@/lib/server/attempts";
import { formState } from "@/lib/server/errors";
import { getViewer } from "@/lib/server/viewer";

/** Starts or resumes an attempt and opens the player; a refusal returns its sentence to the form. */
export async function startQuizAction(_state: StartQuizState, formData: FormData): Promise<StartQuizState> {
  const result = await unlessUnavailable(async () => startAttempt(await getViewer(), { bankId: formData.get("bankId") }), (failure) => failure);
  if (!result.ok) return formState(result, "");
  redirect(`/learn/quizzes/${result.attemptId}`);
}
