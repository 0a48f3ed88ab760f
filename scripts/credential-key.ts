// Makes the private keys for CREDENTIAL_SIGNING_KEYS (lib/env.ts): a JWK Set, printed as one line
// of JSON for .env.
//   tsx scripts/credential-key.ts           a set with one fresh EC P-256 key (ES256)
//   tsx scripts/credential-key.ts rotate    a fresh key first, then the keys of the current
//                                           CREDENTIAL_SIGNING_KEYS (they stay published, so
//                                           credentials they signed keep verifying)
import { calculateJwkThumbprint, exportJWK, generateKeyPair } from "jose";
import { parseSigningKeySet } from "@/lib/certificates/key-set";

async function freshKey() {
  const { privateKey } = await generateKeyPair("ES256", { extractable: true });
  const jwk = await exportJWK(privateKey);
  const kid = await calculateJwkThumbprint({ kty: jwk.kty, crv: jwk.crv, x: jwk.x, y: jwk.y }, "sha256");
  return { kty: jwk.kty, crv: jwk.crv, x: jwk.x, y: jwk.y, d: jwk.d, kid };
}

async function main() {
  const rotate = process.argv.includes("rotate");
  const older = [];
  if (rotate) {
    const current = process.env.CREDENTIAL_SIGNING_KEYS;
    if (!current) throw new Error("rotate: CREDENTIAL_SIGNING_KEYS is not set, so there is nothing to keep.");
    const parsed = parseSigningKeySet(current);
    if (!parsed.ok) throw new Error(`rotate: CREDENTIAL_SIGNING_KEYS ${parsed.message}`);
    older.push(...parsed.keys);
  }
  process.stdout.write(`${JSON.stringify({ keys: [await freshKey(), ...older] })}\n`);
}

main().catch((err: Error) => {
  console.error(err.message);
  process.exitCode = 1;
});
