import { index, integer, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

// pending → sending (leased to one worker) → sent; back to pending with a backoff on failure,
// failed after the last attempt. A lease that runs out (the worker died) makes the row due again.
export const mailStatusEnum = pgEnum("mail_status", ["pending", "sending", "sent", "failed"]);

/**
 * Transactional outbox: a message is written in the same transaction as its cause and
 * sent later by the worker, so an SMTP server that is down loses nothing. The worker claims
 * rows with a lease and sends outside any transaction (lib/email/worker.ts).
 */
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    template: text("template").notNull(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html").notNull(),
    status: mailStatusEnum("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    // Set while a worker holds the row (status "sending"); who holds it and until when.
    claimedBy: text("claimed_by"),
    leaseUntil: timestamp("lease_until", { withTimezone: true }),
    // The Message-ID header, fixed at the first attempt so every retry carries the same one.
    messageId: text("message_id"),
    lastError: text("last_error"),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("mail_outbox_due_idx").on(t.status, t.nextAttemptAt), index("mail_outbox_lease_idx").on(t.status, t.leaseUntil)],
);
