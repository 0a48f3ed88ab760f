import { sql } from "drizzle-orm";
import { check, index, integer, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { users } from "./users";

// pending: the row exists, the upload may be under way (created by the file route's middleware
// before any byte moves). stored: the upload service holds the original (its callback arrived, or
// reconciliation found it). processed: checked and re-encoded; display and thumbnail variants are
// stored and the original is gone. failed: refused or lost, with a sentence in failure_reason.
export const uploadStatusEnum = pgEnum("upload_status", ["pending", "stored", "processed", "failed"]);

/** Every photo an apprentice uploads, from before the upload starts (docs/decisions/007-uploads-stand-in.md). */
export const uploads = pgTable(
  "uploads",
  {
    // Also the upload service's customId, so a file it holds is matched to its row without the callback.
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: uuid("owner_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    status: uploadStatusEnum("status").notNull().default("pending"),
    // The service's key of the original; known once the callback (or reconciliation) reports it.
    fileKey: text("file_key"),
    // The name the browser sent, sanitised; shown to people, never used as a path or a type.
    originalName: text("original_name").notNull(),
    // Bytes: as declared when the upload was requested, then as the service stored them.
    byteSize: integer("byte_size").notNull(),
    // Pixels of the served display variant (after EXIF rotation); null until processed.
    width: integer("width"),
    height: integer("height"),
    // The service's keys of the re-encoded variants (JPEG, no metadata); null until processed.
    displayKey: text("display_key"),
    thumbKey: text("thumb_key"),
    failureReason: text("failure_reason"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().default(sql`now()`),
  },
  (t) => [
    index("uploads_owner_idx").on(t.ownerId, t.createdAt),
    // Reconciliation looks for pending and stored rows by age.
    index("uploads_status_created_idx").on(t.status, t.createdAt),
    uniqueIndex("uploads_file_key_key").on(t.fileKey),
    check("uploads_processed_has_variants", sql`${t.status} <> 'processed' or (${t.displayKey} is not null and ${t.thumbKey} is not null and ${t.width} > 0 and ${t.height} > 0)`),
    check("uploads_failed_has_reason", sql`${t.status} <> 'failed' or ${t.failureReason} is not null`),
  ],
);

export type UploadRow = typeof uploads.$inferSelect;
export type UploadStatus = (typeof uploadStatusEnum.enumValues)[number];
