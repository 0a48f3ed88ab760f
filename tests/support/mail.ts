// Reads what the local SMTP catcher received (lib/email/fake-smtp-catcher.ts's JSON API).
export type CaughtMail = { id: string; to: string[]; subject: string; text: string; html: string; receivedAt: string };

const catcherUrl = () => process.env.MAIL_CATCHER_URL ?? "http://127.0.0.1:2590";

export async function mailTo(address: string): Promise<CaughtMail[]> {
  const res = await fetch(`${catcherUrl()}/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as CaughtMail[];
}

/** Waits for a message to `address` whose subject matches, and returns it (newest first). */
export async function waitForMail(address: string, subject: RegExp, timeoutMs = 15_000): Promise<CaughtMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const found = (await mailTo(address)).find((m) => subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail to ${address} matching ${subject} within ${timeoutMs} ms`);
}

export function tokenFrom(mail: CaughtMail): string {
  const m = mail.text.match(/token=([A-Za-z0-9_-]{43})/);
  if (!m) throw new Error(`no token in mail "${mail.subject}"`);
  return m[1];
}

export function linkFrom(mail: CaughtMail): string {
  const m = mail.text.match(/https?:\/\/\S+token=[A-Za-z0-9_-]{43}/);
  if (!m) throw new Error(`no link in mail "${mail.subject}"`);
  return m[0];
}
