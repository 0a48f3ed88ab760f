// The placement-photo rows of the authorization matrix (tests/integration/authorization.test.ts
// spreads them into MATRIX): reading a photo and starting an upload. prepareUploads starts a
// private upload stand-in and gives the matrix's apprentice (a member of the matrix class, taught
// by the matrix instructor) one processed photo.
import { expect } from "vitest";
import type { Role } from "@/db/schema";
import type { ErrorCode, Ok, Result } from "@/lib/dto/result";
import { beginPhotoUploads, readPhoto } from "@/lib/server/uploads";
import type { Viewer } from "@/lib/server/viewer";
import { uniqueAddress } from "../support/unique";
import { seedProcessedPhoto, startUploadsStandIn } from "../support/uploads";

type Who = "anonymous" | Role;
type Entry = {
  name: string;
  run: (viewer: Viewer | null, who: Who) => Promise<Result<object>>;
  allowed: Who[];
  check: (result: Ok<object>, who: Who) => void | Promise<void>;
  denied: Partial<Record<Who, ErrorCode>>;
};
function entry<T extends object>(e: { name: string; run: (viewer: Viewer | null, who: Who) => Promise<Result<T>>; allowed: Who[]; check: (result: Ok<T>, who: Who) => void | Promise<void>; denied: Partial<Record<Who, ErrorCode>> }): Entry {
  return e as unknown as Entry;
}

let standIn: Awaited<ReturnType<typeof startUploadsStandIn>> | undefined;
let photoId = "";

export async function prepareUploads(apprentice: Viewer): Promise<void> {
  standIn = await startUploadsStandIn();
  photoId = await seedProcessedPhoto(apprentice.id);
}

export async function closeUploads(): Promise<void> {
  await standIn?.fake.close();
}

export const UPLOAD_MATRIX: Entry[] = [
  entry({
    name: "readPhoto (GET /api/photos/<id>/<variant>)",
    run: (v) => readPhoto(v, { uploadId: photoId, variant: "thumb" }),
    // The owner, the instructor of the owner's class, admins. Another class's instructor, another
    // apprentice: tests/integration/uploads-access.test.ts. Nobody refused learns it exists.
    allowed: ["apprentice", "instructor", "admin"],
    check: (r) => expect(r.photo).toMatchObject({ contentType: "image/jpeg", filename: "matrix-thumb.jpg" }),
    denied: { anonymous: "not_found", school_manager: "not_found" },
  }),
  entry({
    name: "beginPhotoUploads (placementPhoto file route's middleware, /api/uploadthing)",
    run: (v) => beginPhotoUploads(v, { files: [{ name: "matrix.jpg", size: 1000, type: "image/jpeg" }] }, uniqueAddress()),
    allowed: ["apprentice"],
    check: (r) => expect(r.uploads).toEqual([{ id: expect.any(String), name: "matrix.jpg" }]),
    denied: { anonymous: "not_signed_in", instructor: "forbidden", school_manager: "forbidden", admin: "forbidden" },
  }),
];
