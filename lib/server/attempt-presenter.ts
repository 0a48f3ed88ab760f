import "server-only";
// The presented ids and orders of one attempt (lib/assessment/presentation.ts), keyed by a
// 256-bit secret drawn when the attempt starts and kept in its row; it never leaves the server.
//  - ids: HMAC-SHA256(secret, "id" ‖ question id ‖ role ‖ authored id), first 96 bits, base64url.
//    Without the secret an id says nothing about the authored id, and no two attempts share ids.
//  - orders: Fisher–Yates driven by HMAC-SHA256(secret, "order" ‖ scope ‖ purpose ‖ block)
//    as a stream of 32-bit words, each index drawn by rejection so every permutation is equally
//    likely. Recovering the order of one attempt tells nothing about another's, or about the key.
// HMAC: RFC 2104 with SHA-256 (FIPS 180-4), as a pseudorandom function keyed by the secret.
import { createHmac, randomBytes } from "node:crypto";
import { legacyPresenter, type ChoiceRole, type Presenter } from "@/lib/assessment";

/** Bytes of an attempt's secret (256 bits; the minimum accepted is 128). */
const SECRET_BYTES = 32;
const MIN_SECRET_BYTES = 16;
/** Bytes of a presented id: 96 bits, 16 base64url characters after the one-letter prefix. */
const ID_BYTES = 12;
// Ids in a bank must start with a letter or digit (lib/assessment idSchema); base64url may not.
const ID_PREFIX = "c";
// Labels are joined with NUL: ids never contain it (idSchema), so no two labels can collide.
const SEP = "\u0000";

/** A fresh secret for a new attempt, as stored in quiz_attempts.presentation_secret. */
export function newPresentationSecret(): string {
  return randomBytes(SECRET_BYTES).toString("base64url");
}

/** A uniform integer stream in [0, bound) from HMAC blocks of one label. */
function integerStream(key: Buffer, label: string): (bound: number) => number {
  let block = 0;
  let words: Buffer = Buffer.alloc(0);
  let offset = 0;
  const nextWord = () => {
    if (offset >= words.length) {
      words = createHmac("sha256", key).update(`${label}${SEP}${block++}`).digest();
      offset = 0;
    }
    const word = words.readUInt32BE(offset);
    offset += 4;
    return word;
  };
  return (bound) => {
    // Reject the top sliver of the 32-bit range that would make small values more likely.
    const limit = Math.floor(2 ** 32 / bound) * bound;
    for (;;) {
      const word = nextWord();
      if (word < limit) return word % bound;
    }
  };
}

export function secretPresenter(secret: string): Presenter {
  const key = Buffer.from(secret, "base64url");
  if (key.length < MIN_SECRET_BYTES) throw new Error("an attempt's presentation secret must be at least 128 bits");
  return {
    presentedId(questionId: string, role: ChoiceRole, authoredId: string): string {
      const mac = createHmac("sha256", key).update(["id", questionId, role, authoredId].join(SEP)).digest();
      return ID_PREFIX + mac.subarray(0, ID_BYTES).toString("base64url");
    },
    permutation(scope: string, purpose: string, n: number): number[] {
      const next = integerStream(key, ["order", scope, purpose].join(SEP));
      const order = Array.from({ length: n }, (_, index) => index);
      for (let i = n - 1; i > 0; i--) {
        const j = next(i + 1);
        [order[i], order[j]] = [order[j], order[i]];
      }
      return order;
    },
  };
}

/** The presenter of a stored attempt: its secret, or the old seeded scheme for attempts started before secrets. */
export function presenterOf(attempt: { presentationSecret: string | null; seed: number }): Presenter {
  return attempt.presentationSecret ? secretPresenter(attempt.presentationSecret) : legacyPresenter(attempt.seed);
}
