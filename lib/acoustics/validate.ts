/**
 * Input guards shared by the acoustics library.
 *
 * The library is pure math: it does not parse or coerce input. It only refuses
 * values that have no physical meaning (a negative distance, a zero distance
 * that would be divided by, a pattern coefficient outside [0, 1]) by throwing a
 * RangeError whose message names the argument, its unit and the value received.
 */

/** Throws unless `value` is a finite number (rejects NaN and ±Infinity). */
export function requireFinite(name: string, value: number): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number; received ${String(value)}`);
  }
  return value;
}

/** Throws unless `value` is finite and strictly greater than zero. */
export function requirePositive(name: string, value: number): number {
  requireFinite(name, value);
  if (value <= 0) {
    throw new RangeError(`${name} must be greater than zero; received ${value}`);
  }
  return value;
}

/** Throws unless `value` is finite and zero or greater. */
export function requireNonNegative(name: string, value: number): number {
  requireFinite(name, value);
  if (value < 0) {
    throw new RangeError(`${name} must not be negative; received ${value}`);
  }
  return value;
}

/** Throws unless `value` is finite and within [0, 1] (inclusive). */
export function requireUnitInterval(name: string, value: number): number {
  requireFinite(name, value);
  if (value < 0 || value > 1) {
    throw new RangeError(`${name} must be between 0 and 1 inclusive; received ${value}`);
  }
  return value;
}

/** Throws unless `value` is an integer of at least `minimum`. */
export function requireIntegerAtLeast(name: string, value: number, minimum: number): number {
  requireFinite(name, value);
  if (!Number.isInteger(value) || value < minimum) {
    throw new RangeError(`${name} must be a whole number of at least ${minimum}; received ${value}`);
  }
  return value;
}

/** Throws unless `value` is the pattern coefficient A of r(θ) = A + (1 − A)·cos θ, i.e. in [0, 1]. */
export function requirePatternCoefficient(value: number): number {
  return requireUnitInterval("a (pattern coefficient A of A + (1 − A)·cos θ)", value);
}
