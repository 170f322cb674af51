/**
 * Input checks shared by the reserves functions (internal, not exported from the package).
 * Each throws a RangeError naming the calling function and the field.
 */

/** Throws unless `value` is a finite number. */
export function requireFinite(fn: string, field: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${fn}: ${field} must be a finite number (got ${String(value)})`);
  }
}

/** Throws unless `value` is finite and > 0. */
export function requirePositive(fn: string, field: string, value: number): void {
  requireFinite(fn, field, value);
  if (!(value > 0)) throw new RangeError(`${fn}: ${field} must be > 0 (got ${value})`);
}

/** Throws unless `value` is finite and >= 0. */
export function requireNonNegative(fn: string, field: string, value: number): void {
  requireFinite(fn, field, value);
  if (!(value >= 0)) throw new RangeError(`${fn}: ${field} must be >= 0 (got ${value})`);
}

/** Throws unless `lo <= value <= hi` (finite). */
export function requireInRange(fn: string, field: string, value: number, lo: number, hi: number): void {
  requireFinite(fn, field, value);
  if (value < lo || value > hi) {
    throw new RangeError(`${fn}: ${field} must be in [${lo}, ${hi}] (got ${value})`);
  }
}

/** Throws unless `value` is a fraction in [0, 1]. */
export function requireFraction(fn: string, field: string, value: number): void {
  requireInRange(fn, field, value, 0, 1);
}

/**
 * Per-sample check: NaN passes (missing value policy), anything else must lie in [lo, hi]
 * (use `loExclusive` for a strict lower bound, e.g. Bo > 0).
 */
export function checkSample(fn: string, field: string, value: number, lo: number, hi: number, loExclusive = false): void {
  if (Number.isNaN(value)) return;
  const bad = typeof value !== 'number' || !Number.isFinite(value) || value > hi || (loExclusive ? value <= lo : value < lo);
  if (bad) {
    const range = `${loExclusive ? '(' : '['}${lo}, ${hi}]`;
    throw new RangeError(`${fn}: ${field} must be in ${range} (got ${String(value)})`);
  }
}
