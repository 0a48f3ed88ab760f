import { z } from "zod";

// Every environment variable Axisline reads enters here. A bad value stops the
// process at start with a sentence naming the variable and the reason.

const url = (what: string) => z.string({ error: `must be set to ${what}` }).url({ error: `must be a URL (${what})` });
const port = z.coerce
  .number({ error: "must be a port number" })
  .int({ error: "must be a whole number" })
  .min(1, { error: "must be between 1 and 65535" })
  .max(65535, { error: "must be between 1 and 65535" });
const flag = z.enum(["true", "false"], { error: 'must be "true" or "false"' });

const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z
    .string({ error: "must be set to a PostgreSQL connection URL" })
    .regex(/^postgres(ql)?:\/\//, { error: "must start with postgres:// or postgresql://" }),
  // Connections per process; two app instances and the worker share the server's max_connections (100).
  PG_POOL_MAX: z.coerce.number({ error: "must be a number" }).int({ error: "must be a whole number" }).min(1, { error: "must be between 1 and 50" }).max(50, { error: "must be between 1 and 50" }).default(10),
  NEXTAUTH_URL: url("the public base URL of the app, e.g. http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z
    .string({ error: "must be set to a random secret of at least 32 characters" })
    .min(32, { error: "must be at least 32 characters long (use `openssl rand -hex 32`)" }),
  // Unset: "hosted" in a production build, "local" otherwise (see parseEnv).
  SERVICES_MODE: z.enum(["local", "hosted"], { error: 'must be "local" (loopback fakes) or "hosted" (real services)' }).optional(),
  // Where the app process listens (scripts/serve.ts). Local stand-ins are refused off loopback.
  HOST: z.string().min(1, { error: "must name an address to listen on" }).default("127.0.0.1"),
  PORT: port.default(3000),
  // How many reverse proxies in front of the app append to X-Forwarded-For. 0 (no proxy, the
  // demo): the socket address is the client. n: the n-th address from the right is the client.
  TRUST_PROXY_HOPS: z.coerce.number({ error: "must be a number" }).int({ error: "must be a whole number" }).min(0, { error: "must be between 0 and 5" }).max(5, { error: "must be between 0 and 5" }).default(0),
  // true when a reverse proxy compresses responses (npm run start:cluster): Next's own compression is off.
  COMPRESSION_BY_PROXY: flag.default("false"),
  SMTP_HOST: z.string().min(1, { error: "must name the SMTP host" }).default("127.0.0.1"),
  SMTP_PORT: port.default(2525),
  SMTP_SECURE: flag.default("false"),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3, { error: "must be a sender address" }).default("Axisline <no-reply@axisline.test>"),
  MAIL_CATCHER_URL: url("the HTTP address of the local mail catcher").default("http://127.0.0.1:2580"),
  MAIL_POLL_MS: z.coerce.number({ error: "must be a number of milliseconds" }).int().min(50, { error: "must be at least 50" }).max(60_000, { error: "must be at most 60000" }).default(500),
  // The payment service (lib/payments/stripe-client.ts). Defaults exist only for SERVICES_MODE=local
  // (see paymentSettings); the hosted service needs real keys.
  STRIPE_SECRET_KEY: z.string().regex(/^(sk|rk)_(test|live)_\w+$/, { error: 'must be a secret key starting with "sk_test_", "sk_live_", "rk_test_" or "rk_live_"' }).optional(),
  STRIPE_WEBHOOK_SECRET: z.string().regex(/^whsec_\w{16,}$/, { error: 'must be a webhook signing secret starting with "whsec_"' }).optional(),
  // Set: the SDK is aimed at this origin (the local stand-in, scripts/fakes/payments.ts). Unset: the hosted service.
  STRIPE_API_URL: url("the origin of the payment service, e.g. http://127.0.0.1:2610").optional(),
});

type Payments = { STRIPE_SECRET_KEY: string; STRIPE_WEBHOOK_SECRET: string; STRIPE_API_URL: string | undefined };
export type Env = Omit<z.infer<typeof EnvSchema>, "SERVICES_MODE" | keyof Payments> & { SERVICES_MODE: "local" | "hosted" } & Payments;

export class EnvError extends Error {}

