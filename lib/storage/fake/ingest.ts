// The ingest side of the stand-in: the browser's HEAD and multipart PUT to a presigned URL, the
// signed callback to the app's route, and the held PUT that answers the app's serverData.
import type { IncomingMessage, ServerResponse } from "node:http";
import { signPayload, urlValue, verifySignedUrl } from "./signing";
import { fileUrls, originOf, readBody, sendJson, type FakeState, type Registration } from "./state";
import { isKey, type StoredFile } from "./store";

// Multipart framing around the file part (boundary, part headers) stays well under this.
const MULTIPART_OVERHEAD = 64 * 1024;
const MAX_FILE_BYTES = 64 * 1024 * 1024;
export const CORS = {
  "access-control-allow-origin": "*",
  "access-control-expose-headers": "x-ut-range-start",
};

function checkPresigned(req: IncomingMessage, state: FakeState, key: string) {
  if (!isKey(key)) return { ok: false as const, status: 404, error: "Not found" };
  const check = verifySignedUrl(`${originOf(req)}${req.url}`, state.apiKey);
  if (!check.ok) return check;
  if (urlValue(check.params, "x-ut-identifier") !== state.appId) return { ok: false as const, status: 403, error: "Invalid app identifier" };
  return check;
}

/** HEAD: how much of the file the service already has. The stand-in never keeps a partial file: 0. */
export function handleHead(req: IncomingMessage, res: ServerResponse, state: FakeState, key: string): void {
  const check = checkPresigned(req, state, key);
  res.writeHead(check.ok ? 200 : check.status, { ...CORS, "x-ut-range-start": "0" });
  res.end();
}

export async function handlePut(req: IncomingMessage, res: ServerResponse, state: FakeState, key: string): Promise<void> {
  const check = checkPresigned(req, state, key);
  if (!check.ok) return sendJson(res, check.status, { error: check.error }, CORS);
  const range = /^bytes=(\d+)-$/.exec(String(req.headers.range ?? "bytes=0-"));
  if (!range || range[1] !== "0") return sendJson(res, 416, { error: "The stand-in does not resume uploads: send the whole file (Range: bytes=0-)." }, CORS);
  const declared = Number(urlValue(check.params, "x-ut-file-size"));
  if (!Number.isInteger(declared) || declared < 0 || declared > MAX_FILE_BYTES) return sendJson(res, 400, { error: "Invalid file size" }, CORS);
  const body = await readBody(req, declared + MULTIPART_OVERHEAD);
  if (!body) return sendJson(res, 413, { error: "File larger than the size it was signed for" }, CORS);
  const file = await fileFromMultipart(body, String(req.headers["content-type"] ?? ""));
  if (!file) return sendJson(res, 400, { error: "Expected multipart/form-data with a 'file' field" }, CORS);
  if (file.size > declared) return sendJson(res, 413, { error: "File larger than the size it was signed for" }, CORS);
  const stored = await state.store.put(
    {
      key,
      customId: urlValue(check.params, "x-ut-custom-id"),
      name: urlValue(check.params, "x-ut-file-name") ?? key,
      type: urlValue(check.params, "x-ut-file-type") ?? "application/octet-stream",
      contentDisposition: urlValue(check.params, "x-ut-content-disposition") ?? "inline",
      acl: urlValue(check.params, "x-ut-acl"),
    },
    new Uint8Array(await file.arrayBuffer()),
  );
  const origin = originOf(req);
  const answer = { ...fileUrls(origin, state.appId, key), fileHash: stored.fileHash };
  const registration = state.registrations.get(key);
  if (!registration || registration.expiresAt < Date.now()) return sendJson(res, 200, { ...answer, serverData: null }, CORS);
  state.registrations.delete(key);
  const serverData = registration.awaitServerData ? waitForResult(state, key) : Promise.resolve(null);
  void deliverCallback(state, registration, stored, origin);
  sendJson(res, 200, { ...answer, serverData: await serverData }, CORS);
}

async function fileFromMultipart(body: Buffer, contentType: string): Promise<Blob | null> {
  if (!contentType.startsWith("multipart/form-data")) return null;
  try {
    const form = await new Response(new Uint8Array(body), { headers: { "content-type": contentType } }).formData();
    const file = form.get("file");
    return file instanceof Blob ? file : null;
  } catch {
    return null;
  }
}

/** Held until the app posts its callback result, or holdTimeoutMs (then serverData is null). */
function waitForResult(state: FakeState, key: string): Promise<unknown> {
  return new Promise((resolve) => {
    const timer = setTimeout(() => {
      state.waiters.delete(key);
      resolve(null);
    }, state.settings.holdTimeoutMs);
    state.waiters.set(key, (data) => {
      clearTimeout(timer);
      state.waiters.delete(key);
      resolve(data);
    });
  });
}

/**
 * Production mode: POST { status, file, origin, metadata } to callbackUrl?slug=<slug>, signed with
 * the API key, headers uploadthing-hook: callback and x-uploadthing-signature. Retried on a network
 * error or a 5xx (callbackRetries more times, 0.5 s doubling). dropCallbacks loses the next ones.
 */
async function deliverCallback(state: FakeState, reg: Registration, file: StoredFile, origin: string): Promise<void> {
  const target = new URL(reg.callbackUrl);
  target.searchParams.set("slug", reg.callbackSlug);
  const log = { fileKey: file.key, url: target.href, outcome: "failed" as "delivered" | "dropped" | "failed", status: null as number | null, attempts: 0, at: Date.now() };
  state.deliveries.push(log);
  if (state.settings.dropCallbacks > 0) {
    state.settings.dropCallbacks--;
    log.outcome = "dropped";
    state.waiters.get(file.key)?.(null);
    return;
  }
  const payload = JSON.stringify({
    status: "uploaded",
    file: { name: file.name, size: file.size, type: file.type, customId: file.customId, key: file.key, ...fileUrls(origin, state.appId, file.key), fileHash: file.fileHash, lastModified: file.uploadedAt },
    origin,
    metadata: reg.metadata ?? {},
  });
  for (let attempt = 0; attempt <= state.settings.callbackRetries; attempt++) {
    if (attempt > 0) await new Promise((r) => setTimeout(r, 500 * 2 ** (attempt - 1)));
    log.attempts = attempt + 1;
    try {
      const res = await fetch(target, {
        method: "POST",
        body: payload,
        headers: { "content-type": "application/json", "uploadthing-hook": "callback", "x-uploadthing-signature": signPayload(payload, state.apiKey) },
        signal: AbortSignal.timeout(120_000),
      });
      await res.arrayBuffer();
      log.status = res.status;
      if (res.status < 500) {
        log.outcome = res.ok ? "delivered" : "failed";
        return;
      }
    } catch {
      log.status = null;
    }
  }
  // Never delivered: the held PUT answers without serverData (the app reconciles later).
  state.waiters.get(file.key)?.(null);
}
