import { describe, expect, it } from "vitest";
import { CODE_ALPHABET, CODE_ENTROPY_BITS, CODE_LENGTH, formatCode, newVerificationCode, normalizeCode } from "@/lib/certificates/code";

describe("verification codes", () => {
  it("use Crockford's base32 alphabet: digits and letters without I, L, O, U (crockford.com/base32.html)", () => {
    expect(CODE_ALPHABET).toBe("0123456789ABCDEFGHJKMNPQRSTVWXYZ");
    expect(new Set(CODE_ALPHABET).size).toBe(32);
    for (const excluded of "ILOU") expect(CODE_ALPHABET).not.toContain(excluded);
  });

  it("are 12 symbols, 60 bits", () => {
    expect(CODE_LENGTH).toBe(12);
    expect(CODE_ENTROPY_BITS).toBe(60);
    const code = newVerificationCode();
    expect(code).toMatch(/^[0-9A-HJKMNP-TV-Z]{12}$/);
  });

  it("draw every symbol about equally often (chi-square over 2,400 codes, 31 degrees of freedom, α = 0.001: 61.098, NIST/SEMATECH e-Handbook table 1.3.6.7.4)", () => {
    const counts = new Map<string, number>();
    const codes = 2400;
    for (let i = 0; i < codes; i++) for (const ch of newVerificationCode()) counts.set(ch, (counts.get(ch) ?? 0) + 1);
    const expected = (codes * CODE_LENGTH) / 32;
    const chi = [...CODE_ALPHABET].reduce((sum, ch) => sum + ((counts.get(ch) ?? 0) - expected) ** 2 / expected, 0);
    expect(chi).toBeLessThan(61.098);
  });

  it("are shown in groups of four", () => {
    expect(formatCode("7KQ2M9XH4RTB")).toBe("7KQ2-M9XH-4RTB");
  });

  it("are read back as typed: case, dashes and spaces ignored; I and L read as 1, O as 0 (Crockford's decoding rules)", () => {
    expect(normalizeCode("7kq2-m9xh-4rtb")).toBe("7KQ2M9XH4RTB");
    expect(normalizeCode(" 7KQ2 M9XH 4RTB ")).toBe("7KQ2M9XH4RTB");
    expect(normalizeCode("OIL2-M9XH-4RTB")).toBe("0112M9XH4RTB");
    expect(normalizeCode("7KQ2–M9XH–4RTB")).toBe("7KQ2M9XH4RTB"); // en dashes from a word processor
  });

  it("refuse what can't be a code", () => {
    expect(normalizeCode("7KQ2-M9XH-4RT")).toBeNull();
    expect(normalizeCode("7KQ2-M9XH-4RTBX")).toBeNull();
    expect(normalizeCode("UKQ2-M9XH-4RTB")).toBeNull();
    expect(normalizeCode("")).toBeNull();
    expect(normalizeCode("7KQ2/M9XH/4RTB")).toBeNull();
  });
});
