"use server";
import { revalidatePath } from "next/cache";
import type { ReviewAnswer } from "@/lib/dto/placements";
import type { Result } from "@/lib/dto/result";
import { finalizeReview, saveReviewDraft, type SavedReview } from "@/lib/server/reviews";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

const answer = (r: Result<{ review: SavedReview }>): ReviewAnswer => (r.ok ? { ok: true, review: r.review } : { ok: false, code: r.code, message: r.message });

/** Autosave of the draft review. */
export async function saveDraftAction(input: unknown): Promise<ReviewAnswer> {
  return answer(await unlessUnavailable(async () => saveReviewDraft(await getViewer(), input), (failure) => failure));
}

/** The decision: approve, or a redo with what to change. */
export async function finalizeAction(input: unknown): Promise<ReviewAnswer> {
  const result = await unlessUnavailable(async () => finalizeReview(await getViewer(), input), (failure) => failure);
  if (result.ok) revalidatePath("/teach/reviews");
  return answer(result);
}
