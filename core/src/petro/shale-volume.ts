/**
 * Shale volume (Vsh, v/v) from the gamma-ray log: the gamma-ray index and the published
 * non-linear transforms of it.
 *
 * Convention (stated in EVALUATION_CONVENTIONS): the gamma-ray index is clipped to [0, 1]
 * before any transform, so every method returns Vsh in [0, 1] (Clavier's root would go
 * negative above an index of about 1.14, and Larionov would exceed 1).
 */
import { type CurveInput, outputFor, requireFinite } from './curve-util.js';

export type VshMethod = 'linear' | 'larionov_tertiary' | 'larionov_older' | 'steiber' | 'clavier';

export const VSH_METHODS: readonly VshMethod[] = ['linear', 'larionov_tertiary', 'larionov_older', 'steiber', 'clavier'];

/**
 * Gamma-ray index, clipped to [0, 1].
 *
 * IGR = (GR - GRclean) / (GRshale - GRclean), then min(max(IGR, 0), 1).
 * Source: Asquith & Krygowski (2004) Basic Well Log Analysis, 2nd ed., ch. 3 (gamma ray).
 * Units: gAPI for all three. NaN GR gives NaN. No argument checks (per-sample kernel; the
 * array form {@link shaleVolume} checks GRclean < GRshale).
 * @example gammaRayIndex(60, 20, 120) // 0.4
 */
export function gammaRayIndex(gr: number, grClean: number, grShale: number): number {
  const igr = (gr - grClean) / (grShale - grClean);
  return igr < 0 ? 0 : igr > 1 ? 1 : igr;
}

/** Larionov (1969) for Tertiary (unconsolidated) rocks: Vsh = 0.083 (2^(3.7 IGR) - 1). IGR in [0, 1]. */
export function larionovTertiary(igr: number): number {
  return 0.083 * (Math.exp(3.7 * Math.LN2 * igr) - 1);
}

/** Larionov (1969) for older (pre-Tertiary, consolidated) rocks: Vsh = 0.33 (2^(2 IGR) - 1). IGR in [0, 1]. */
export function larionovOlder(igr: number): number {
  return 0.33 * (Math.exp(2 * Math.LN2 * igr) - 1);
}

/** Steiber (1970, SPE 2961): Vsh = IGR / (3 - 2 IGR). IGR in [0, 1]. */
export function steiber(igr: number): number {
  return igr / (3 - 2 * igr);
}

/**
 * Clavier, Hoyle & Meunier (1971, JPT 23(6)): Vsh = 1.7 - sqrt(3.38 - (IGR + 0.7)^2).
 * IGR in [0, 1] (the root is real up to IGR of about 1.14).
 */
export function clavier(igr: number): number {
  const t = igr + 0.7;
  return 1.7 - Math.sqrt(3.38 - t * t);
}

/**
 * Shale volume from a (clipped) gamma-ray index by the named method (per-sample kernel).
 * The result is clipped to [0, 1] (Larionov tertiary gives 0.9957 at IGR = 1, older 0.99;
 * Clavier's rounded constants give 1 - 1e-16): clipping only guards rounding.
 * @example vshFromIndex('steiber', 0.5) // 0.25
 */
export function vshFromIndex(method: VshMethod, igr: number): number {
  let v: number;
  switch (method) {
    case 'linear':
      v = igr;
      break;
    case 'larionov_tertiary':
      v = larionovTertiary(igr);
      break;
    case 'larionov_older':
      v = larionovOlder(igr);
      break;
    case 'steiber':
      v = steiber(igr);
      break;
    case 'clavier':
      v = clavier(igr);
      break;
    default:
      throw new RangeError(`vshFromIndex: unknown method '${method as string}'`);
  }
  return v < 0 ? 0 : v > 1 ? 1 : v;
}

export interface ShaleVolumeParams {
  method: VshMethod;
  /** GR reading in clean (shale-free) rock, gAPI. */
  grClean: number;
  /** GR reading in 100% shale, gAPI; must be greater than grClean. */
  grShale: number;
}

