/**
 * Bulk volume water: the fraction of the rock volume filled by water, BVW = phi * Sw.
 * Source: Buckles, R.S. (1965) J. Can. Pet. Technol. 4(1); Asquith & Krygowski (2004) ch. 7.
 * A zone at irreducible water saturation shows a near-constant BVW.
 */
import { type CurveInput, outputFor, sameLength } from './curve-util.js';

/** BVW = phi * Sw (v/v of rock). @example bulkVolumeWater(0.25, 0.4) // 0.1 */
export function bulkVolumeWater(phi: number, sw: number): number {
  return phi * sw;
}

/** Array form of {@link bulkVolumeWater}. Throws RangeError on unequal lengths. */
export function bulkVolumeWaterCurve(phi: CurveInput, sw: CurveInput, output?: Float64Array): Float64Array {
  const fn = 'bulkVolumeWaterCurve';
  const n = sameLength(fn, { phi, sw });
  const out = outputFor(fn, n, output);
  for (let i = 0; i < n; i++) out[i] = phi[i] * sw[i];
  return out;
}
