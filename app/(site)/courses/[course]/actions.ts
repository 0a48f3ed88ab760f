"use server";
import { redirect } from "next/navigation";
import { formState, type FormState } from "@/lib/server/errors";
import { startSelfPurchase } from "@/lib/server/purchases";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

/** "Buy this course": one order and Checkout Session per form nonce, then off to the payment page (303). */
export async function buyCourseAction(_state: FormState | null, form: FormData): Promise<FormState | null> {
  const result = await unlessUnavailable(async () => startSelfPurchase(await getViewer(), { courseSlug: form.get("courseSlug"), nonce: form.get("nonce") }), (failure) => failure);
  if (!result.ok) return formState(result, "");
  redirect(result.checkoutUrl);
}
