"use server";
import { redirect } from "next/navigation";
import { quantityFromForm } from "@/lib/validation/purchase";
import { formState, type FormState } from "@/lib/server/errors";
import { startSchoolPurchase } from "@/lib/server/purchases";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

const text = (v: FormDataEntryValue | null) => (typeof v === "string" ? v : undefined);

/** The school's purchase form: one order and Checkout Session per form nonce, then the payment page (303). */
export async function buySeatsAction(_state: FormState | null, form: FormData): Promise<FormState | null> {
  const target =
    form.get("target") === "new"
      ? { newClass: { schoolId: text(form.get("schoolId")), name: text(form.get("className")), term: text(form.get("term")) } }
      : { classId: text(form.get("classId")) || undefined };
  const input = { courseSlug: text(form.get("courseSlug")), quantity: quantityFromForm(form.get("quantity")), nonce: text(form.get("nonce")), ...target };
  const result = await unlessUnavailable(async () => startSchoolPurchase(await getViewer(), input), (failure) => failure);
  if (!result.ok) return formState(result, "");
  redirect(result.checkoutUrl);
}
