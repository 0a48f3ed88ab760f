import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

export type OutgoingMail = { from: string; to: string; subject: string; text: string; html: string };
export interface MailTransport {
  send(mail: OutgoingMail): Promise<void>;
}

/** nodemailer over SMTP: locally the loopback catcher, in production the real relay (same code, other env). */
export function smtpTransport(): MailTransport {
  const e = env();
  const transporter: Transporter = nodemailer.createTransport({
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    secure: e.SMTP_SECURE === "true",
    ignoreTLS: e.SERVICES_MODE === "local",
    auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10000,
  });
  return {
    async send(mail) {
      await transporter.sendMail(mail);
    },
  };
}
