import { mean as ssMean, quantile, standardDeviation } from 'simple-statistics';

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

/** Finite samples copied (NaN removed) and the number of NaN skipped. (Internal.) */
export function finiteCopy(samples: Float64Array | readonly number[]): { finite: Float64Array; missing: number } {
  const n = samples.length;
  const out = new Float64Array(n);
  let k = 0;
  for (let i = 0; i < n; i++) {
    const v = samples[i];
    if (!Number.isNaN(v)) out[k++] = v;
  }
  return { finite: k === n ? out : out.slice(0, k), missing: n - k };
}

/**
 * Several type-7 quantiles at once by simple-statistics `quantile(x, p[])` (multi-quickselect on
 * a copy, O(n log k), no full sort). (Internal.)
 */
export function quantilesOf(finite: Float64Array, probs: readonly number[]): number[] {
  return quantile(finite as unknown as number[], probs as number[]) as number[];
}

/** {@link percentilesPrms} of finite samples, given their P90/P50/P10. (Internal.) */
export function summaryFrom(finite: Float64Array, missing: number, p90: number, p50: number, p10: number): PrmsSummary {
  const xs = finite as unknown as readonly number[];
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < finite.length; i++) {
    const v = finite[i];
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return {
    p90,
    p50,
    p10,
    mean: ssMean(xs),
    sd: finite.length > 1 ? standardDeviation(xs) : 0,
    min,
    max,
    count: finite.length,
    missing,
  };
}

/**
 * P90, P50, P10 (PRMS 2018 exceedance convention, see {@link PRMS_CONVENTION}), mean and
 * standard deviation of Monte Carlo samples. Quantiles by simple-statistics `quantile`
 * (linear interpolation between order statistics, Hyndman & Fan 1996 type 7, found by
 * quickselect); mean by its compensated sum. NaN samples are skipped and counted in `missing`.
 *
 * @throws RangeError('percentilesPrms: samples has no finite value')
 * @example percentilesPrms([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]) // { p90: 2, p50: 6, p10: 10, ... }
 */
export function percentilesPrms(samples: Float64Array | readonly number[]): PrmsSummary {
  const { finite, missing } = finiteCopy(samples);
  if (finite.length === 0) throw new RangeError('percentilesPrms: samples has no finite value');
  const [p90, p50, p10] = quantilesOf(finite, [0.1, 0.5, 0.9]);
  return summaryFrom(finite, missing, p90, p50, p10);
}

/** Points of an exceedance ("probability greater than") curve, for the cumulative plot. */
export interface ExceedanceCurve {
  /** Probability that the outcome exceeds `value[i]`, from 1 down to 0. */
  exceedance: Float64Array;
  /** Outcome values, ascending: value[i] is the quantile at 1 - exceedance[i]. */
  value: Float64Array;
}

/** Cumulative probabilities 0, 1/(points-1), ..., 1 of an exceedance curve. (Internal.) */
export function exceedanceProbabilities(points: number): number[] {
  return Array.from({ length: points }, (_, i) => i / (points - 1));
}

/** Builds an {@link ExceedanceCurve} from quantiles at {@link exceedanceProbabilities}. (Internal.) */
export function exceedanceFromQuantiles(values: readonly number[]): ExceedanceCurve {
  const points = values.length;
  const exceedance = new Float64Array(points);
  for (let i = 0; i < points; i++) exceedance[i] = 1 - i / (points - 1);
  return { exceedance, value: Float64Array.from(values) };
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
  const { finite } = finiteCopy(samples);
  if (finite.length === 0) throw new RangeError('exceedanceCurve: samples has no finite value');
  return exceedanceFromQuantiles(quantilesOf(finite, exceedanceProbabilities(points)));
}
