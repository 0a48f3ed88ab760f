// A private upload stand-in and a private app server for the placement-photo route, for
// integration tests: the real SDK (uploadthing/server's route handler and UTApi) against
// lib/storage/fake on free ports, files in a temporary folder. Requests to the route are made as
// @uploadthing/react's client makes them (uploadthing 7.7.4 client: POST ?actionType=upload&slug=,
// then HEAD and a multipart PUT to each presigned URL).
import { createServer, type Server } from "node:http";
import { mkdtemp, rm } from "node:fs/promises";
import type { AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { encodeUploadToken, LOCAL_UPLOADS } from "@/lib/env";
import { startUploadsFake, type UploadsFake } from "@/lib/storage/fake/server";

export type Harness = { fake: UploadsFake; appUrl: string; dir: string; close(): Promise<void> };

/** Starts the stand-in and aims this process's SDK at it (lib/storage reads the env on first use). */
export async function startUploadsStandIn(): Promise<{ fake: UploadsFake; dir: string }> {
  const dir = await mkdtemp(path.join(tmpdir(), "axisline-uploads-"));
  const fake = await startUploadsFake({ port: 0, dir, apiKey: LOCAL_UPLOADS.apiKey, appId: LOCAL_UPLOADS.appId, settings: { holdTimeoutMs: 20_000 } });
  process.env.UPLOADTHING_TOKEN = encodeUploadToken(LOCAL_UPLOADS);
  process.env.UPLOADTHING_INGEST_URL = fake.url;
  process.env.UPLOADTHING_API_URL = fake.url;
  return { fake, dir };
}

/** The stand-in plus our /api/uploadthing route (uploadRouteHandler) on a node:http server. */
export async function startUploadsHarness(): Promise<Harness> {
  const { fake, dir } = await startUploadsStandIn();
  let server: Server | undefined;
  const appUrl = await new Promise<string>((resolve) => {
    server = createServer(async (req, res) => {
      const { uploadRouteHandler } = await import("@/lib/storage/route-handler");
      const chunks: Buffer[] = [];
      for await (const c of req) chunks.push(c as Buffer);
      const headers = new Headers();
      for (const [k, v] of Object.entries(req.headers)) if (typeof v === "string") headers.set(k, v);
      const origin = `http://127.0.0.1:${(server!.address() as AddressInfo).port}`;
      const request = new Request(`${origin}${req.url}`, { method: req.method, headers, body: req.method === "GET" ? undefined : Buffer.concat(chunks) });
      const response = await uploadRouteHandler(origin)(request);
      res.writeHead(response.status, Object.fromEntries(response.headers));
      res.end(Buffer.from(await response.arrayBuffer()));
    });
    server.listen(0, "127.0.0.1", () => resolve(`http://127.0.0.1:${(server!.address() as AddressInfo).port}`));
  });
  return {
    fake,
    appUrl,
    dir,
    close: async () => {
      await new Promise<void>((r) => server!.close(() => r()));
      await fake.close();
      await rm(dir, { recursive: true, force: true });
    },
  };
}

export type Presigned = { url: string; key: string; name: string; customId: string | null };
export type PutAnswer = { status: number; body: { ufsUrl?: string; fileHash?: string; serverData?: unknown; error?: string } };
export type LocalFile = { name: string; type: string; bytes: Uint8Array };

/** As the browser's uploader asks our route for presigned URLs (the edge headers name the client address). */
export async function requestUpload(appUrl: string, cookie: string, address: string, files: { name: string; type: string; size: number }[]) {
  const res = await fetch(`${appUrl}/api/uploadthing?actionType=upload&slug=placementPhoto`, {
    method: "POST",
    headers: { cookie, "content-type": "application/json", "x-uploadthing-version": "7.7.4", "x-uploadthing-package": "@uploadthing/react", "x-axisline-peer": "127.0.0.1", "x-forwarded-for": address },
    body: JSON.stringify({ files: files.map((f) => ({ ...f, lastModified: Date.now() })), input: null }),
  });
  return { status: res.status, body: (await res.json()) as Presigned[] | { message: string } };
}

/** HEAD (x-ut-range-start) then the multipart PUT, as uploadthing/client does. */
export async function putFile(presigned: Presigned, file: LocalFile): Promise<PutAnswer & { rangeStart: string | null }> {
  const head = await fetch(presigned.url, { method: "HEAD" });
  const form = new FormData();
  form.append("file", new File([file.bytes as Uint8Array<ArrayBuffer>], file.name, { type: file.type }));
  const res = await fetch(presigned.url, { method: "PUT", body: form, headers: { range: "bytes=0-", "x-uploadthing-version": "7.7.4" } });
  return { status: res.status, body: (await res.json()) as PutAnswer["body"], rangeStart: head.headers.get("x-ut-range-start") };
}

/** Request and upload files; answers each PUT's answer in order. */
export async function uploadFiles(appUrl: string, cookie: string, address: string, files: LocalFile[]) {
  const asked = await requestUpload(appUrl, cookie, address, files.map((f) => ({ name: f.name, type: f.type, size: f.bytes.length })));
  if (asked.status !== 200 || !Array.isArray(asked.body)) throw new Error(`upload request refused: ${asked.status} ${JSON.stringify(asked.body)}`);
  const presigned = asked.body;
  const puts = await Promise.all(presigned.map((p, i) => putFile(p, files[i])));
  return { presigned, puts };
}

/**
 * A processed photo of `ownerId` without going through the route (for the authorization matrix):
 * its two variants stored at the stand-in through UTApi, and the row as processing leaves it.
 */
export async function seedProcessedPhoto(ownerId: string): Promise<string> {
  const sharp = (await import("sharp")).default;
  const { db } = await import("@/db/connection");
  const { uploads } = await import("@/db/schema");
  const { storeFile } = await import("@/lib/storage/files");
  const jpeg = (w: number, h: number) => sharp({ create: { width: w, height: h, channels: 3, background: "#55779a" } }).jpeg().toBuffer();
  const [row] = await db().insert(uploads).values({ ownerId, originalName: "matrix.jpg", byteSize: 1000, status: "stored", fileKey: `matrix-${Date.now()}-${Math.random().toString(36).slice(2)}` }).returning({ id: uploads.id });
  const displayKey = await storeFile(await jpeg(160, 120), `${row.id}-display.jpg`, "image/jpeg", `${row.id}-display`);
  const thumbKey = await storeFile(await jpeg(80, 60), `${row.id}-thumb.jpg`, "image/jpeg", `${row.id}-thumb`);
  const { recordProcessed } = await import("@/lib/server/upload-records");
  if (!(await recordProcessed(row.id, { displayKey, thumbKey, width: 160, height: 120 }))) throw new Error("seed photo not processed");
  return row.id;
}