export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = EnvSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".") || "(environment)"} ${issue.message}`);
    throw new EnvError(`Axisline cannot start: the environment is not valid.\n${lines.join("\n")}\nSee .env.example for every variable.`);
  }
  const mode = result.data.SERVICES_MODE ?? (result.data.NODE_ENV === "production" ? "hosted" : "local");
  const data = { ...result.data, SERVICES_MODE: mode };
  if (data.SERVICES_MODE === "hosted" && data.NEXTAUTH_URL.startsWith("http://") && !isLoopbackUrl(data.NEXTAUTH_URL)) {
    throw new EnvError("Axisline cannot start: NEXTAUTH_URL must use https:// when SERVICES_MODE is hosted.");
  }
  if (data.SERVICES_MODE === "local" && !isLoopbackHost(data.HOST)) {
    throw new EnvError(`Axisline cannot start: SERVICES_MODE is local (stand-ins and the dev inbox), so HOST must be a loopback address, not ${data.HOST}.`);
  }
  checkUploadsSettings(source, data.SERVICES_MODE);
  credentialSigningKeys(source);
  return { ...data, ...paymentSettings(mode, data) };
}

/** The stand-in's keys (also its defaults in scripts/fakes/payments.ts); never valid with the hosted service. */
export const LOCAL_PAYMENTS = {
  STRIPE_SECRET_KEY: "sk_test_axisline_local",
  STRIPE_WEBHOOK_SECRET: "whsec_axisline_local_0123456789abcdef",
  STRIPE_API_URL: "http://127.0.0.1:2610",
} as const;

/**
 * Local mode: the stand-in's keys and address unless set, and the address must be loopback (a
 * live key is refused, so a demo never charges anyone). Hosted mode: real keys required, and an
 * STRIPE_API_URL, if set, must be https.
 */
export function paymentSettings(mode: "local" | "hosted", given: Partial<Payments>): Payments {
  if (mode === "local") {
    const settings = {
      STRIPE_SECRET_KEY: given.STRIPE_SECRET_KEY ?? LOCAL_PAYMENTS.STRIPE_SECRET_KEY,
      STRIPE_WEBHOOK_SECRET: given.STRIPE_WEBHOOK_SECRET ?? LOCAL_PAYMENTS.STRIPE_WEBHOOK_SECRET,
      STRIPE_API_URL: given.STRIPE_API_URL ?? LOCAL_PAYMENTS.STRIPE_API_URL,
    };
    if (!isLoopbackUrl(settings.STRIPE_API_URL)) {
      throw new EnvError(`Axisline cannot start: SERVICES_MODE is local, so STRIPE_API_URL must be a loopback address (the payment stand-in), not ${settings.STRIPE_API_URL}.`);
    }
    if (/_live_/.test(settings.STRIPE_SECRET_KEY)) throw new EnvError("Axisline cannot start: SERVICES_MODE is local, so STRIPE_SECRET_KEY must not be a live key.");
    return settings;
  }
  const missing = (["STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET"] as const).filter((k) => !given[k] || given[k] === LOCAL_PAYMENTS[k]);
  if (missing.length > 0) {
    throw new EnvError(`Axisline cannot start: SERVICES_MODE is hosted, so ${missing.join(" and ")} must be set to the payment service's real values (not the local stand-in's).`);
  }
  if (given.STRIPE_API_URL && !given.STRIPE_API_URL.startsWith("https://")) {
    throw new EnvError("Axisline cannot start: SERVICES_MODE is hosted, so STRIPE_API_URL must use https:// (or be unset for the payment service itself).");
  }
  return { STRIPE_SECRET_KEY: given.STRIPE_SECRET_KEY!, STRIPE_WEBHOOK_SECRET: given.STRIPE_WEBHOOK_SECRET!, STRIPE_API_URL: given.STRIPE_API_URL };
}

const whole = (what: string, min: number, max: number) =>
  z.coerce.number({ error: `must be a number (${what})` }).int({ error: "must be a whole number" }).min(min, { error: `must be between ${min} and ${max}` }).max(max, { error: `must be between ${min} and ${max}` });

// What the payment stand-in (scripts/fakes/payments.ts) reads; the app never does.
const PaymentsFakeSchema = z.object({
  STRIPE_SECRET_KEY: EnvSchema.shape.STRIPE_SECRET_KEY.default(LOCAL_PAYMENTS.STRIPE_SECRET_KEY),
  STRIPE_WEBHOOK_SECRET: EnvSchema.shape.STRIPE_WEBHOOK_SECRET.default(LOCAL_PAYMENTS.STRIPE_WEBHOOK_SECRET),
  STRIPE_API_URL: url("the stand-in's own address").default(LOCAL_PAYMENTS.STRIPE_API_URL),
  // The app's webhook endpoint (<app origin>/api/payments/webhook). Unset: events are recorded, not sent.
  STRIPE_FAKE_WEBHOOK_URL: url("the app's webhook endpoint").optional(),
  // A JSON file that keeps the stand-in's objects across its restarts (unset: memory only).
  STRIPE_FAKE_DATA_FILE: z.string().min(1).optional(),
  // Webhook retries: attempt k+1 waits STRIPE_FAKE_RETRY_BASE_MS × 2^(k−1), at most STRIPE_FAKE_MAX_ATTEMPTS attempts.
  STRIPE_FAKE_RETRY_BASE_MS: whole("milliseconds", 1, 3_600_000).default(5000),
  STRIPE_FAKE_MAX_ATTEMPTS: whole("attempts", 1, 50).default(8),
  // How long a delayed payment method takes to succeed or fail, in ms.
  STRIPE_FAKE_ASYNC_DELAY_MS: whole("milliseconds", 0, 600_000).default(4000),
  // Test switches, also settable at run time (POST /_fake/settings): copies of each event, and out-of-order delivery.
  STRIPE_FAKE_DUPLICATES: whole("copies", 1, 50).default(1),
  STRIPE_FAKE_SHUFFLE: z.enum(["off", "reverse", "random"], { error: 'must be "off", "reverse" or "random"' }).default("off"),
});

/** The payment stand-in's settings; it listens on STRIPE_API_URL's port, loopback only. */
export function paymentsFakeSettings(source: Record<string, string | undefined> = process.env) {
  const result = PaymentsFakeSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".")} ${issue.message}`);
    throw new EnvError(`The payment stand-in cannot start: the environment is not valid.\n${lines.join("\n")}`);
  }
  if (!isLoopbackUrl(result.data.STRIPE_API_URL)) throw new EnvError("The payment stand-in cannot start: STRIPE_API_URL must be a loopback address.");
  return result.data;
}