/**
 * Shale volume curve from a gamma-ray curve: the index clipped to [0, 1], then the method.
 *
 * Sources: linear index, Larionov (1969) Borehole Radiometry (tertiary and older rocks),
 * Steiber (1970) SPE 2961, Clavier et al. (1971) JPT 23(6); forms as printed in Asquith &
 * Krygowski (2004) ch. 3. Units: gAPI in, v/v out. NaN GR gives NaN.
 * Throws RangeError naming the field when grClean/grShale are not finite or grShale <= grClean,
 * or the method is unknown.
 * @example shaleVolume([20, 70, 120], { method: 'linear', grClean: 20, grShale: 120 }) // [0, 0.5, 1]
 */
export function shaleVolume(gr: CurveInput, params: ShaleVolumeParams, output?: Float64Array): Float64Array {
  const fn = 'shaleVolume';
  requireFinite(fn, 'grClean', params.grClean);
  requireFinite(fn, 'grShale', params.grShale);
  if (!(params.grShale > params.grClean)) throw new RangeError(`${fn}: grShale must be > grClean`);
  if (!VSH_METHODS.includes(params.method)) throw new RangeError(`${fn}: unknown method '${params.method as string}'`);
  const out = outputFor(fn, gr.length, output);
  for (let i = 0; i < gr.length; i++) {
    const g = gr[i];
    out[i] = g === g ? vshFromIndex(params.method, gammaRayIndex(g, params.grClean, params.grShale)) : NaN;
  }
  return out;
}

/**
 * GR clean and GR shale picked as percentiles of the finite GR values in [start, end).
 * Percentiles by linear interpolation between order statistics (Hyndman & Fan 1996, type 7).
 * Throws RangeError when percentiles are outside [0, 100], pClean >= pShale, fewer than 2
 * finite values are present, or the picked values are equal.
 * @example gammaRayPercentiles(gr, 0, gr.length, 5, 95) // { grClean, grShale }
 */
export function gammaRayPercentiles(
  gr: CurveInput,
  start: number,
  end: number,
  pClean: number,
  pShale: number,
): { grClean: number; grShale: number } {
  const fn = 'gammaRayPercentiles';
  if (!(pClean >= 0 && pClean <= 100)) throw new RangeError(`${fn}: grCleanPercentile must be in [0, 100]`);
  if (!(pShale >= 0 && pShale <= 100)) throw new RangeError(`${fn}: grShalePercentile must be in [0, 100]`);
  if (!(pClean < pShale)) throw new RangeError(`${fn}: grCleanPercentile must be < grShalePercentile`);
  const [grClean, grShale] = percentilesOf(gr, start, end, [pClean, pShale], 'GR');
  if (!(grShale > grClean)) throw new RangeError(`${fn}: GR percentiles are equal (${grClean} gAPI); no GR contrast in the interval`);
  return { grClean, grShale };
}

/**
 * Percentiles (0-100) of the finite values in [start, end), by linear interpolation between
 * order statistics (Hyndman & Fan 1996, type 7). `label` names the curve in errors.
 * Throws RangeError when fewer than 2 finite values are present.
 * @example percentilesOf([1, 2, 3, 4, 5], 0, 5, [25, 50]) // [2, 3]
 */
export function percentilesOf(values: CurveInput, start: number, end: number, ps: readonly number[], label = 'curve'): number[] {
  const vals: number[] = [];
  for (let i = Math.max(0, start); i < Math.min(end, values.length); i++) if (Number.isFinite(values[i])) vals.push(values[i]);
  if (vals.length < 2) throw new RangeError(`percentilesOf: fewer than 2 finite ${label} samples in the interval`);
  const sorted = Float64Array.from(vals).sort();
  return ps.map((p) => {
    const h = (sorted.length - 1) * (p / 100);
    const lo = Math.floor(h);
    const hi = Math.min(lo + 1, sorted.length - 1);
    return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
  });
}
