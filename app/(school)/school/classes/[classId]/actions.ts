"use server";
// The school office's actions on one class. Each calls lib/server, which checks the manager and
// that the class is theirs; the form shows the sentence that comes back.
import { revalidatePath } from "next/cache";
import type { InviteFormState } from "@/lib/dto/school-office";
import { actionContext } from "@/lib/server/action-context";
import { formState, type FormState } from "@/lib/server/errors";
import { inviteApprentices, revokeInvitation } from "@/lib/server/invitations";
import { MAX_ROSTER_BYTES } from "@/lib/server/roster";
import { assignInstructor, moveApprentice, moveSeats, reclaimSeat } from "@/lib/server/seat-actions";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { getViewer } from "@/lib/server/viewer";

const text = (v: FormDataEntryValue | null) => (typeof v === "string" ? v : "");

function refresh(classId: string) {
  revalidatePath(`/school/classes/${classId}`);
  revalidatePath("/school");
}

export async function inviteAction(_state: InviteFormState, form: FormData): Promise<InviteFormState> {
  const classId = text(form.get("classId"));
  const file = form.get("csv");
  if (file instanceof File && file.size > MAX_ROSTER_BYTES) return { ok: false, message: `That file is larger than ${MAX_ROSTER_BYTES / 1024} KB. Split the roster into smaller files.` };
  const csv = file instanceof File ? await file.text() : "";
  const input = { classId, addresses: text(form.get("addresses")), csv, goodRowsOnly: form.get("goodRowsOnly") === "on" };
  const result = await unlessUnavailable(async () => inviteApprentices(await getViewer(), input, await actionContext()), (failure) => failure);
  if (!result.ok) return { ...formState(result, ""), problems: "problems" in result ? result.problems : undefined };
  refresh(classId);
  const sent = `${result.invited} ${result.invited === 1 ? "invitation" : "invitations"} sent.`;
  return { ok: true, invited: result.invited, problems: result.skipped, message: result.skipped.length > 0 ? `${sent} ${result.skipped.length} skipped, as you chose:` : sent };
}

export async function revokeAction(_state: FormState, form: FormData): Promise<FormState> {
  const result = await unlessUnavailable(async () => revokeInvitation(await getViewer(), { invitationId: text(form.get("invitationId")) }), (f) => f);
  if (result.ok) refresh(text(form.get("classId")));
  return formState(result, result.ok ? `The invitation to ${result.email} is withdrawn; its seat is free again.` : "");
}

export async function reclaimAction(_state: FormState, form: FormData): Promise<FormState> {
  const classId = text(form.get("classId"));
  const result = await unlessUnavailable(async () => reclaimSeat(await getViewer(), { classId, userId: text(form.get("userId")) }), (f) => f);
  if (result.ok) refresh(classId);
  return formState(result, result.ok ? `${result.name}'s seat is free again.` : "");
}

export async function moveSeatsAction(_state: FormState, form: FormData): Promise<FormState> {
  const fromClassId = text(form.get("fromClassId"));
  const input = { fromClassId, toClassId: text(form.get("toClassId")), count: text(form.get("count")) };
  const result = await unlessUnavailable(async () => moveSeats(await getViewer(), input), (f) => f);
  if (result.ok) refresh(fromClassId);
  return formState(result, result.ok ? `${result.moved} ${result.moved === 1 ? "seat" : "seats"} moved to ${result.toClassName}.` : "");
}

export async function moveApprenticeAction(_state: FormState, form: FormData): Promise<FormState> {
  const fromClassId = text(form.get("fromClassId"));
  const input = { fromClassId, toClassId: text(form.get("toClassId")), userId: text(form.get("userId")) };
  const result = await unlessUnavailable(async () => moveApprentice(await getViewer(), input), (f) => f);
  if (result.ok) refresh(fromClassId);
  return formState(result, result.ok ? `${result.name} moved to ${result.toClassName}, with their seat.` : "");
}

export async function assignInstructorAction(_state: FormState, form: FormData): Promise<FormState> {
  const classId = text(form.get("classId"));
  const result = await unlessUnavailable(async () => assignInstructor(await getViewer(), { classId, userId: text(form.get("userId")) }), (f) => f);
  if (result.ok) refresh(classId);
  return formState(result, result.ok ? `${result.name} now teaches this class.` : "");
}