/** 127.0.0.0/8, ::1 (also IPv4-mapped) and localhost. */
export function isLoopbackHost(host: string): boolean {
  const h = host.replace(/^\[|\]$/g, "").toLowerCase();
  return h === "localhost" || h === "::1" || /^(::ffff:)?127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(h);
}

function isLoopbackUrl(value: string): boolean {
  return isLoopbackHost(new URL(value).hostname);
}

let cached: Env | undefined;
export function env(): Env {
  cached ??= parseEnv(process.env);
  return cached;
}

/** Cookies are Secure everywhere except a loopback http:// origin (local demo and tests). */
export function secureCookies(): boolean {
  return !isLoopbackUrl(env().NEXTAUTH_URL) || env().NEXTAUTH_URL.startsWith("https://");
}

const BuildSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  // A separate build folder lets two builds (the demo's and the test build) coexist.
  NEXT_DIST_DIR: z.string().regex(/^\.next[\w-]*$/, { error: 'must be a folder name starting with ".next"' }).default(".next"),
  COMPRESSION_BY_PROXY: flag.default("false"),
  // An https public URL turns on HSTS (headers are fixed at build time, so build with the real URL).
  NEXTAUTH_URL: z.string().url({ error: "must be a URL" }).optional(),
});

/** The few variables next.config.ts reads, when Next loads it for a build or a server. */
export function buildSettings(source: Record<string, string | undefined>) {
  const result = BuildSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".")} ${issue.message}`);
    throw new EnvError(`Axisline cannot build or start: the environment is not valid.\n${lines.join("\n")}`);
  }
  return result.data;
}

const DatabaseSchema = EnvSchema.pick({ DATABASE_URL: true, PG_POOL_MAX: true });

/**
 * What a database connection needs (db/connection.ts), for every process: the app, the worker,
 * the scripts and the tests, some of which have no session secret or public URL to validate.
 */
export function databaseSettings(source: Record<string, string | undefined> = process.env) {
  const result = DatabaseSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".")} ${issue.message}`);
    throw new EnvError(`Axisline cannot reach its database: the environment is not valid.\n${lines.join("\n")}`);
  }
  return result.data;
}

/** The public base URL as the build knows it (page metadata): NEXTAUTH_URL, or the local demo's. */
export function publicUrlAtBuild(source: Record<string, string | undefined> = process.env): URL {
  return new URL(buildSettings(source).NEXTAUTH_URL ?? "http://127.0.0.1:3000");
}

