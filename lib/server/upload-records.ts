import "server-only";
// The state changes of an upload row that the upload service's callback, the processing step and
// reconciliation make (lib/storage). Not entry points for a viewer: each is conditional on the
// state it expects, so a duplicate callback or a second processor changes nothing.
import { and, eq, inArray, lt, sql } from "drizzle-orm";
import { db, type Database } from "@/db/client";
import { uploads, type UploadRow } from "@/db/schema";

export type UploadRecord = Pick<UploadRow, "id" | "ownerId" | "status" | "fileKey" | "byteSize" | "width" | "height" | "failureReason" | "createdAt" | "updatedAt">;
const recordColumns = {
  id: uploads.id,
  ownerId: uploads.ownerId,
  status: uploads.status,
  fileKey: uploads.fileKey,
  byteSize: uploads.byteSize,
  width: uploads.width,
  height: uploads.height,
  failureReason: uploads.failureReason,
  createdAt: uploads.createdAt,
  updatedAt: uploads.updatedAt,
};

export async function uploadRecord(uploadId: string, database: Database = db()): Promise<UploadRecord | null> {
  const [row] = await database.select(recordColumns).from(uploads).where(eq(uploads.id, uploadId));
  return row ?? null;
}

/**
 * The service holds the original: pending → stored, with its key and the size it stored. Only the
 * owner named when the upload was requested (the signed callback's metadata) can complete it.
 * Answers the row as it is afterwards (already stored, processed or failed: unchanged).
 */
export async function recordStored(input: { uploadId: string; ownerId: string; fileKey: string; byteSize: number }, database: Database = db()): Promise<UploadRecord | null> {
  const [row] = await database
    .update(uploads)
    .set({ status: "stored", fileKey: input.fileKey, byteSize: input.byteSize, updatedAt: sql`now()` })
    .where(and(eq(uploads.id, input.uploadId), eq(uploads.ownerId, input.ownerId), eq(uploads.status, "pending")))
    .returning(recordColumns);
  if (row) return row;
  const current = await uploadRecord(input.uploadId, database);
  return current && current.ownerId === input.ownerId ? current : null;
}

/** stored → processed with the variants' keys and the display size. False if it was not stored any more. */
export async function recordProcessed(
  uploadId: string,
  result: { displayKey: string; thumbKey: string; width: number; height: number },
  database: Database = db(),
): Promise<boolean> {
  const done = await database
    .update(uploads)
    .set({ status: "processed", ...result, failureReason: null, updatedAt: sql`now()` })
    .where(and(eq(uploads.id, uploadId), eq(uploads.status, "stored")))
    .returning({ id: uploads.id });
  return done.length === 1;
}

/** pending or stored → failed, with the sentence the apprentice sees. */
export async function recordFailed(uploadId: string, reason: string, database: Database = db()): Promise<boolean> {
  const done = await database
    .update(uploads)
    .set({ status: "failed", failureReason: reason, updatedAt: sql`now()` })
    .where(and(eq(uploads.id, uploadId), inArray(uploads.status, ["pending", "stored"])))
    .returning({ id: uploads.id });
  return done.length === 1;
}

/** Moves updated_at so a row just retried waits its turn again (reconciliation). */
export async function touchUpload(uploadId: string, database: Database = db()): Promise<void> {
  await database.update(uploads).set({ updatedAt: sql`now()` }).where(eq(uploads.id, uploadId));
}

/** Rows in `status` untouched for longer than `olderThanSeconds`, oldest first. */
export async function staleUploads(status: "pending" | "stored", olderThanSeconds: number, limit: number, database: Database = db()): Promise<UploadRecord[]> {
  return database
    .select(recordColumns)
    .from(uploads)
    .where(and(eq(uploads.status, status), lt(uploads.updatedAt, sql`now() - make_interval(secs => ${olderThanSeconds})`)))
    .orderBy(uploads.updatedAt)
    .limit(limit);
}
