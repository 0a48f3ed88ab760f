/**
 * dBFS against dBu under the two published alignments, and the quantisation limit of a converter.
 * Sources (full citations in tests/sources.md): EBU R68-2000 (−18 dBFS alignment level, 0 dBu),
 * SMPTE RP 155 (−20 dBFS reference; +4 dBu pairing is common practice), AES17-1998 (0 dBFS =
 * a full-scale sine), Wikipedia "Audio bit depth" (16 bits ≈ 98 dB, 24 bits ≈ 146 dB).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ALIGNMENT_IDS, dbfsToDbu, dbuToDbfs, DIGITAL_ALIGNMENTS, fullScaleDbu, quantisationSnrDb, type AlignmentId } from "@/lib/acoustics/alignment";
import { expectPrinted } from "./near";

describe("EBU R68: −18 dBFS = 0 dBu", () => {
  it("puts the alignment level at −18 dBFS = 0 dBu and full scale at +18 dBu", () => {
    expect(dbfsToDbu({ dbfs: -18, alignment: "ebu-r68" })).toBe(0); // EBU R68-2000 [pub]
    expect(dbuToDbfs({ dbu: 0, alignment: "ebu-r68" })).toBe(-18); // EBU R68-2000 [pub]
    expect(fullScaleDbu({ alignment: "ebu-r68" })).toBe(18); // 18 dB above the alignment level, EBU R68-2000 [pub]
  });

  it("places +4 dBu and a −10 dBFS peak", () => {
    expect(dbuToDbfs({ dbu: 4, alignment: "ebu-r68" })).toBe(-14); // [derived]
    expect(dbfsToDbu({ dbfs: -10, alignment: "ebu-r68" })).toBe(8); // [derived]
  });
});

describe("SMPTE RP 155: −20 dBFS = +4 dBu", () => {
  it("puts the reference level at −20 dBFS = +4 dBu and full scale at +24 dBu", () => {
    expect(dbfsToDbu({ dbfs: -20, alignment: "smpte-rp155" })).toBe(4); // SMPTE RP 155 (−20 dBFS) [pub]; +4 dBu pairing: common practice
    expect(dbuToDbfs({ dbu: 4, alignment: "smpte-rp155" })).toBe(-20); // same
    expect(fullScaleDbu({ alignment: "smpte-rp155" })).toBe(24); // [derived]: 20 dB above +4 dBu
  });

  it("differs from EBU R68 by 6 dB at every level", () => {
    // EBU: 0 dBFS = +18 dBu; SMPTE: 0 dBFS = +24 dBu [derived]
    expect(dbuToDbfs({ dbu: 0, alignment: "smpte-rp155" })).toBe(-24);
    expect(dbuToDbfs({ dbu: 0, alignment: "ebu-r68" }) - dbuToDbfs({ dbu: 0, alignment: "smpte-rp155" })).toBe(6);
  });

  it("a level above full scale reads above 0 dBFS: the converter clips", () => {
    expect(dbuToDbfs({ dbu: 22, alignment: "ebu-r68" })).toBe(4); // 4 dB over an EBU converter [derived]
    expect(dbuToDbfs({ dbu: 22, alignment: "smpte-rp155" })).toBe(-2); // 2 dB below full scale [derived]
  });
});

describe("the conversions", () => {
  it("property: dbuToDbfs inverts dbfsToDbu for both alignments", () => {
    const alignment = fc.constantFrom<AlignmentId>(...ALIGNMENT_IDS);
    fc.assert(
      fc.property(alignment, fc.double({ min: -140, max: 0, noNaN: true }), (id, dbfs) => {
        expect(dbuToDbfs({ dbu: dbfsToDbu({ dbfs, alignment: id }), alignment: id })).toBeCloseTo(dbfs, 9);
      }),
    );
  });

  it("lists exactly the two published alignments, with a source each", () => {
    expect([...ALIGNMENT_IDS].sort()).toEqual(["ebu-r68", "smpte-rp155"]);
    expect(DIGITAL_ALIGNMENTS["ebu-r68"].source).toContain("R68");
    expect(DIGITAL_ALIGNMENTS["smpte-rp155"].source).toContain("RP 155");
  });

  it("refuses an unknown alignment and a non-finite level", () => {
    expect(() => dbfsToDbu({ dbfs: -18, alignment: "house" as AlignmentId })).toThrow(RangeError);
    expect(() => dbfsToDbu({ dbfs: -18, alignment: "toString" as AlignmentId })).toThrow(RangeError);
    expect(() => dbuToDbfs({ dbu: Number.NaN, alignment: "ebu-r68" })).toThrow(RangeError);
  });
});

describe("quantisation limit, 6.02·N + 1.76 dB", () => {
  it("16 bits ≈ 98 dB and 24 bits ≈ 146 dB", () => {
    expectPrinted(quantisationSnrDb({ bits: 16 }), "98"); // Wikipedia "Audio bit depth" [pub]
    expectPrinted(quantisationSnrDb({ bits: 24 }), "146"); // Wikipedia "Audio bit depth" [pub]
    expectPrinted(quantisationSnrDb({ bits: 16 }), "98.09"); // 20·log10(2^16) + 1.761 [derived]
    expectPrinted(quantisationSnrDb({ bits: 24 }) - quantisationSnrDb({ bits: 23 }), "6.02"); // 20·log10 2 per bit [derived]
  });

  it("refuses a fractional or absurd word length", () => {
    expect(() => quantisationSnrDb({ bits: 16.5 })).toThrow(RangeError);
    expect(() => quantisationSnrDb({ bits: 0 })).toThrow(RangeError);
  });
});
