/**
 * Number parsing for LAS data and header values.
 *
 * The byte scanner parses plain decimals itself (sign, digits, point, exponent) and keeps the
 * result exact: with a mantissa of at most 2^53 and a power of ten within 10^±22, the
 * mantissa and the power are both exact doubles, so one IEEE multiplication or division
 * gives the correctly rounded value (Clinger, W.D. (1990) How to read floating point numbers
 * accurately, PLDI '90, the "fast path"). Anything else goes through {@link parseNumberText}.
 */

/** Exact powers of ten 10^0 .. 10^22 (all exactly representable as doubles). */
export const POW10: Float64Array = (() => {
  const p = new Float64Array(23);
  let v = 1;
  for (let i = 0; i < 23; i++) {
    p[i] = v;
    v *= 10;
  }
  return p;
})();

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eEdD][+-]?\d+)?$/;

/**
 * Parses a decimal number as written in LAS files: optional sign, digits with an optional
 * point, optional exponent `e`/`E` (and the Fortran `d`/`D`). Returns NaN for anything else
 * ('', 'null', '1.#IND', '0x10', 'Infinity'). Values beyond the double range come back as
 * ±Infinity, which callers treat as out of range.
 *
 * @example parseNumberText('-999.2500') // -999.25
 * @example parseNumberText('1.5D+02')   // 150
 */
export function parseNumberText(text: string): number {
  const s = text.trim();
  if (!DECIMAL.test(s)) return Number.NaN;
  return Number(s.replace(/[dD]/, 'e'));
}
