"use server";
import { revalidatePath } from "next/cache";
import { formState, type FormState } from "@/lib/server/errors";
import { decideRefund } from "@/lib/server/refunds";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

/** Approve (refund through the payment service, seats out of the pool) or reject a refund request. */
export async function decideRefundAction(_state: FormState | null, form: FormData): Promise<FormState | null> {
  const decision = form.get("decision");
  const input = { refundId: form.get("refundId"), decision, note: form.get("note") ?? undefined };
  const result = await unlessUnavailable(async () => decideRefund(await getViewer(), input), (failure) => failure);
  if (result.ok) revalidatePath("/admin/payments");
  return formState(result, decision === "approve" ? "Approved: the refund was sent and the seats left the class." : "Rejected. The school has been told.");
}
