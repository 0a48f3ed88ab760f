import "server-only";
// Reading and writing files at the upload service through its SDK (UTApi): a short-lived signed
// URL for a private file, then a plain GET of it; new files through UTApi.uploadFiles.
import { UTFile } from "uploadthing/server";
import { storageApi } from "./service";

/** The bytes of a stored file, or null if the service doesn't have it (or it is over `maxBytes`). */
export async function readStoredFile(key: string, maxBytes: number): Promise<Uint8Array | null> {
  const { ufsUrl } = await storageApi().getSignedURL(key);
  const res = await fetch(ufsUrl, { cache: "no-store", signal: AbortSignal.timeout(30_000) });
  if (res.status === 404 || res.status === 410) return null;
  if (!res.ok) throw new Error(`The upload service answered ${res.status} for a stored file.`);
  const declared = Number(res.headers.get("content-length") ?? "0");
  if (declared > maxBytes) return null;
  const body = new Uint8Array(await res.arrayBuffer());
  return body.length > maxBytes ? null : body;
}

/** Stores bytes as a new file; answers its key. */
export async function storeFile(bytes: Uint8Array, name: string, type: string, customId: string): Promise<string> {
  const file = new UTFile([bytes as Uint8Array<ArrayBuffer>], name, { type, customId });
  const result = await storageApi().uploadFiles(file);
  if (result.error) throw new Error(`The upload service refused a processed photo: ${result.error.message}`);
  return result.data.key;
}

/** Deletes files at the service (the original after processing, variants of a lost race). */
export async function deleteStoredFiles(keys: string[]): Promise<void> {
  if (keys.length > 0) await storageApi().deleteFiles(keys);
}
