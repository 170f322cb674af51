/**
 * Standard normal distribution: cumulative probability and quantile (inverse CDF), used to
 * sample normal and lognormal inputs by inversion, to truncate them, and to convert a
 * lognormal's P90/P10 to its parameters.
 */

const SQRT_PI = Math.sqrt(Math.PI);
const SQRT_2PI = Math.sqrt(2 * Math.PI);

/**
 * Complementary error function erfc(x) = 1 - erf(x), to about 1e-15 relative for x < 3 and
 * 1e-14 relative in the tail. For |x| < 3 the all-positive series
 * erf(x) = (2/sqrt(pi)) exp(-x^2) sum 2^n x^(2n+1) / (1*3*...*(2n+1)) (Abramowitz & Stegun 1964,
 * eq. 7.1.6); for x >= 3 the continued fraction (A&S eq. 7.1.14), evaluated backwards.
 */
export function erfc(x: number): number {
  if (Number.isNaN(x)) return NaN;
  if (x < 0) return 2 - erfc(-x);
  if (x < 3) {
    const x2 = x * x;
    let term = x;
    let sum = x;
    for (let n = 1; n < 200; n++) {
      term *= (2 * x2) / (2 * n + 1);
      sum += term;
      if (term < 1e-17 * sum) break;
    }
    return 1 - ((2 / SQRT_PI) * Math.exp(-x2) * sum);
  }
  if (x > 27) return 0; // below the smallest double
  let t = x;
  for (let k = 80; k >= 1; k--) t = x + k / 2 / t;
  return Math.exp(-x * x) / SQRT_PI / t;
}

/**
 * Standard normal cumulative probability Phi(x) = erfc(-x / sqrt(2)) / 2.
 *
 * @param x standard score (NaN passes through)
 * @returns probability in [0, 1]
 * @example normalCdf(1.2815515655446004) // 0.9
 */
export function normalCdf(x: number): number {
  return 0.5 * erfc(-x / Math.SQRT2);
}

// Acklam, P.J. (2003) An algorithm for computing the inverse normal cumulative distribution
// function (rational approximations, relative error < 1.15e-9). Coefficients from memory,
// checked in normal.test.ts against tabulated quantiles.
const A = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
const B = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
const C = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const D = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
const P_LOW = 0.02425;

/**
 * Fast standard normal quantile (Acklam 2003 rational approximation, relative error < 1.15e-9),
 * used per Monte Carlo draw where that error is far below sampling noise.
 * p = 0 gives -Infinity, p = 1 gives +Infinity; p outside [0, 1] or NaN gives NaN.
 */
export function normalQuantileFast(p: number): number {
  if (!(p > 0 && p < 1)) return p === 0 ? -Infinity : p === 1 ? Infinity : NaN;
  if (p < P_LOW) {
    const q = Math.sqrt(-2 * Math.log(p));
    return (((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  }
  if (p <= 1 - P_LOW) {
    const q = p - 0.5;
    const r = q * q;
    return (
      ((((((A[0] * r + A[1]) * r + A[2]) * r + A[3]) * r + A[4]) * r + A[5]) * q) /
      (((((B[0] * r + B[1]) * r + B[2]) * r + B[3]) * r + B[4]) * r + 1)
    );
  }
  const q = Math.sqrt(-2 * Math.log(1 - p));
  return -(((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
}

/**
 * Standard normal quantile z(p), the inverse of {@link normalCdf}, to about 1e-15: Acklam's
 * (2003) approximation refined by one Halley step on Phi(z) - p (Acklam's own refinement).
 *
 * @param p probability in [0, 1]; 0 and 1 give -Infinity and +Infinity
 * @throws RangeError('normalQuantile: p must be in [0, 1] ...')
 * @example normalQuantile(0.9) // 1.2815515655446004
 */
export function normalQuantile(p: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`normalQuantile: p must be in [0, 1] (got ${p})`);
  const x = normalQuantileFast(p);
  if (!Number.isFinite(x)) return x;
  const e = normalCdf(x) - p;
  const u = e * SQRT_2PI * Math.exp((x * x) / 2);
  return x - u / (1 + (x * u) / 2);
}

/** z(0.9) = 1.2815515655446004: the standard score of P10 (and minus that of P90). */
export const Z_P10 = 1.2815515655446004;
