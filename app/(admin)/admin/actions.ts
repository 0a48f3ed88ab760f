"use server";
import { unlessUnavailable } from "@/lib/server/unavailable";
import { revalidatePath } from "next/cache";
import { formState, type FormState, type Result } from "@/lib/server/errors";
import { changeRole, setStatus } from "@/lib/server/users";
import { getViewer } from "@/lib/server/viewer";

export type ActionState = FormState | null;

async function settle(result: Result): Promise<ActionState> {
  if (result.ok) revalidatePath("/admin");
  return formState(result, "Saved.");
}

export async function changeRoleAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return settle(await unlessUnavailable(async () => changeRole(await getViewer(), { userId: form.get("userId"), role: form.get("role") }), (failure) => failure));
}

export async function setStatusAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return settle(await unlessUnavailable(async () => setStatus(await getViewer(), { userId: form.get("userId"), status: form.get("status") }), (failure) => failure));
}