// ---------------------------------------------------------------------------------- uploads
// The upload service (UploadThing v7, lib/storage). UPLOADTHING_TOKEN is base64 of
// {"apiKey":"sk_…","appId":"…","regions":["…"]}; the two URLs aim the SDK at the local stand-in
// (scripts/fakes/uploads.ts). Unset in hosted mode: the SDK's own hosts. One switch.
const UploadsSchema = z.object({
  UPLOADTHING_TOKEN: z.string().optional(),
  UPLOADTHING_INGEST_URL: url("the upload service's ingest origin, e.g. http://127.0.0.1:2620").optional(),
  UPLOADTHING_API_URL: url("the upload service's API origin, e.g. http://127.0.0.1:2620").optional(),
  // Where the stand-in keeps its files (git-ignored); only the stand-in reads it.
  UPLOADS_FAKE_DIR: z.string().min(1).default(".data/uploads-fake"),
});

const UploadTokenSchema = z.object({
  apiKey: z.string().startsWith("sk_", { error: 'apiKey must start with "sk_"' }),
  appId: z.string().min(1),
  regions: z.array(z.string().min(1)).min(1, { error: "regions must name at least one region" }),
});

/** The stand-in's credentials and address: never valid with the hosted service. */
export const LOCAL_UPLOADS = {
  apiKey: "sk_axisline_local_0123456789abcdef",
  appId: "axisline-local",
  regions: ["local"],
  url: "http://127.0.0.1:2620",
} as const;

export type UploadsSettings = {
  token: string;
  apiKey: string;
  appId: string;
  ingestUrl: string | undefined;
  apiUrl: string | undefined;
  fakeDir: string;
};

export function encodeUploadToken(t: { apiKey: string; appId: string; regions: readonly string[] }): string {
  return Buffer.from(JSON.stringify({ apiKey: t.apiKey, appId: t.appId, regions: t.regions })).toString("base64");
}

/**
 * Local mode: the stand-in's token and address unless set, and both URLs loopback. Hosted mode: a
 * real token (not the stand-in's), and the URLs unset (the service's own hosts) or https.
 */
export function uploadsSettings(source: Record<string, string | undefined> = process.env, mode: "local" | "hosted" = servicesModeOf(source)): UploadsSettings {
  const parsed = UploadsSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join(".")} ${issue.message}`);
    throw new EnvError(`Axisline cannot start: the upload settings are not valid.\n${lines.join("\n")}`);
  }
  const given = parsed.data;
  const local = mode === "local";
  const token = given.UPLOADTHING_TOKEN ?? (local ? encodeUploadToken(LOCAL_UPLOADS) : undefined);
  if (!token) throw new EnvError("Axisline cannot upload: SERVICES_MODE is hosted, so UPLOADTHING_TOKEN must be set to the upload service's token.");
  const decoded = UploadTokenSchema.safeParse(safeJson(Buffer.from(token, "base64").toString("utf8")));
  if (!decoded.success) throw new EnvError('Axisline cannot start: UPLOADTHING_TOKEN must be base64 of {"apiKey":"sk_…","appId":"…","regions":["…"]}.');
  const ingestUrl = given.UPLOADTHING_INGEST_URL ?? (local ? LOCAL_UPLOADS.url : undefined);
  const apiUrl = given.UPLOADTHING_API_URL ?? (local ? LOCAL_UPLOADS.url : undefined);
  for (const [name, value] of [["UPLOADTHING_INGEST_URL", ingestUrl], ["UPLOADTHING_API_URL", apiUrl]] as const) {
    if (local && value && !isLoopbackUrl(value)) throw new EnvError(`Axisline cannot start: SERVICES_MODE is local, so ${name} must be a loopback address (the upload stand-in), not ${value}.`);
    if (!local && value && !value.startsWith("https://")) throw new EnvError(`Axisline cannot start: SERVICES_MODE is hosted, so ${name} must use https:// (or be unset for the upload service itself).`);
  }
  if (!local && decoded.data.apiKey === LOCAL_UPLOADS.apiKey) throw new EnvError("Axisline cannot start: SERVICES_MODE is hosted, so UPLOADTHING_TOKEN must be the upload service's token, not the local stand-in's.");
  return { token, apiKey: decoded.data.apiKey, appId: decoded.data.appId, ingestUrl, apiUrl, fakeDir: given.UPLOADS_FAKE_DIR };
}

/**
 * At start (parseEnv): every upload variable that is set must be valid. A hosted deployment without
 * UPLOADTHING_TOKEN still starts (photos are one feature); the first upload then says what is missing.
 */
