// The one background process: runs every job in lib/jobs/registry.ts through pg-boss (mail
// delivery from the outbox, rate-limit pruning, …) until SIGTERM. Creates pg-boss's schema on
// a fresh database. The web process never needs it to serve.
import { closeDb, db, pool } from "@/db/connection";
import { env } from "@/lib/env";
import { senderDomain } from "@/lib/email/message-id";
import { smtpTransport } from "@/lib/email/transport";
import { JOBS } from "@/lib/jobs/registry";
import { startJobs } from "@/lib/jobs/runtime";

async function main() {
  const e = env();
  senderDomain(e.MAIL_FROM); // a sender without a domain stops the worker now, not at the first message
  const started = Date.now();
  const jobs = await startJobs({ pool: pool(), db: db(), env: e, transport: smtpTransport() });
  console.log(
    `[worker] ready in ${Date.now() - started} ms: ${JOBS.map((j) => j.queue + (j.cron ? ` (${j.cron} UTC)` : "")).join(", ")}; mail through ${e.SMTP_HOST}:${e.SMTP_PORT}, checked every ${e.MAIL_POLL_MS} ms`,
  );
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[worker] ${signal}: finishing the job in hand`);
    try {
      await jobs.stop();
    } finally {
      await closeDb();
    }
    process.exit(0);
  };
  for (const sig of ["SIGTERM", "SIGINT"] as const) process.on(sig, () => void stop(sig));
}

main().catch((err) => {
  console.error("[worker] could not start:", err instanceof Error ? err.message : err);
  process.exit(1);
});
