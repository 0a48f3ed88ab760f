// Plain-text and HTML versions of every message Axisline sends. Values are escaped for HTML.
import { renderPaymentMail, type PaymentMailTemplate } from "./payment-templates";
import { renderPlacementMail, type PlacementMailTemplate } from "./placement-templates";
import { renderInvitationMail, type InvitationMailTemplate } from "./invitation-templates";
import { renderCertificateMail, type CertificateMailTemplate } from "./certificate-templates";

export type MailTemplate =
  | { template: "verify_email"; name: string; url: string }
  | { template: "sign_in_link"; name: string; url: string }
  | { template: "reset_password"; name: string; url: string }
  | { template: "account_exists"; name: string; signInUrl: string; resetUrl: string }
  | PaymentMailTemplate
  | PlacementMailTemplate
  | InvitationMailTemplate
  | CertificateMailTemplate;

export type RenderedMail = { subject: string; text: string; html: string };

const escapeHtml = (s: string) =>
  s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");

export function layout(title: string, paragraphs: string[], action?: { label: string; url: string }, footer?: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 16px">${escapeHtml(p)}</p>`).join("");
  const button = action
    ? `<p style="margin:24px 0"><a href="${escapeHtml(action.url)}" style="background:#b45309;color:#ffffff;padding:12px 20px;border-radius:6px;text-decoration:none;font-weight:600">${escapeHtml(action.label)}</a></p><p style="margin:0 0 16px;font-size:13px;color:#4b5563">Or paste this address into your browser: ${escapeHtml(action.url)}</p>`
    : "";
  const foot = footer ? `<p style="margin:24px 0 0;font-size:13px;color:#4b5563">${escapeHtml(footer)}</p>` : "";
  return `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#111827;max-width:560px;margin:0 auto;padding:24px"><h1 style="font-size:20px;margin:0 0 16px">${escapeHtml(title)}</h1>${body}${button}${foot}<p style="margin:32px 0 0;font-size:12px;color:#6b7280">Axisline: training for live-sound technicians.</p></body></html>`;
}

export function renderMail(m: MailTemplate): RenderedMail {
  switch (m.template) {
    case "verify_email":
      return {
        subject: "Confirm your e-mail for Axisline",
        text: `Hello ${m.name},\n\nConfirm your e-mail address to finish setting up your Axisline account:\n\n${m.url}\n\nThe link works for 24 hours. If you did not sign up, ignore this message.\n`,
        html: layout("Confirm your e-mail", [`Hello ${m.name},`, "Confirm your e-mail address to finish setting up your Axisline account."], { label: "Confirm my e-mail", url: m.url }, "The link works for 24 hours. If you did not sign up, ignore this message."),
      };
    case "sign_in_link":
      return {
        subject: "Your Axisline sign-in link",
        text: `Hello ${m.name},\n\nOpen this link to sign in to Axisline:\n\n${m.url}\n\nIt works once, for 10 minutes. If you did not ask for it, ignore this message: nobody can sign in without opening it.\n`,
        html: layout("Sign in to Axisline", [`Hello ${m.name},`, "Open the link below to sign in."], { label: "Sign in", url: m.url }, "It works once, for 10 minutes. If you did not ask for it, ignore this message."),
      };
    case "reset_password":
      return {
        subject: "Reset your Axisline password",
        text: `Hello ${m.name},\n\nSomeone asked to reset the password of your Axisline account. To choose a new password, open:\n\n${m.url}\n\nThe link works once, for 30 minutes. If it was not you, ignore this message; your password stays as it is.\n`,
        html: layout("Reset your password", [`Hello ${m.name},`, "Someone asked to reset the password of your Axisline account."], { label: "Choose a new password", url: m.url }, "The link works once, for 30 minutes. If it was not you, ignore this message; your password stays as it is."),
      };
    case "account_exists":
      return {
        subject: "You already have an Axisline account",
        text: `Hello ${m.name},\n\nSomeone tried to sign up with this e-mail address, but it already has an Axisline account.\n\nSign in: ${m.signInUrl}\nForgot your password? ${m.resetUrl}\n\nIf it was not you, ignore this message.\n`,
        html: layout("You already have an account", [`Hello ${m.name},`, "Someone tried to sign up with this e-mail address, but it already has an Axisline account."], { label: "Sign in", url: m.signInUrl }, `Forgot your password? ${m.resetUrl}`),
      };
    case "purchase_receipt":
    case "refund_decision":
      return renderPaymentMail(m);
    case "review_digest":
    case "review_result":
      return renderPlacementMail(m);
    case "class_invitation":
      return renderInvitationMail(m);
    case "certificate_issued":
      return renderCertificateMail(m);
  }
}
