"use server";
import { revalidatePath } from "next/cache";
import type { CertificateActionState } from "@/components/certificates/action-form";
import { issueCertificate, setNameVisibility } from "@/lib/server/certificates";
import { formState } from "@/lib/server/errors";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

export async function claimCertificateAction(_state: CertificateActionState, form: FormData): Promise<CertificateActionState> {
  const result = await unlessUnavailable(async () => issueCertificate(await getViewer(), { courseSlug: form.get("courseSlug") }), (failure) => failure);
  if (result.ok) revalidatePath("/learn/certificates");
  return formState(result, "Your certificate is issued. We have e-mailed you its verification code.");
}

export async function setNameVisibilityAction(_state: CertificateActionState, form: FormData): Promise<CertificateActionState> {
  const showName = form.get("showName") === "true";
  const result = await unlessUnavailable(async () => setNameVisibility(await getViewer(), { certificateId: form.get("certificateId"), showName }), (failure) => failure);
  if (result.ok) revalidatePath("/learn/certificates");
  return formState(result, showName ? "The verification page now shows your name." : "The verification page no longer shows your name.");
}
