import "server-only";
// Reconciliation of uploads whose callback never arrived (or whose processing was interrupted):
// the upload service is asked what it holds, by our row id (the customId), and each row is
// stored and processed, or failed once no upload can arrive any more.
import { inArray } from "drizzle-orm";
import { db, type Database } from "@/db/client";
import { uploads } from "@/db/schema";
import { recordFailed, recordStored, staleUploads, touchUpload } from "@/lib/server/upload-records";
import { deleteStoredFiles } from "./files";
import { processStoredUpload } from "./process-upload";
import { storageApi } from "./service";

/** A presigned URL of the file route lives this long (routeOptions.presignedURLTTL): after it, no PUT can land. */
export const PRESIGNED_URL_SECONDS = 15 * 60;

export type ReconcileOptions = { pendingAfterSeconds: number; storedAfterSeconds: number; giveUpAfterSeconds: number; limit: number };
export const RECONCILE_DEFAULTS: ReconcileOptions = { pendingAfterSeconds: 5 * 60, storedAfterSeconds: 5 * 60, giveUpAfterSeconds: PRESIGNED_URL_SECONDS + 60, limit: 50 };

type ServiceFile = { key: string; customId: string | null; size: number };

async function serviceFiles(): Promise<ServiceFile[]> {
  const out: ServiceFile[] = [];
  for (let offset = 0; ; offset += 500) {
    const page = await storageApi().listFiles({ limit: 500, offset });
    out.push(...page.files.filter((f) => f.status === "Uploaded"));
    if (!page.hasMore) return out;
  }
}

export type ReconcileReport = { stored: number; processed: number; failed: number; retried: number; originalsDeleted: number };

export async function reconcileUploads(options: Partial<ReconcileOptions> = {}, database: Database = db()): Promise<ReconcileReport> {
  const o = { ...RECONCILE_DEFAULTS, ...options };
  const report: ReconcileReport = { stored: 0, processed: 0, failed: 0, retried: 0, originalsDeleted: 0 };
  const files = await serviceFiles();
  const byCustomId = new Map(files.filter((f) => f.customId).map((f) => [f.customId!, f]));

  for (const row of await staleUploads("pending", o.pendingAfterSeconds, o.limit, database)) {
    const file = byCustomId.get(row.id);
    if (file) {
      if (await recordStored({ uploadId: row.id, ownerId: row.ownerId, fileKey: file.key, byteSize: file.size }, database)) report.stored++;
    } else if (Date.now() - row.createdAt.getTime() > o.giveUpAfterSeconds * 1000) {
      if (await recordFailed(row.id, "The upload didn't finish. Send the photo again.", database)) report.failed++;
    }
  }
  for (const row of await staleUploads("stored", o.storedAfterSeconds, o.limit, database)) {
    await touchUpload(row.id, database);
    report.retried++;
    try {
      const outcome = await processStoredUpload(row.id, database);
      if (outcome.status === "processed") report.processed++;
      if (outcome.status === "failed") report.failed++;
    } catch {
      // Still unreachable: the row waits for the next run.
    }
  }
  report.originalsDeleted = await deleteFinishedOriginals(files, database);
  return report;
}

/** Originals the service still holds for uploads already processed or failed (a delete that failed). */
async function deleteFinishedOriginals(files: ServiceFile[], database: Database): Promise<number> {
  const ids = files.map((f) => f.customId).filter((id): id is string => !!id && /^[0-9a-f-]{36}$/.test(id));
  if (ids.length === 0) return 0;
  const rows = await database.select({ id: uploads.id, status: uploads.status, fileKey: uploads.fileKey }).from(uploads).where(inArray(uploads.id, ids));
  const finished = new Set(rows.filter((r) => r.status === "processed" || r.status === "failed").map((r) => r.id));
  const keys = files.filter((f) => f.customId && finished.has(f.customId)).map((f) => f.key);
  await deleteStoredFiles(keys);
  return keys.length;
}
