import "server-only";
// Signing with the keys of CREDENTIAL_SIGNING_KEYS (lib/env.ts) through jose: the current key
// (the first) signs; every key is published (public part) at /issuer/jwks.json, so a credential
// signed before a rotation still verifies. Each key's `kid` is a URL that dereferences to its
// public JWK (OB 3.0 §8.2.1, JOSE header `kid`: "A URI that can be dereferenced to an object of
// type JWK"), served by /issuer/keys/<id>.
import { calculateJwkThumbprint, importJWK, SignJWT, type JWK, type KeyLike } from "jose";
import { credentialSigningKeys } from "@/lib/env";
import { algorithmOf, type SigningKeyJwk } from "./key-set";

export type PublicJwk = JWK & { kid: string; alg: "ES256" | "EdDSA"; use: "sig" };

type LoadedKey = { kid: string; keyId: string; alg: "ES256" | "EdDSA"; privateKey: KeyLike | Uint8Array; publicJwk: PublicJwk };

const loaded = new Map<string, Promise<LoadedKey[]>>();

function publicPart(key: SigningKeyJwk): JWK {
  return key.kty === "EC" ? { kty: "EC", crv: key.crv, x: key.x, y: key.y } : { kty: "OKP", crv: key.crv, x: key.x };
}

/** The short id in a key's URL: its own kid, or its RFC 7638 thumbprint. */
async function keyIdOf(key: SigningKeyJwk): Promise<string> {
  return key.kid ?? (await calculateJwkThumbprint(publicPart(key), "sha256"));
}

export function keyUrl(origin: string, keyId: string): string {
  return `${origin}/issuer/keys/${encodeURIComponent(keyId)}`;
}

async function loadKeys(origin: string, keys: SigningKeyJwk[]): Promise<LoadedKey[]> {
  return Promise.all(
    keys.map(async (key) => {
      const alg = algorithmOf(key);
      const keyId = await keyIdOf(key);
      const kid = keyUrl(origin, keyId);
      const privateKey = await importJWK({ ...key, kid: undefined }, alg);
      return { kid, keyId, alg, privateKey, publicJwk: { ...publicPart(key), kid, alg, use: "sig" } };
    }),
  );
}

/** The configured keys, loaded once per process and origin; null when none are configured. */
export async function signingKeys(origin: string, source: Record<string, string | undefined> = process.env): Promise<LoadedKey[] | null> {
  const keys = credentialSigningKeys(source);
  if (!keys) return null;
  const cacheKey = `${origin}\n${source.CREDENTIAL_SIGNING_KEYS}`;
  let entry = loaded.get(cacheKey);
  if (!entry) {
    entry = loadKeys(origin, keys);
    loaded.set(cacheKey, entry);
  }
  return entry;
}

/** The published JWK Set: every key's public part, current first (RFC 7517 §5). */
export async function publicJwks(origin: string, source?: Record<string, string | undefined>): Promise<{ keys: PublicJwk[] }> {
  const keys = await signingKeys(origin, source);
  return { keys: (keys ?? []).map((k) => k.publicJwk) };
}

/**
 * A compact JWS of the payload with the current key. Header exactly as OB 3.0 §8.2.1 allows:
 * alg, kid (a URL) and typ "JWT"; "Additional JOSE Headers are NOT allowed".
 */
export async function signJwt(origin: string, payload: Record<string, unknown>, source?: Record<string, string | undefined>): Promise<string | null> {
  const keys = await signingKeys(origin, source);
  if (!keys) return null;
  const current = keys[0];
  return new SignJWT(payload).setProtectedHeader({ alg: current.alg, kid: current.kid, typ: "JWT" }).sign(current.privateKey);
}
