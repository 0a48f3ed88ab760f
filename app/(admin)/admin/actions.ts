"use server";
import { revalidatePath } from "next/cache";
import { db } from "@/db/client";
import { AccessError, fail, type Result } from "@/lib/server/errors";
import { changeRole, setStatus } from "@/lib/server/users";
import { getViewer } from "@/lib/server/viewer";

export type ActionState = { ok: boolean; message: string } | null;

async function run(action: () => Promise<Result>): Promise<ActionState> {
  try {
    const result = await action();
    if (!result.ok) return { ok: false, message: result.message };
    revalidatePath("/admin");
    return { ok: true, message: "Saved." };
  } catch (err) {
    if (err instanceof AccessError) return { ok: false, message: fail(err.code).message };
    throw err;
  }
}

export async function changeRoleAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return run(async () => changeRole(db(), await getViewer(), { userId: form.get("userId"), role: form.get("role") }));
}

export async function setStatusAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return run(async () => setStatus(db(), await getViewer(), { userId: form.get("userId"), status: form.get("status") }));
}
