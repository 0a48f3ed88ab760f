"use server";
import { revalidatePath } from "next/cache";
import { quantityFromForm } from "@/lib/validation/purchase";
import { formState, type FormState } from "@/lib/server/errors";
import { requestRefund } from "@/lib/server/refunds";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

/** A school manager asks for unused seats of a paid order back; an admin decides. */
export async function requestRefundAction(_state: FormState | null, form: FormData): Promise<FormState | null> {
  const input = { orderId: form.get("orderId"), seats: quantityFromForm(form.get("seats")), reason: form.get("reason") };
  const result = await unlessUnavailable(async () => requestRefund(await getViewer(), input), (failure) => failure);
  if (result.ok) revalidatePath("/school/orders");
  return formState(result, "Asked. An Axisline admin will decide, and we will e-mail you the answer.");
}
