/**
 * Digital full scale (dBFS) against analogue level (dBu): the alignments that say which
 * analogue level a converter's reference tone reads as.
 *
 * dBFS: 0 dBFS is the rms level of a full-scale sine (AES17-1998; IEC 61606). No digital
 * sample can exceed it, so an analogue level above full scale clips at the converter.
 *
 * An alignment pairs a digital reference level with an analogue one; every other level
 * follows by a fixed offset, L_dBu = L_dBFS − ref_dBFS + ref_dBu:
 * - EBU R68 (EBU Technical Recommendation R68-2000, "Alignment level in digital audio
 *   production equipment and in digital audio recorders"): the alignment level is 18 dB
 *   below full scale, −18 dBFS, and is the analogue alignment level 0 dBu (0 dBu0s,
 *   ITU-R BS.645-2). Full scale is therefore +18 dBu.
 * - SMPTE RP 155 (SMPTE Recommended Practice 155, reference levels for digital audio):
 *   reference level −20 dBFS. Pairing it with +4 dBu (the professional analogue operating
 *   level) is common practice rather than part of RP 155. Full scale is then +24 dBu.
 * Real desks and converters are often set otherwise; these are the two published anchors.
 */
import { requireFinite } from "./validate";

export type AlignmentId = "ebu-r68" | "smpte-rp155";

export interface DigitalAlignment {
  readonly id: AlignmentId;
  /** Short name for a control or a readout. */
  readonly label: string;
  /** The digital reference (alignment) level, dBFS. */
  readonly referenceDbfs: number;
  /** The analogue level that reads as the reference, dBu. */
  readonly referenceDbu: number;
  /** Where the pairing comes from. */
  readonly source: string;
}

export const DIGITAL_ALIGNMENTS: Readonly<Record<AlignmentId, DigitalAlignment>> = Object.freeze({
  "ebu-r68": Object.freeze({
    id: "ebu-r68",
    label: "EBU R68 (−18 dBFS = 0 dBu)",
    referenceDbfs: -18,
    referenceDbu: 0,
    source: "EBU R68-2000: alignment level 18 dB below full scale = 0 dBu",
  }),
  "smpte-rp155": Object.freeze({
    id: "smpte-rp155",
    label: "SMPTE RP 155 (−20 dBFS = +4 dBu)",
    referenceDbfs: -20,
    referenceDbu: 4,
    source: "SMPTE RP 155: reference level −20 dBFS; paired with +4 dBu by common practice",
  }),
});

export const ALIGNMENT_IDS = Object.keys(DIGITAL_ALIGNMENTS) as readonly AlignmentId[];

function lookUpAlignment(alignment: AlignmentId): DigitalAlignment {
  const found = Object.hasOwn(DIGITAL_ALIGNMENTS, alignment) ? DIGITAL_ALIGNMENTS[alignment] : undefined;
  if (!found) throw new RangeError(`alignment must be one of ${ALIGNMENT_IDS.join(", ")}; received ${String(alignment)}`);
  return found;
}

/**
 * dBFS → dBu under an alignment: L_dBu = L_dBFS − ref_dBFS + ref_dBu (EBU R68: −18 dBFS =
 * 0 dBu; SMPTE RP 155: −20 dBFS = +4 dBu). 0 dBFS → +18 dBu (EBU) or +24 dBu (SMPTE).
 */
export function dbfsToDbu({ dbfs, alignment }: { dbfs: number; alignment: AlignmentId }): number {
  requireFinite("dbfs", dbfs);
  const { referenceDbfs, referenceDbu } = lookUpAlignment(alignment);
  return dbfs - referenceDbfs + referenceDbu;
}

/**
 * dBu → dBFS under an alignment: L_dBFS = L_dBu − ref_dBu + ref_dBFS. A result above 0 dBFS
 * is a level the converter cannot code: it clips by that many dB.
 */
export function dbuToDbfs({ dbu, alignment }: { dbu: number; alignment: AlignmentId }): number {
  requireFinite("dbu", dbu);
  const { referenceDbfs, referenceDbu } = lookUpAlignment(alignment);
  return dbu - referenceDbu + referenceDbfs;
}

/** The analogue level of digital full scale (0 dBFS), dBu: +18 (EBU R68), +24 (SMPTE RP 155). */
export function fullScaleDbu({ alignment }: { alignment: AlignmentId }): number {
  return dbfsToDbu({ dbfs: 0, alignment });
}

/**
 * The theoretical signal-to-quantisation-noise ratio of an ideal N-bit converter for a
 * full-scale sine: 20·log10(2^N) + 10·log10(3/2) ≈ 6.02·N + 1.76 dB (textbook result; e.g.
 * Pohlmann, Principles of Digital Audio; Wikipedia "Audio bit depth": 16 bits ≈ 98 dB,
 * 24 bits ≈ 146 dB). Real converters stop well short of it, at their analogue noise.
 */
export function quantisationSnrDb({ bits }: { bits: number }): number {
  requireFinite("bits", bits);
  if (!Number.isInteger(bits) || bits < 1 || bits > 32) throw new RangeError(`bits must be a whole number from 1 to 32; received ${bits}`);
  return 20 * Math.log10(2 ** bits) + 10 * Math.log10(1.5);
}
