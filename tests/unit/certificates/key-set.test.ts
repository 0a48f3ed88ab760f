// CREDENTIAL_SIGNING_KEYS as lib/env.ts validates it: a JWK Set (RFC 7517 §5) of private EC P-256
// or Ed25519 keys (RFC 7518 §6.2, RFC 8037 §2), checked at start by parseEnv.
import { describe, expect, it } from "vitest";
import { credentialSigningKeys, parseEnv } from "@/lib/env";
import { parseSigningKeySet } from "@/lib/certificates/key-set";
import { newSigningKey } from "../../support/certificates";

describe("CREDENTIAL_SIGNING_KEYS", () => {
  it("accepts a set of P-256 and Ed25519 private keys, current first", async () => {
    const text = JSON.stringify({ keys: [await newSigningKey("ES256"), await newSigningKey("EdDSA")] });
    const keys = credentialSigningKeys({ CREDENTIAL_SIGNING_KEYS: text });
    expect(keys?.map((k) => k.crv)).toEqual(["P-256", "Ed25519"]);
  });

  it("refuses public keys, other curves, broken JSON and an empty set with a sentence naming the variable", async () => {
    const key = await newSigningKey("ES256");
    const { d: _private, ...publicOnly } = key;
    expect(() => credentialSigningKeys({ CREDENTIAL_SIGNING_KEYS: JSON.stringify({ keys: [publicOnly] }) })).toThrow(/CREDENTIAL_SIGNING_KEYS/);
    expect(() => credentialSigningKeys({ CREDENTIAL_SIGNING_KEYS: JSON.stringify({ keys: [{ ...key, crv: "P-384" }] }) })).toThrow(/CREDENTIAL_SIGNING_KEYS/);
    expect(() => credentialSigningKeys({ CREDENTIAL_SIGNING_KEYS: "{not json" })).toThrow(/JWK Set/);
    expect(() => credentialSigningKeys({ CREDENTIAL_SIGNING_KEYS: '{"keys":[]}' })).toThrow(/at least one key/);
    expect(parseSigningKeySet(JSON.stringify({ keys: [key, key] }))).toMatchObject({ ok: false, message: "two keys share a kid" });
  });

  it("is optional (certificates then can't be issued) and checked whenever it is set", () => {
    expect(credentialSigningKeys({ SERVICES_MODE: "hosted" })).toBeNull();
    expect(() => parseEnv({ DATABASE_URL: "postgres://a@127.0.0.1/b", NEXTAUTH_URL: "http://127.0.0.1:3000", NEXTAUTH_SECRET: "x".repeat(32), CREDENTIAL_SIGNING_KEYS: "[]" })).toThrow(/CREDENTIAL_SIGNING_KEYS/);
  });
});
