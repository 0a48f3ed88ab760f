"use server";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { revalidatePath } from "next/cache";
import type { ExtensionState } from "@/components/quiz-stats/extension-form";
import { formState } from "@/lib/server/errors";
import { grantExtension } from "@/lib/server/quiz-extensions";
import { getViewer } from "@/lib/server/viewer";

export async function grantExtensionAction(_state: ExtensionState, formData: FormData): Promise<ExtensionState> {
  const bankId = String(formData.get("bankId") ?? "");
  const result = await unlessUnavailable(
    async () => grantExtension(await getViewer(), { userId: formData.get("userId"), bankId, extraMinutes: formData.get("extraMinutes") }),
    (failure) => failure,
  );
  if (!result.ok) return formState(result, "");
  revalidatePath(`/teach/quizzes/${bankId}`);
  const minutes = result.extraMinutes === 0 ? "Extra time removed" : `${result.extraMinutes} extra minutes saved`;
  return { ok: true, message: result.openAttemptsExtended > 0 ? `${minutes}; the attempt under way has its new deadline.` : `${minutes}. They apply from the next attempt.` };
}
