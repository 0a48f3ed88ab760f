import "server-only";
// From "the service holds the original" to "processed" or "failed": fetch the original, run the
// pipeline, store the two variants back at the service, record them, delete the original. Run
// inline by the callback (the apprentice learns the outcome when the upload finishes) and by the
// reconciliation job for rows a callback or a run left behind.
import { db, type Database } from "@/db/client";
import { PHOTO_LIMITS, photoUrl, type PhotoUploadOutcome } from "@/lib/dto/uploads";
import { recordFailed, recordProcessed, uploadRecord, type UploadRecord } from "@/lib/server/upload-records";
import { deleteStoredFiles, readStoredFile, storeFile } from "./files";
import { processPhoto } from "./photo-pipeline";

// At most this many pipelines at once per process: each holds a decoded photo (bench:photo
// measures the peak), and the machine has few cores.
const MAX_PIPELINES = 2;
let running = 0;
const waiting: (() => void)[] = [];

async function withPipelineSlot<T>(work: () => Promise<T>): Promise<T> {
  if (running >= MAX_PIPELINES) await new Promise<void>((resolve) => waiting.push(resolve));
  running++;
  try {
    return await work();
  } finally {
    running--;
    waiting.shift()?.();
  }
}

export function outcomeOf(row: UploadRecord): PhotoUploadOutcome {
  switch (row.status) {
    case "processed":
      return { uploadId: row.id, status: "processed", width: row.width ?? 0, height: row.height ?? 0, thumbUrl: photoUrl(row.id, "thumb"), displayUrl: photoUrl(row.id, "display") };
    case "failed":
      return { uploadId: row.id, status: "failed", message: row.failureReason ?? "That photo could not be used." };
    default:
      return { uploadId: row.id, status: row.status, message: "The photo arrived; it is still being prepared. Check again in a few minutes." };
  }
}

const LOST = "The photo didn't reach storage complete. Send it again.";

/**
 * Processes a stored upload. Refusals end as failed (with the pipeline's sentence) and the original
 * is deleted; an unreachable service throws, leaving the row stored for reconciliation to retry.
 */
export async function processStoredUpload(uploadId: string, database: Database = db()): Promise<PhotoUploadOutcome> {
  const row = await uploadRecord(uploadId, database);
  if (!row) return { uploadId, status: "failed", message: "That upload is unknown." };
  if (row.status !== "stored" || !row.fileKey) return outcomeOf(row);
  if (row.byteSize > PHOTO_LIMITS.maxBytes) return finishFailed(row, `That photo is larger than ${PHOTO_LIMITS.maxBytes / 1024 / 1024} MB. Send a smaller copy.`, database);
  const bytes = await readStoredFile(row.fileKey, PHOTO_LIMITS.maxBytes);
  if (!bytes) return finishFailed(row, LOST, database);
  const result = await withPipelineSlot(() => processPhoto(bytes));
  if (!result.ok) return finishFailed(row, result.reason, database);
  const displayKey = await storeFile(result.display.data, `${row.id}-display.jpg`, "image/jpeg", `${row.id}-display`);
  const thumbKey = await storeFile(result.thumb.data, `${row.id}-thumb.jpg`, "image/jpeg", `${row.id}-thumb`);
  const recorded = await recordProcessed(row.id, { displayKey, thumbKey, width: result.display.width, height: result.display.height }, database);
  // Another run finished first (a duplicate callback, or reconciliation): ours are spare copies.
  await deleteStoredFiles(recorded ? [row.fileKey] : [displayKey, thumbKey]);
  const after = await uploadRecord(row.id, database);
  return after ? outcomeOf(after) : { uploadId, status: "failed", message: "That upload is unknown." };
}

async function finishFailed(row: UploadRecord, reason: string, database: Database): Promise<PhotoUploadOutcome> {
  await recordFailed(row.id, reason, database);
  if (row.fileKey) await deleteStoredFiles([row.fileKey]);
  const after = await uploadRecord(row.id, database);
  return after ? outcomeOf(after) : { uploadId: row.id, status: "failed", message: reason };
}
