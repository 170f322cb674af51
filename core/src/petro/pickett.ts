/**
 * Pickett plot fit: in a water-bearing interval (Sw = 1) Archie gives
 * log10(Rt) = log10(a Rw) - m log10(phi), a straight line on log-log axes.
 * Source: Pickett, G.R. (1966) A review of current techniques for determination of water
 * saturation from logs. JPT 18(11) // from memory; Asquith & Krygowski (2004) ch. 7.
 */
import { type CurveInput, sameLength } from './curve-util.js';

export interface PickettFit {
  /** Cementation exponent: minus the slope of log10(Rt) on log10(phi). */
  m: number;
  /** a * Rw (ohm.m): 10^intercept, the resistivity read at phi = 1. */
  aRw: number;
  /** Coefficient of determination of the log-log regression. */
  r2: number;
  /** Samples used (finite, phi > 0, rt > 0). */
  count: number;
}

/**
 * Least-squares regression of log10(Rt) on log10(phi) over samples [start, end) (default
 * all). Samples with NaN, phi <= 0 or rt <= 0 are skipped.
 * Throws RangeError when fewer than 3 usable samples remain or porosity does not vary.
 * @example pickettFit(phi, rt).aRw / a // Rw at the interval's temperature
 */
export function pickettFit(phi: CurveInput, rt: CurveInput, start = 0, end = Infinity): PickettFit {
  const fn = 'pickettFit';
  const n = sameLength(fn, { phi, rt });
  let sx = 0, sy = 0, sxx = 0, sxy = 0, syy = 0, k = 0;
  for (let i = Math.max(0, start); i < Math.min(end, n); i++) {
    const p = phi[i], r = rt[i];
    if (!(p > 0) || !(r > 0) || !Number.isFinite(p) || !Number.isFinite(r)) continue;
    const x = Math.log10(p), y = Math.log10(r);
    sx += x; sy += y; sxx += x * x; sxy += x * y; syy += y * y; k++;
  }
  if (k < 3) throw new RangeError(`${fn}: fewer than 3 samples with phi > 0 and rt > 0`);
  const vx = sxx - (sx * sx) / k;
  const vy = syy - (sy * sy) / k;
  if (!(vx > 1e-12 * k)) throw new RangeError(`${fn}: porosity does not vary over the interval`);
  const cxy = sxy - (sx * sy) / k;
  const slope = cxy / vx;
  const intercept = (sy - slope * sx) / k;
  return { m: -slope, aRw: Math.pow(10, intercept), r2: vy > 0 ? (cxy * cxy) / (vx * vy) : 1, count: k };
}
