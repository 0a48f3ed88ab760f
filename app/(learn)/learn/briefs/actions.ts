"use server";
import { revalidatePath } from "next/cache";
import type { FormState } from "@/lib/dto/result";
import { submitBrief } from "@/lib/server/briefs";
import { formState } from "@/lib/server/errors";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

/** Sends the uploader's processed photos with their captions as the next attempt at a brief. */
export async function submitPhotosAction(input: unknown): Promise<FormState> {
  const result = await unlessUnavailable(async () => submitBrief(await getViewer(), input), (failure) => failure);
  if (!result.ok) return formState(result, "");
  revalidatePath("/learn/briefs");
  return { ok: true, message: `Attempt ${result.attempt} sent. Your instructor will review it.` };
}
