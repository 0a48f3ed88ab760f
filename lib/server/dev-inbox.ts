import "server-only";
import { headers } from "next/headers";
import { env, isLoopbackHost } from "@/lib/env";
import type { CaughtMessage } from "@/lib/email/fake-smtp-catcher";
import { isDirectLoopbackRequest } from "./http";

/**
 * The dev inbox shows reset and sign-in links, so it answers only: with the local stand-ins,
 * while the app itself listens on loopback, and to a request whose TCP peer is loopback and that
 * names no proxy (never a forwarded header: through a reverse proxy every client would look local).
 * Anything else gets a 404, as in hosted mode.
 */
export async function devInboxEnabled(): Promise<boolean> {
  const e = env();
  if (e.SERVICES_MODE !== "local" || !isLoopbackHost(e.HOST)) return false;
  return isDirectLoopbackRequest(await headers());
}

export async function listCaughtMail(): Promise<CaughtMessage[] | null> {
  if (!(await devInboxEnabled())) return null;
  try {
    const res = await fetch(`${env().MAIL_CATCHER_URL}/messages`, { cache: "no-store" });
    return res.ok ? ((await res.json()) as CaughtMessage[]) : null;
  } catch {
    return null;
  }
}

export async function getCaughtMail(id: string): Promise<CaughtMessage | null> {
  if (!(await devInboxEnabled()) || !/^[\w-]+$/.test(id)) return null;
  try {
    const res = await fetch(`${env().MAIL_CATCHER_URL}/messages/${id}`, { cache: "no-store" });
    return res.ok ? ((await res.json()) as CaughtMessage) : null;
  } catch {
    return null;
  }
}
