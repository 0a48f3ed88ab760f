// What the stand-in keeps in memory besides its files: route registrations waiting for their
// upload, PUTs held for the app's callback result, the test switches and a log of callbacks.
import type { IncomingMessage, ServerResponse } from "node:http";
import type { FileStore } from "./store";

export type Registration = { metadata: unknown; callbackUrl: string; callbackSlug: string; awaitServerData: boolean; expiresAt: number };
export type Delivery = { fileKey: string; url: string; outcome: "delivered" | "dropped" | "failed"; status: number | null; attempts: number; at: number };
export type FakeSettings = { dropCallbacks: number; holdTimeoutMs: number; callbackRetries: number };

export type FakeState = {
  apiKey: string;
  appId: string;
  store: FileStore;
  registrations: Map<string, Registration>;
  /** Held PUTs, resolved by POST /callback-result with the app's serverData. */
  waiters: Map<string, (serverData: unknown) => void>;
  settings: FakeSettings;
  deliveries: Delivery[];
};

export const MAX_JSON_BYTES = 1024 * 1024;

export async function readBody(req: IncomingMessage, limit: number): Promise<Buffer | null> {
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of req) {
    total += (chunk as Buffer).length;
    if (total > limit) return null;
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

export async function readJson(req: IncomingMessage): Promise<Record<string, unknown> | null> {
  const body = await readBody(req, MAX_JSON_BYTES);
  if (!body) return null;
  try {
    const value: unknown = JSON.parse(body.toString("utf8") || "{}");
    return value && typeof value === "object" && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
  } catch {
    return null;
  }
}

/** The service's error shape for its API: { error } with a status. */
export function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  const text = JSON.stringify(body);
  res.writeHead(status, { "content-type": "application/json", "content-length": Buffer.byteLength(text), ...headers });
  res.end(text);
}

/** The requests from the app's SDK carry the API key in x-uploadthing-api-key. */
export function authorized(req: IncomingMessage, state: FakeState): boolean {
  return req.headers["x-uploadthing-api-key"] === state.apiKey;
}

export function originOf(req: IncomingMessage): string {
  return `http://${req.headers.host ?? "127.0.0.1"}`;
}

export function fileUrls(origin: string, appId: string, key: string) {
  return { url: `${origin}/f/${key}`, appUrl: `${origin}/a/${appId}/${key}`, ufsUrl: `${origin}/f/${key}` };
}
