// Sends queued mail from the outbox with retries and backoff (lib/email/worker.ts), until SIGTERM.
import { db, closeDb } from "@/db/client";
import { env } from "@/lib/env";
import { drainOutbox } from "@/lib/email/worker";
import { smtpTransport } from "@/lib/email/transport";

const POLL_MS = Number(process.env.MAIL_POLL_MS ?? 500);
let stopping = false;

async function loop() {
  const e = env();
  const transport = smtpTransport();
  console.log(`[mail-worker] sending through ${e.SMTP_HOST}:${e.SMTP_PORT} every ${POLL_MS} ms`);
  while (!stopping) {
    try {
      const { sent, failed } = await drainOutbox(db(), transport, e.MAIL_FROM);
      if (sent || failed) console.log(`[mail-worker] sent ${sent}, will retry ${failed}`);
    } catch (err) {
      console.error("[mail-worker] pass failed:", err instanceof Error ? err.message : err);
    }
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
  await closeDb();
}

for (const sig of ["SIGTERM", "SIGINT"] as const) process.on(sig, () => (stopping = true));
loop().catch((err) => {
  console.error("[mail-worker]", err instanceof Error ? err.message : err);
  process.exit(1);
});
