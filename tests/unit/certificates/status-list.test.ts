// W3C Bitstring Status List v1.0 (Recommendation, 15 May 2025), §3.1–3.3: a 16KB bitstring, bit 0
// the left-most (most significant) bit of the first byte, GZIP (RFC 1952), base64url without
// padding, Multibase prefix "u". Decoded here with Node's zlib and Buffer, outside our encoder.
import { gunzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { decodeStatusList, encodeStatusList, STATUS_LIST_SIZE, statusBit } from "@/lib/certificates/status-list";

describe("the revocation status list", () => {
  it("is 131,072 entries (16KB), the specification's minimum", () => {
    expect(STATUS_LIST_SIZE).toBe(16 * 1024 * 8);
    const encoded = encodeStatusList([]);
    expect(encoded.startsWith("u")).toBe(true);
    expect(encoded).not.toMatch(/[=+/]/);
    expect(gunzipSync(Buffer.from(encoded.slice(1), "base64url")).length).toBe(16_384);
  });

  it("sets the left-most bit for index 0 and bit 7 of byte 1 for index 15", () => {
    const raw = gunzipSync(Buffer.from(encodeStatusList([0, 15, 131_071]).slice(1), "base64url"));
    expect(raw[0]).toBe(0b1000_0000);
    expect(raw[1]).toBe(0b0000_0001);
    expect(raw[16_383]).toBe(0b0000_0001);
    const bits = decodeStatusList(encodeStatusList([42]));
    expect([statusBit(bits, 41), statusBit(bits, 42), statusBit(bits, 43)]).toEqual([0, 1, 0]);
  });

  it("refuses an index outside the list", () => {
    expect(() => encodeStatusList([STATUS_LIST_SIZE])).toThrow(RangeError);
    expect(() => encodeStatusList([-1])).toThrow(RangeError);
  });
});
