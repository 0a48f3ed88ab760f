import "server-only";
import { env } from "@/lib/env";
import type { CaughtMessage } from "@/lib/email/fake-smtp-catcher";

/** The dev inbox exists only with the local fakes; in hosted mode it is absent (404). */
export function devInboxEnabled(): boolean {
  return env().SERVICES_MODE === "local";
}

export async function listCaughtMail(): Promise<CaughtMessage[] | null> {
  try {
    const res = await fetch(`${env().MAIL_CATCHER_URL}/messages`, { cache: "no-store" });
    return res.ok ? ((await res.json()) as CaughtMessage[]) : null;
  } catch {
    return null;
  }
}

export async function getCaughtMail(id: string): Promise<CaughtMessage | null> {
  if (!/^[\w-]+$/.test(id)) return null;
  try {
    const res = await fetch(`${env().MAIL_CATCHER_URL}/messages/${id}`, { cache: "no-store" });
    return res.ok ? ((await res.json()) as CaughtMessage) : null;
  } catch {
    return null;
  }
}
