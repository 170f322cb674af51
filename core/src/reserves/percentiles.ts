import { mean as ssMean, quantileSorted, standardDeviation } from 'simple-statistics';

/**
 * PRMS percentile convention (SPE/WPC/AAPG/SPEE/SEG/SPWLA/EAGE 2018, Petroleum Resources
 * Management System): P90 is the value exceeded with 90% probability (the 10th percentile,
 * the low estimate), P50 the median, P10 the value exceeded with 10% probability (the 90th
 * percentile, the high estimate). So P90 <= P50 <= P10.
 */
export const PRMS_CONVENTION =
  'P90 is the value exceeded with 90% probability (10th percentile, low estimate); P50 the median; ' +
  'P10 the value exceeded with 10% probability (90th percentile, high estimate) (SPE-PRMS 2018).';

/** Summary statistics of Monte Carlo output in the PRMS convention. */
export interface PrmsSummary {
  /** 10th percentile (exceeded with 90% probability). */
  p90: number;
  p50: number;
  /** 90th percentile (exceeded with 10% probability). */
  p10: number;
  mean: number;
  /** Population standard deviation of the samples. */
  sd: number;
  min: number;
  max: number;
  /** Samples used (finite). */
  count: number;
  /** Samples skipped as NaN (missing). */
  missing: number;
}

/** Finite samples copied and sorted ascending, and the number of NaN skipped. (Internal.) */
export function sortFinite(samples: Float64Array | readonly number[]): { sorted: Float64Array; missing: number } {
  const n = samples.length;
  const out = new Float64Array(n);
  let k = 0;
  for (let i = 0; i < n; i++) {
    const v = samples[i];
    if (!Number.isNaN(v)) out[k++] = v;
  }
  const sorted = k === n ? out : out.slice(0, k);
  sorted.sort();
  return { sorted, missing: n - k };
}

/** {@link percentilesPrms} on data already sorted by {@link sortFinite}. (Internal.) */
export function percentilesFromSorted(sorted: Float64Array, missing: number): PrmsSummary {
  if (sorted.length === 0) throw new RangeError('percentilesPrms: samples has no finite value');
  const xs = sorted as unknown as readonly number[];
  return {
    p90: quantileSorted(xs, 0.1),
    p50: quantileSorted(xs, 0.5),
    p10: quantileSorted(xs, 0.9),
    mean: ssMean(xs),
    sd: sorted.length > 1 ? standardDeviation(xs) : 0,
    min: sorted[0],
    max: sorted[sorted.length - 1],
    count: sorted.length,
    missing,
  };
}

/**
 * P90, P50, P10 (PRMS 2018 exceedance convention, see {@link PRMS_CONVENTION}), mean and
 * standard deviation of Monte Carlo samples. Quantiles by simple-statistics `quantileSorted`
 * (linear interpolation between order statistics, Hyndman & Fan 1996 type 7); mean by its
 * compensated sum. NaN samples are skipped and counted in `missing`.
 *
 * @throws RangeError('percentilesPrms: samples has no finite value')
 * @example percentilesPrms([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]) // { p90: 2, p50: 6, p10: 10, ... }
 */
export function percentilesPrms(samples: Float64Array | readonly number[]): PrmsSummary {
  const { sorted, missing } = sortFinite(samples);
  return percentilesFromSorted(sorted, missing);
}

/** Points of an exceedance ("probability greater than") curve, for the cumulative plot. */
export interface ExceedanceCurve {
  /** Probability that the outcome exceeds `value[i]`, from 1 down to 0. */
  exceedance: Float64Array;
  /** Outcome values, ascending: value[i] is the quantile at 1 - exceedance[i]. */
  value: Float64Array;
}

/** {@link exceedanceCurve} on sorted data. (Internal.) */
export function exceedanceFromSorted(sorted: Float64Array, points: number): ExceedanceCurve {
  if (sorted.length === 0) throw new RangeError('exceedanceCurve: samples has no finite value');
  const exceedance = new Float64Array(points);
  const value = new Float64Array(points);
  const xs = sorted as unknown as readonly number[];
  for (let i = 0; i < points; i++) {
    const p = i / (points - 1);
    exceedance[i] = 1 - p;
    value[i] = quantileSorted(xs, p);
  }
  return { exceedance, value };
}

/**
 * Exceedance curve of Monte Carlo samples: for `points` evenly spaced cumulative probabilities
 * p = 0 .. 1, the value (type-7 quantile) and the probability 1 - p of exceeding it. Reading the
 * curve at exceedance 0.9 gives P90. NaN samples are skipped.
 *
 * @param points number of points, integer >= 2 (default 101, every percent)
 * @throws RangeError('exceedanceCurve: points must be an integer >= 2')
 */
export function exceedanceCurve(samples: Float64Array | readonly number[], points = 101): ExceedanceCurve {
  if (!Number.isInteger(points) || points < 2) throw new RangeError(`exceedanceCurve: points must be an integer >= 2 (got ${points})`);
  return exceedanceFromSorted(sortFinite(samples).sorted, points);
}
