/**
 * Deterministic randomness for quizzes: the same seed gives the same option order and the
 * same generated numbers, so a server can re-derive what a learner saw from the attempt seed
 * alone and never has to trust values sent back by the browser.
 */
import "@/lib/validation/zod-in-browser";
import { z } from "zod";

/**
 * mulberry32: a small 32-bit-state generator, uniform in [0, 1). Widely used for seeded,
 * non-cryptographic randomness in JavaScript (common practice). Not for secrets.
 */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** 32-bit FNV-1a hash of a string (common practice), used to derive per-question seeds. */
export function fnv1a32(text: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193);
  }
  return hash >>> 0;
}

/**
 * One attempt seed feeds many independent streams: per question and per purpose
 * ("shuffle", "variant"), so reshuffling options never changes a question's numbers.
 */
export function deriveSeed(attemptSeed: number, questionId: string, purpose: string): number {
  return fnv1a32(`${attemptSeed >>> 0}:${purpose}:${questionId}`);
}

/** Fisher–Yates shuffle driven by a seed (common practice); returns a new array. */
export function seededShuffle<T>(items: readonly T[], seed: number): T[] {
  const random = mulberry32(seed);
  const result = items.slice();
  for (let i = result.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    const kept = result[i];
    result[i] = result[j];
    result[j] = kept;
  }
  return result;
}

/** A grid of allowed values min, min+step, …, ≤ max (in the input's own unit). */
export const inputRangeSchema = z
  .object({
    min: z.number(),
    max: z.number(),
    step: z.number().positive(),
  })
  .refine((range) => range.max >= range.min, { message: "max must be ≥ min" })
  .refine((range) => (range.max - range.min) / range.step <= 1_000_000, {
    message: "range has more than a million steps",
  });

export type InputRange = z.infer<typeof inputRangeSchema>;

/** Number of decimals needed to write a number exactly as it was typed (0.05 → 2, 1e-3 → 3). */
export function decimalsOf(value: number): number {
  const text = String(value);
  const exponent = text.match(/e-(\d+)$/);
  if (exponent) {
    const mantissa = text.slice(0, text.indexOf("e"));
    const dot = mantissa.indexOf(".");
    return Number(exponent[1]) + (dot < 0 ? 0 : mantissa.length - dot - 1);
  }
  const dot = text.indexOf(".");
  return dot < 0 ? 0 : text.length - dot - 1;
}

/** Decimals that show every value of a range's grid without float noise. */
export function rangeDecimals(range: InputRange): number {
  return Math.min(12, Math.max(decimalsOf(range.step), decimalsOf(range.min)));
}

/** Number of grid points of a range (tolerates float error in (max − min)/step). */
export function rangeStepCount(range: InputRange): number {
  return Math.floor((range.max - range.min) / range.step + 1e-9) + 1;
}

/**
 * Draws one value per named input, uniformly over each range's grid. Names are visited in
 * sorted order so the result depends only on the seed and the ranges, not on key order.
 */
export function drawInputs(seed: number, ranges: Readonly<Record<string, InputRange>>): Record<string, number> {
  const random = mulberry32(seed);
  const values: Record<string, number> = {};
  for (const name of Object.keys(ranges).sort()) {
    const range = ranges[name];
    const index = Math.floor(random() * rangeStepCount(range));
    const raw = range.min + index * range.step;
    values[name] = Number(Math.min(raw, range.max).toFixed(rangeDecimals(range)));
  }
  return values;
}
