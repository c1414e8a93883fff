/**
 * Input checks shared by the calculators and the acoustics helpers. Each throws a `RangeError` whose message names
 * the argument, the value received and what is expected, so a caller can fix the input without reading the code.
 */

/** Throws unless `value` is a finite number greater than zero. */
export function requirePositive(name: string, value: number, unit: string): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number greater than 0 ${unit}; got ${String(value)}.`);
  }
  return value;
}

/** Throws unless `value` is a finite number greater than or equal to zero. */
export function requireNonNegative(name: string, value: number, unit: string): number {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be a finite number of at least 0 ${unit}; got ${String(value)}.`);
  }
  return value;
}

/** Throws unless `value` is a finite number (any sign). */
export function requireFinite(name: string, value: number, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number (${unit}); got ${String(value)}.`);
  }
  return value;
}

/** Throws unless `value` is a finite fraction in [0, 1) — a relative tolerance such as 0.01 for 1 %. */
export function requireFraction(name: string, value: number): number {
  if (!Number.isFinite(value) || value < 0 || value >= 1) {
    throw new RangeError(
      `${name} must be a relative tolerance from 0 up to (not including) 1, e.g. 0.01 for 1 %; got ${String(value)}.`,
    );
  }
  return value;
}
