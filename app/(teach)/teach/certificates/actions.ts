"use server";
import { revalidatePath } from "next/cache";
import type { CertificateActionState } from "@/components/certificates/action-form";
import { revokeCertificate } from "@/lib/server/certificate-admin";
import { formState } from "@/lib/server/errors";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

export async function revokeCertificateAction(_state: CertificateActionState, form: FormData): Promise<CertificateActionState> {
  const result = await unlessUnavailable(async () => revokeCertificate(await getViewer(), { certificateId: form.get("certificateId"), reason: form.get("reason") }), (failure) => failure);
  if (result.ok) revalidatePath("/teach/certificates");
  return formState(result, "Revoked. The verification page and the status list say so now.");
}
