import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env, type Env } from "@/lib/env";

export type OutgoingMail = { from: string; to: string; subject: string; text: string; html: string; messageId: string };
export interface MailTransport {
  send(mail: OutgoingMail): Promise<void>;
}

export type SmtpSettings = { host: string; port: number; secure: boolean; ignoreTLS: boolean; auth?: { user: string; pass: string } };

/**
 * How long one message may take. RFC 5321 §4.5.3.2 lets a relay take up to 10 minutes to answer
 * the end of DATA; we wait one minute of silence, so a slow relay (a 30 s stall) still completes
 * instead of being retried while it may already have accepted the message. The worker's lease on
 * a row (LEASE_SECONDS in worker.ts) is longer than the sum of these.
 */
export const SMTP_TIMEOUTS_MS = { connection: 10_000, greeting: 30_000, socket: 60_000 } as const;

export function smtpSettings(e: Env = env()): SmtpSettings {
  return {
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    secure: e.SMTP_SECURE === "true",
    ignoreTLS: e.SERVICES_MODE === "local",
    auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } : undefined,
  };
}

/** nodemailer over SMTP: locally the loopback catcher, in production the real relay (same code, other env). */
export function smtpTransport(settings: SmtpSettings = smtpSettings()): MailTransport {
  const transporter: Transporter = nodemailer.createTransport({
    ...settings,
    connectionTimeout: SMTP_TIMEOUTS_MS.connection,
    greetingTimeout: SMTP_TIMEOUTS_MS.greeting,
    socketTimeout: SMTP_TIMEOUTS_MS.socket,
  });
  return {
    async send(mail) {
      await transporter.sendMail(mail);
    },
  };
}