function checkUploadsSettings(source: Record<string, string | undefined>, mode: "local" | "hosted"): void {
  if (mode === "hosted" && !source.UPLOADTHING_TOKEN) return;
  uploadsSettings(source, mode);
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

function servicesModeOf(source: Record<string, string | undefined>): "local" | "hosted" {
  if (source.SERVICES_MODE === "local" || source.SERVICES_MODE === "hosted") return source.SERVICES_MODE;
  return source.NODE_ENV === "production" ? "hosted" : "local";
}

/**
 * Where the browser sends photo bytes (the upload service's ingest), for the CSP's connect-src,
 * which is fixed at build time: UPLOADTHING_INGEST_URL's origin if set, else the stand-in's
 * address in local mode, else the service's regional ingest hosts (<region>.ingest.uploadthing.com,
 * the SDK's default). Presigned PUTs go nowhere else.
 */
export function uploadConnectSources(source: Record<string, string | undefined> = process.env): string[] {
  if (source.UPLOADTHING_INGEST_URL) {
    try {
      return [new URL(source.UPLOADTHING_INGEST_URL).origin];
    } catch {
      return [];
    }
  }
  return servicesModeOf(source) === "local" ? [LOCAL_UPLOADS.url] : ["https://*.ingest.uploadthing.com"];
}

// ------------------------------------------------------------------------ credential signing keys
// The shape of CREDENTIAL_SIGNING_KEYS: a JWK Set (RFC 7517 §5) of private signing keys, current
// key first. Two kinds, the two algorithms the certificates issue allows: EC P-256 (ES256, RFC 7518
// §3.4) and Ed25519 (EdDSA, RFC 8037 §2). Older keys stay in the set after a rotation so that
// credentials they signed keep verifying: every key is published (public part) at /issuer/jwks.json.
// Here rather than in lib/certificates: next.config.ts loads this file, and its loader can't follow
// imports of other TypeScript files.
const b64url = z.string().regex(/^[A-Za-z0-9_-]+$/, { error: "must be base64url" });

const EcKey = z.object({ kty: z.literal("EC"), crv: z.literal("P-256"), x: b64url, y: b64url, d: b64url, kid: z.string().min(1).optional() });
const OkpKey = z.object({ kty: z.literal("OKP"), crv: z.literal("Ed25519"), x: b64url, d: b64url, kid: z.string().min(1).optional() });

const SigningKey = z.discriminatedUnion("kty", [EcKey, OkpKey], {
  error: 'each key must be a private JWK: {"kty":"EC","crv":"P-256",x,y,d} or {"kty":"OKP","crv":"Ed25519",x,d}',
});
export type SigningKeyJwk = z.infer<typeof SigningKey>;

const SigningKeySet = z.object({ keys: z.array(SigningKey).min(1, { error: "must hold at least one key" }) });

/** Parses the variable's text (JSON of a JWK Set); a sentence saying what is wrong, or the keys. */
export function parseSigningKeySet(text: string): { ok: true; keys: SigningKeyJwk[] } | { ok: false; message: string } {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return { ok: false, message: 'must be the JSON of a JWK Set, {"keys":[…]} (scripts/credential-key.ts makes one)' };
  }
  const parsed = SigningKeySet.safeParse(json);
  if (!parsed.success) return { ok: false, message: parsed.error.issues.map((i) => `${i.path.join(".")} ${i.message}`.trim()).join("; ") };
  const kids = parsed.data.keys.map((k) => k.kid).filter(Boolean);
  if (new Set(kids).size !== kids.length) return { ok: false, message: "two keys share a kid" };
  return { ok: true, keys: parsed.data.keys };
}

/** The JWS algorithm of a key (RFC 7518 §3.1, RFC 8037 §3.1). */
export function algorithmOf(key: SigningKeyJwk): "ES256" | "EdDSA" {
  return key.kty === "EC" ? "ES256" : "EdDSA";
}

/**
 * CREDENTIAL_SIGNING_KEYS: the private keys that sign Open Badges credentials and the status list,
 * as the JSON of a JWK Set, current key first (lib/certificates/key-set.ts; make one with
 * `tsx scripts/credential-key.ts`). Checked at start whenever it is set. Unset (in either mode, as
 * for uploads: certificates are one feature), nothing can be issued and the page says so.
 */
export function credentialSigningKeys(source: Record<string, string | undefined> = process.env): SigningKeyJwk[] | null {
  const text = source.CREDENTIAL_SIGNING_KEYS?.trim();
  if (!text) return null;
  const parsed = parseSigningKeySet(text);
  if (!parsed.ok) throw new EnvError(`Axisline cannot start: CREDENTIAL_SIGNING_KEYS ${parsed.message}.`);
  return parsed.keys;
}
