// The shape of CREDENTIAL_SIGNING_KEYS (validated by lib/env.ts): a JWK Set (RFC 7517 §5) of
// private signing keys, the current key first. Two kinds, the two algorithms the Open Badges 3.0
// issue allows us: EC P-256 (ES256, RFC 7518 §3.4) and Ed25519 (EdDSA, RFC 8037 §2). Older keys
// stay in the set after a rotation so that credentials they signed keep verifying: every key
// here is published (public part only) at /issuer/jwks.json.
import { z } from "zod";

const b64url = z.string().regex(/^[A-Za-z0-9_-]+$/, { error: "must be base64url" });

const EcKey = z.object({ kty: z.literal("EC"), crv: z.literal("P-256"), x: b64url, y: b64url, d: b64url, kid: z.string().min(1).optional() });
const OkpKey = z.object({ kty: z.literal("OKP"), crv: z.literal("Ed25519"), x: b64url, d: b64url, kid: z.string().min(1).optional() });

export const SigningKey = z.discriminatedUnion("kty", [EcKey, OkpKey], {
  error: 'each key must be a private JWK: {"kty":"EC","crv":"P-256",x,y,d} or {"kty":"OKP","crv":"Ed25519",x,d}',
});
export type SigningKeyJwk = z.infer<typeof SigningKey>;

export const SigningKeySet = z.object({ keys: z.array(SigningKey).min(1, { error: "must hold at least one key" }) });

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
