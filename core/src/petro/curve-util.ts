/**
 * Small helpers shared by the array forms of the petrophysics functions (internal, not
 * exported from the package): output allocation and length checks.
 */
export type CurveInput = Float64Array | readonly number[];

/** Returns `output` when given (checked for length) or a new Float64Array of length n. */
export function outputFor(fn: string, n: number, output?: Float64Array): Float64Array {
  if (output === undefined) return new Float64Array(n);
  if (output.length !== n) throw new RangeError(`${fn}: output has ${output.length} samples, expected ${n}`);
  return output;
}

/** Throws RangeError unless every curve has the length of the first one. */
export function sameLength(fn: string, curves: Record<string, CurveInput | number | undefined>): number {
  let n = -1;
  for (const [name, c] of Object.entries(curves)) {
    if (c === undefined || typeof c === 'number') continue;
    if (n < 0) n = c.length;
    else if (c.length !== n) throw new RangeError(`${fn}: ${name} has ${c.length} samples, expected ${n}`);
  }
  return Math.max(n, 0);
}

/** Value of a per-sample-or-constant parameter at index i. */
export function at(p: number | CurveInput, i: number): number {
  return typeof p === 'number' ? p : p[i];
}

/** Throws RangeError(`${fn}: ${field} must be a finite number`) unless x is finite. */
export function requireFinite(fn: string, field: string, x: number): void {
  if (!Number.isFinite(x)) throw new RangeError(`${fn}: ${field} must be a finite number`);
}

/** Throws RangeError(`${fn}: ${field} must be > 0`) unless x is finite and positive. */
export function requirePositive(fn: string, field: string, x: number): void {
  if (!(x > 0) || !Number.isFinite(x)) throw new RangeError(`${fn}: ${field} must be > 0`);
}
