// The outbox worker against the real PostgreSQL and a private SMTP catcher of its own (free
// ports): claims with a lease, sends outside any transaction, and never sends a message twice
// when the relay stalls or a worker dies after claiming.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { Client } from "pg";
import { mailOutbox } from "@/db/schema";
import { closeDb } from "@/db/connection";
import { enqueueMail } from "@/lib/email/outbox";
import { startCatcher, type Catcher } from "@/lib/email/fake-smtp-catcher";
import { smtpTransport, type MailTransport } from "@/lib/email/transport";
import { claimDueMail, drainOutbox, MAX_ATTEMPTS } from "@/lib/email/worker";
import { messageIdFor } from "@/lib/email/message-id";
import { uniqueEmail } from "../support/unique";
import { testDb } from "./helpers";

const FROM = "Axisline <no-reply@axisline.test>";
const STALL_MS = 30_000;
let catcher: Catcher;
let transport: MailTransport;

beforeAll(async () => {
  catcher = await startCatcher({ smtpPort: 0, httpPort: 0 });
  transport = smtpTransport({ host: "127.0.0.1", port: catcher.smtpPort, secure: false, ignoreTLS: true });
  // What earlier files left due goes out first, so the passes below only meet this file's rows.
  await drainOutbox(testDb(), transport, FROM, 1000);
});

afterAll(async () => {
  await catcher?.close();
  await closeDb();
});

async function queueOne(label: string) {
  const email = uniqueEmail(label);
  await testDb().transaction((tx) => enqueueMail(tx, email, { template: "sign_in_link", name: "Lease Test", url: "http://127.0.0.1:3100/sign-in/link?token=lease-test" }));
  const [row] = await testDb().select().from(mailOutbox).where(eq(mailOutbox.toAddress, email));
  return row;
}

const rowById = async (id: string) => (await testDb().select().from(mailOutbox).where(eq(mailOutbox.id, id)))[0];
const copiesAtCatcher = (messageId: string) => catcher.messages.filter((m) => m.messageId === messageId).length;

async function until(check: () => boolean, timeoutMs: number) {
  const end = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > end) throw new Error(`condition not met within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

async function otherConnection() {
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  return c;
}

describe("mail outbox leases", () => {
  it("a relay that stalls for 30 s holds no row lock meanwhile, and the message arrives once", async () => {
    const row = await queueOne("stall");
    const messageId = messageIdFor(row.id, FROM);
    catcher.stall(STALL_MS);
    const started = Date.now();
    const firstPass = drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-a" });
    // The whole message is at the relay, which holds back its answer to the end of DATA.
    await until(() => catcher.held() === 1, 10_000);
    catcher.stall(0);

    const other = await otherConnection();
    try {
      // No session but ours has a lock on the table, and none sits idle inside a transaction.
      const locks = await other.query(
        `select l.pid, l.mode from pg_locks l join pg_class c on c.oid = l.relation join pg_stat_activity a on a.pid = l.pid
         where c.relname = 'mail_outbox' and l.pid <> pg_backend_pid() and a.backend_type = 'client backend'`,
      );
      expect(locks.rows).toEqual([]);
      const idle = await other.query(`select count(*)::int as n from pg_stat_activity where datname = current_database() and state like 'idle in transaction%'`);
      expect(idle.rows[0].n).toBe(0);

      // The row itself: FOR UPDATE NOWAIT gets it at once ...
      await other.query("begin");
      const locked = await other.query("select id from mail_outbox where id = $1 for update nowait", [row.id]);
      expect(locked.rowCount).toBe(1);
      await other.query("rollback");
      // ... and an UPDATE from another connection is not blocked (it would fail after 1 s).
      await other.query("set lock_timeout = '1s'");
      const t0 = Date.now();
      const updated = await other.query("update mail_outbox set to_address = to_address where id = $1", [row.id]);
      expect(updated.rowCount).toBe(1);
      expect(Date.now() - t0).toBeLessThan(1000);

      // What keeps others away is the lease, written in the row.
      const leased = await other.query("select status, claimed_by, lease_until > now() as leased, message_id from mail_outbox where id = $1", [row.id]);
      expect(leased.rows[0]).toEqual({ status: "sending", claimed_by: "worker-a", leased: true, message_id: messageId });
    } finally {
      await other.end();
    }

    // A second worker passing during the stall leaves the leased row alone.
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toEqual({ sent: 0, failed: 0, released: 0, lostLease: 0 });

    expect(await firstPass).toEqual({ sent: 1, failed: 0, released: 0, lostLease: 0 });
    const elapsedMs = Date.now() - started;
    expect(elapsedMs).toBeGreaterThanOrEqual(STALL_MS);
    expect(elapsedMs).toBeLessThan(STALL_MS + 10_000);

    // Once the relay has answered, later passes find nothing to send again.
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toMatchObject({ sent: 0 });
    expect(copiesAtCatcher(messageId)).toBe(1);
    expect(await rowById(row.id)).toMatchObject({ status: "sent", attempts: 1, claimedBy: "worker-a", leaseUntil: null, messageId, lastError: null });
  }, 60_000);

  it("a lease that ran out (the worker died after claiming) is taken over, and the message sent once", async () => {
    const row = await queueOne("crash");
    const messageId = messageIdFor(row.id, FROM);
    // Worker A claims, then dies: nothing more happens to the row.
    const claimed = await claimDueMail(testDb(), "worker-dead", 20);
    expect(claimed.map((r) => r.id)).toEqual([row.id]);

    // While the lease runs, nobody else sends it.
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toMatchObject({ sent: 0 });
    expect(copiesAtCatcher(messageId)).toBe(0);

    // The lease runs out (instead of waiting LEASE_SECONDS, it is moved into the past).
    await testDb().update(mailOutbox).set({ leaseUntil: sql`now() - interval '1 second'` }).where(eq(mailOutbox.id, row.id));
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toEqual({ sent: 1, failed: 0, released: 0, lostLease: 0 });
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toMatchObject({ sent: 0 });

    expect(copiesAtCatcher(messageId)).toBe(1);
    // Two claims, one message: the dead worker's attempt counts, so a message that kills its worker every time ends.
    expect(await rowById(row.id)).toMatchObject({ status: "sent", attempts: 2, claimedBy: "worker-b", messageId });
  });

  it("a message whose worker died on its last allowed attempt is given up, not sent", async () => {
    const row = await queueOne("poison");
    await testDb()
      .update(mailOutbox)
      .set({ status: "sending", attempts: MAX_ATTEMPTS, claimedBy: "worker-dead", leaseUntil: sql`now() - interval '1 second'` })
      .where(eq(mailOutbox.id, row.id));
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toMatchObject({ sent: 0 });
    expect(copiesAtCatcher(messageIdFor(row.id, FROM))).toBe(0);
    expect(await rowById(row.id)).toMatchObject({ status: "failed", attempts: MAX_ATTEMPTS, leaseUntil: null, lastError: expect.stringMatching(/lease ran out/) });
  });

  it("a worker told to stop hands back what it claimed but did not try, uncounted", async () => {
    const rows = [await queueOne("stop"), await queueOne("stop")];
    const stopping = new AbortController();
    stopping.abort();
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-a", signal: stopping.signal })).toEqual({ sent: 0, failed: 0, released: 2, lostLease: 0 });
    for (const r of rows) expect(await rowById(r.id)).toMatchObject({ status: "pending", attempts: 0, claimedBy: null, leaseUntil: null });
    // The next pass sends them.
    expect(await drainOutbox(testDb(), transport, FROM, 20, { workerId: "worker-b" })).toMatchObject({ sent: 2 });
  });
});
