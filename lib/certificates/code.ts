// Verification codes: random, unguessable, short enough to type from paper.
// Alphabet: Douglas Crockford's base32 (https://www.crockford.com/base32.html): the digits and
// the letters without I, L, O and U, so nothing on the page can be misread as another symbol.
// Length: 12 symbols, shown in groups of four (XXXX-XXXX-XXXX): 12 × log2(32) = 60 bits, drawn
// with crypto.randomInt (uniform). Typing is forgiving, as Crockford's decoding rules say: case
// is ignored, dashes and spaces are dropped, I and L read as 1, O reads as 0.
import { randomInt } from "node:crypto";

export const CODE_ALPHABET = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";
export const CODE_LENGTH = 12;
/** Bits of entropy of one code: 12 symbols of 5 bits each. */
export const CODE_ENTROPY_BITS = CODE_LENGTH * Math.log2(CODE_ALPHABET.length);

/** A fresh code, as stored (no dashes). */
export function newVerificationCode(): string {
  let code = "";
  for (let i = 0; i < CODE_LENGTH; i++) code += CODE_ALPHABET[randomInt(0, CODE_ALPHABET.length)];
  return code;
}

/** XXXX-XXXX-XXXX, for print and display. */
export function formatCode(code: string): string {
  return code.match(/.{1,4}/g)?.join("-") ?? code;
}

/**
 * What a person typed → the stored form, or null when it can't be a code (wrong length or a
 * symbol outside the alphabet, such as U).
 */
export function normalizeCode(typed: string): string | null {
  const cleaned = typed
    .normalize("NFKC")
    .toUpperCase()
    .replace(/[\s\-‐-―_.]/g, "")
    .replace(/[IL]/g, "1")
    .replace(/O/g, "0");
  if (cleaned.length !== CODE_LENGTH) return null;
  for (const ch of cleaned) if (!CODE_ALPHABET.includes(ch)) return null;
  return cleaned;
}
