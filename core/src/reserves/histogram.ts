/** Histogram of samples in equal-width bins. */
export interface Histogram {
  /** Bin edges, length bins + 1, ascending. */
  edges: Float64Array;
  /** Samples per bin (the last bin includes its upper edge). */
  counts: Float64Array;
  /** counts / (total counted x bin width): a probability density, integrates to 1. */
  density: Float64Array;
  /** Samples below the first edge or above the last (when min/max are given). */
  outside: number;
  /** NaN samples skipped. */
  missing: number;
}

/** Options of {@link histogram}. */
export interface HistogramOptions {
  /** Number of bins, integer >= 1 (default 40). */
  bins?: number;
  /** Lower edge; default the smallest sample. */
  min?: number;
  /** Upper edge; default the largest sample. */
  max?: number;
}

/**
 * Equal-width histogram: bin i holds edges[i] <= x < edges[i+1], the last bin also x = max.
 * NaN samples are skipped and counted; samples outside [min, max] are counted in `outside`.
 * When every sample is equal, one bin of width 1 centred on the value is used.
 *
 * @throws RangeError('histogram: bins must be an integer >= 1'), ('histogram: max must be > min'),
 *   ('histogram: samples has no finite value')
 * @example histogram([1, 2, 2, 3], { bins: 2 }).counts // [1, 3]
 */
export function histogram(samples: Float64Array | readonly number[], options: HistogramOptions | number = {}): Histogram {
  const opts = typeof options === 'number' ? { bins: options } : options;
  const bins = opts.bins ?? 40;
  if (!Number.isInteger(bins) || bins < 1) throw new RangeError(`histogram: bins must be an integer >= 1 (got ${bins})`);
  const n = samples.length;
  let lo = Infinity;
  let hi = -Infinity;
  let missing = 0;
  for (let i = 0; i < n; i++) {
    const v = samples[i];
    if (Number.isNaN(v)) {
      missing++;
      continue;
    }
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (missing === n) throw new RangeError('histogram: samples has no finite value');
  if (opts.min !== undefined) lo = opts.min;
  if (opts.max !== undefined) hi = opts.max;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || hi < lo) throw new RangeError(`histogram: max must be > min (got ${lo}, ${hi})`);
  let nb = bins;
  if (hi === lo) {
    lo -= 0.5;
    hi += 0.5;
    nb = 1;
  }
  const width = (hi - lo) / nb;
  const edges = new Float64Array(nb + 1);
  for (let i = 0; i <= nb; i++) edges[i] = lo + i * width;
  edges[nb] = hi;
  const counts = new Float64Array(nb);
  let outside = 0;
  for (let i = 0; i < n; i++) {
    const v = samples[i];
    if (Number.isNaN(v)) continue;
    if (v < lo || v > hi) {
      outside++;
      continue;
    }
    let k = Math.floor((v - lo) / width);
    if (k >= nb) k = nb - 1;
    counts[k]++;
  }
  const counted = n - missing - outside;
  const density = new Float64Array(nb);
  if (counted > 0) for (let i = 0; i < nb; i++) density[i] = counts[i] / (counted * width);
  return { edges, counts, density, outside, missing };
}
