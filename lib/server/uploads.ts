import "server-only";
// Placement photos (docs/decisions/007-uploads-stand-in.md): the row made before an upload starts,
// what a submission may reference (processed photos of the submitter), and who may see a photo.
import { and, eq, exists, inArray, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { z } from "zod";
import { db, type Database } from "@/db/client";
import { classMembers, uploads } from "@/db/schema";
import { PHOTO_LIMITS, PHOTO_VARIANTS, type PhotoVariant } from "@/lib/dto/uploads";
import { readStoredFile } from "@/lib/storage/files";
import { fail, type Result } from "./errors";
import { guard } from "./guard";
import { limitsFor, takeSlot } from "./rate-limit";
import { decodeSessionToken } from "./session-cookie";
import { sessionCookieName } from "./session-policy";
import { viewerFromClaims, type Viewer } from "./viewer";

const FileRequestSchema = z.object({
  name: z.string().max(1024),
  size: z.number().int().min(1, { error: "That file is empty." }).max(PHOTO_LIMITS.maxBytes, { error: `A photo can be at most ${PHOTO_LIMITS.maxBytes / 1024 / 1024} MB.` }),
  type: z.string().max(255),
});
const BeginSchema = z.object({
  files: z.array(FileRequestSchema).min(1, { error: "Choose a photo first." }).max(PHOTO_LIMITS.maxFiles, { error: `Send at most ${PHOTO_LIMITS.maxFiles} photos at once.` }),
});

/**
 * A file name fit to show (never a path or a type): the last path segment, letters, digits and a
 * few marks kept, anything else one "_", at most 100 characters. "../../etc/passwd" → "passwd".
 */
export function displayName(raw: string): string {
  const base = raw.split(/[\\/]/).pop() ?? "";
  const cleaned = base
    .normalize("NFC")
    .replace(/[^\p{L}\p{N} ._()-]+/gu, "_")
    .replace(/\.{2,}/g, ".")
    .replace(/^[ ._-]+|[ ._-]+$/g, "")
    .slice(0, 100);
  return cleaned || "photo";
}

/**
 * Before any byte moves: an apprentice (signed in, within the upload limit) gets one pending row
 * per file. The row's id is the file's customId at the upload service, so the callback, or
 * reconciliation when the callback is lost, finds it.
 */
export async function beginPhotoUploads(
  viewer: Viewer | null,
  input: unknown,
  address: string,
  database: Database = db(),
): Promise<Result<{ uploads: { id: string; name: string }[] }>> {
  const g = guard(viewer, ["apprentice"], "Only apprentices upload placement photos.");
  if (!g.ok) return g;
  const parsed = BeginSchema.safeParse(input);
  if (!parsed.success) return fail("invalid_input", { message: parsed.error.issues[0]?.message ?? "That upload can't be accepted." });
  const slot = await takeSlot(database, limitsFor("photoUploads", g.viewer.id, address));
  if (!slot.ok) return fail("rate_limited", { message: "You have sent a lot of photos in the last hour. Try again later.", retryAfterSeconds: slot.retryAfterSeconds });
  const rows = await database
    .insert(uploads)
    .values(parsed.data.files.map((f) => ({ ownerId: g.viewer.id, originalName: displayName(f.name), byteSize: f.size })))
    .returning({ id: uploads.id, name: uploads.originalName });
  return { ok: true, uploads: rows };
}

/**
 * The processed photos among `uploadIds` that `userId` owns: a submission may reference only these
 * (helper for lib/server/briefs.ts; pass its transaction). The caller compares the count.
 */
export async function processedUploadsOwnedBy(tx: Pick<Database, "select">, userId: string, uploadIds: readonly string[]) {
  if (uploadIds.length === 0) return [];
  return tx
    .select({ id: uploads.id, name: uploads.originalName, width: uploads.width, height: uploads.height })
    .from(uploads)
    .where(and(eq(uploads.ownerId, userId), eq(uploads.status, "processed"), inArray(uploads.id, [...uploadIds])));
}

const PhotoRequestSchema = z.object({ uploadId: z.uuid(), variant: z.enum(PHOTO_VARIANTS as [PhotoVariant, ...PhotoVariant[]]) });

export type PhotoFile = { body: Uint8Array; contentType: "image/jpeg"; filename: string };

/**
 * A processed photo's bytes, for: its owner, admins, and instructors of a class in which the owner
 * is an apprentice. Anyone else, signed out included, gets not_found (nothing says it exists).
 */
export async function readPhoto(viewer: Viewer | null, input: unknown, database: Database = db()): Promise<Result<{ photo: PhotoFile }>> {
  const parsed = PhotoRequestSchema.safeParse(input);
  if (!viewer || !parsed.success) return fail("not_found");
  const { uploadId, variant } = parsed.data;
  const instructor = alias(classMembers, "instructor_membership");
  const apprentice = alias(classMembers, "apprentice_membership");
  const teachesOwner = exists(
    database
      .select({ one: sql`1` })
      .from(instructor)
      .innerJoin(apprentice, and(eq(apprentice.classId, instructor.classId), eq(apprentice.userId, uploads.ownerId), eq(apprentice.role, "apprentice")))
      .where(and(eq(instructor.userId, viewer.id), eq(instructor.role, "instructor"))),
  );
  const mayRead = viewer.role === "admin" ? sql`true` : sql`(${eq(uploads.ownerId, viewer.id)} or ${teachesOwner})`;
  const [row] = await database
    .select({ name: uploads.originalName, displayKey: uploads.displayKey, thumbKey: uploads.thumbKey })
    .from(uploads)
    .where(and(eq(uploads.id, uploadId), eq(uploads.status, "processed"), mayRead));
  if (!row) return fail("not_found");
  const key = variant === "display" ? row.displayKey : row.thumbKey;
  if (!key) return fail("not_found");
  let body: Uint8Array | null;
  try {
    body = await readStoredFile(key, PHOTO_LIMITS.maxBytes);
  } catch {
    // The upload service is unreachable or refused: an outage, not a bug.
    return fail("unavailable", { message: "Axisline can't reach its photo storage right now. Please try again in a minute.", retryAfterSeconds: 15 });
  }
  if (!body) return fail("not_found");
  const stem = row.name.replace(/\.[^.]*$/, "") || "photo";
  return { ok: true, photo: { body, contentType: "image/jpeg", filename: `${stem}-${variant}.jpg` } };
}

/**
 * The viewer of a request that reaches us outside a page (the upload route runs inside the
 * service SDK's handler): the session cookie read from the request's own Cookie header.
 */
export async function viewerFromRequest(request: Request, database: Database = db()): Promise<Viewer | null> {
  const name = sessionCookieName();
  const cookie = request.headers.get("cookie") ?? "";
  const token = cookie
    .split(";")
    .map((c) => c.trim())
    .find((c) => c.startsWith(`${name}=`))
    ?.slice(name.length + 1);
  if (!token) return null;
  return viewerFromClaims(database, await decodeSessionToken(decodeURIComponent(token)));
}
