// The revocation list as W3C Bitstring Status List v1.0 (W3C Recommendation, 15 May 2025,
// https://www.w3.org/TR/vc-bitstring-status-list/): §3.1 "Bitstring Generation Algorithm": a
// bitstring of at least 16 KB (131,072 entries) with bit 0 the left-most bit (the most
// significant bit of the first byte), GZIP-compressed (RFC 1952), base64url without padding
// (RFC 4648 §5), with the Multibase prefix "u" (§2.2, encodedList).
import { gunzipSync, gzipSync } from "node:zlib";

/** Entries in one list: the specification's minimum size, 16 KB of bits (§2.2 and §6.1 on group privacy). */
export const STATUS_LIST_SIZE = 131_072;

export function encodeStatusList(setIndexes: Iterable<number>, size = STATUS_LIST_SIZE): string {
  const bytes = new Uint8Array(size / 8);
  for (const index of setIndexes) {
    if (!Number.isInteger(index) || index < 0 || index >= size) throw new RangeError(`status list index out of range: ${index}`);
    bytes[index >> 3] |= 0x80 >> (index & 7);
  }
  return `u${gzipSync(bytes).toString("base64url")}`;
}

/** The inverse (§3.2 "Bitstring Expansion Algorithm"), for verifiers and tests. */
export function decodeStatusList(encodedList: string): Uint8Array {
  if (!encodedList.startsWith("u")) throw new Error('encodedList must start with the Multibase prefix "u"');
  return new Uint8Array(gunzipSync(Buffer.from(encodedList.slice(1), "base64url")));
}

/** §3.3 "Validate Algorithm", step: the bit at statusListIndex (1 = revoked for statusPurpose "revocation"). */
export function statusBit(bitstring: Uint8Array, index: number): 0 | 1 {
  if (index < 0 || index >= bitstring.length * 8) throw new RangeError(`status list index out of range: ${index}`);
  return (bitstring[index >> 3] & (0x80 >> (index & 7))) !== 0 ? 1 : 0;
}
