// The stand-in's API side: what the app's SDK (route handler and UTApi) calls with its API key,
// and the file URLs. Files are private: served only on a URL signed with the API key.
import type { IncomingMessage, ServerResponse } from "node:http";
import { signUrl, verifySignedUrl } from "./signing";
import { authorized, fileUrls, originOf, readJson, sendJson, type FakeState } from "./state";
import { isKey, type StoredFile } from "./store";

const strings = (v: unknown): string[] => (Array.isArray(v) ? v.filter((x): x is string => typeof x === "string") : []);

/** POST /route-metadata: the file route's registration of the keys it just signed. */
export async function handleRouteMetadata(req: IncomingMessage, res: ServerResponse, state: FakeState): Promise<void> {
  if (!authorized(req, state)) return sendJson(res, 401, { error: "Invalid API key" });
  const body = await readJson(req);
  if (!body || typeof body.callbackUrl !== "string" || typeof body.callbackSlug !== "string") return sendJson(res, 400, { error: "Invalid route metadata" });
  // Dev mode answers with an NDJSON stream of callbacks for the SDK to forward; the stand-in can
  // reach the app itself, so lib/storage always sends isDev: false and this mode is not spoken.
  if (body.isDev === true) return sendJson(res, 400, { error: "The stand-in delivers callbacks itself: use isDev: false." });
  const reg = { metadata: body.metadata ?? {}, callbackUrl: body.callbackUrl, callbackSlug: body.callbackSlug, awaitServerData: body.awaitServerData !== false, expiresAt: Date.now() + 3600_000 };
  for (const key of strings(body.fileKeys)) if (isKey(key)) state.registrations.set(key, reg);
  sendJson(res, 200, { ok: true });
}

/** POST /callback-result: the app's serverData for a file, released to the held PUT. */
export async function handleCallbackResult(req: IncomingMessage, res: ServerResponse, state: FakeState): Promise<void> {
  if (!authorized(req, state)) return sendJson(res, 401, { error: "Invalid API key" });
  const body = await readJson(req);
  if (!body || typeof body.fileKey !== "string") return sendJson(res, 400, { error: "Invalid callback result" });
  state.waiters.get(body.fileKey)?.("error" in body ? null : (body.callbackData ?? null));
  sendJson(res, 200, { ok: true });
}

function listed(f: StoredFile) {
  return { id: f.key, customId: f.customId, key: f.key, name: f.name, size: f.size, status: "Uploaded" as const, uploadedAt: f.uploadedAt };
}

/** The UTApi calls the app makes (uploadthing 7.7.4 server/index.js: requestUploadThing). */
export async function handleApi(req: IncomingMessage, res: ServerResponse, state: FakeState, call: string): Promise<void> {
  if (!authorized(req, state)) return sendJson(res, 401, { error: "Invalid API key" });
  const body = await readJson(req);
  if (!body) return sendJson(res, 400, { error: "Invalid JSON body" });
  const byKeyOrCustomId = (key: unknown, customId: unknown) =>
    typeof key === "string" ? state.store.get(key) : typeof customId === "string" ? state.store.byCustomId(customId) : undefined;
  switch (call) {
    case "listFiles": {
      const limit = typeof body.limit === "number" ? Math.max(1, Math.min(500, body.limit)) : 500;
      const offset = typeof body.offset === "number" ? Math.max(0, body.offset) : 0;
      const all = state.store.list();
      return sendJson(res, 200, { hasMore: offset + limit < all.length, files: all.slice(offset, offset + limit).map(listed) });
    }
    case "deleteFiles": {
      const files = [...strings(body.fileKeys).map((k) => state.store.get(k)), ...strings(body.customIds).map((c) => state.store.byCustomId(c))];
      let deletedCount = 0;
      for (const f of files) if (f && (await state.store.delete(f.key))) deletedCount++;
      return sendJson(res, 200, { success: true, deletedCount });
    }
    case "requestFileAccess": {
      const f = byKeyOrCustomId(body.fileKey, body.customId);
      if (!f) return sendJson(res, 404, { error: "File not found" });
      const ttl = typeof body.expiresIn === "number" && body.expiresIn > 0 ? Math.min(body.expiresIn, 604800) : 3600;
      const signed = signUrl(`${originOf(req)}/f/${f.key}`, state.apiKey, ttl);
      return sendJson(res, 200, { url: signed, ufsUrl: signed });
    }
    case "getFileUrl": {
      const data = strings(body.fileKeys)
        .map((k) => state.store.get(k))
        .filter((f): f is StoredFile => !!f)
        .map((f) => ({ key: f.key, url: fileUrls(originOf(req), state.appId, f.key).ufsUrl }));
      return sendJson(res, 200, { data });
    }
    default:
      return sendJson(res, 404, { error: `The stand-in does not implement /v6/${call}.` });
  }
}

/** GET /f/<key> or /a/<appId>/<key>, signed: the bytes with the stored type, as an attachment-safe download. */
export async function handleFile(req: IncomingMessage, res: ServerResponse, state: FakeState, key: string): Promise<void> {
  const f = isKey(key) ? state.store.get(key) : undefined;
  if (!f) return sendJson(res, 404, { error: "File not found" });
  const check = verifySignedUrl(`${originOf(req)}${req.url}`, state.apiKey);
  if (!check.ok) return sendJson(res, 403, { error: "This file is private: ask for a signed URL." });
  const bytes = await state.store.bytes(key);
  if (!bytes) return sendJson(res, 404, { error: "File not found" });
  res.writeHead(200, { "content-type": f.type, "content-length": bytes.length, "x-content-type-options": "nosniff", "content-disposition": "attachment", "cache-control": "private, no-store" });
  res.end(req.method === "HEAD" ? undefined : bytes);
}
