/**
 * Merging curves of several log runs onto one depth index, so each evaluation input can come
 * from the run the user chose. Pure: typed arrays in, new typed arrays out.
 */

/** One curve to merge: its run's depth index (already in the target depth unit) and its samples. */
export interface MergeInput {
  depth: Float64Array | readonly number[];
  values: Float64Array | readonly number[];
  /** The run's regular step (sign ignored), or null/undefined to use its median spacing. */
  step?: number | null;
}

export interface MergedCurves {
  /** start + i * step, increasing. */
  depth: Float64Array;
  step: number;
  /** One array per input, same order, same length as `depth`; NaN where the input has no sample. */
  values: Float64Array[];
}

/** Largest merged index accepted (a guard against a nonsense step). */
export const MAX_MERGED_SAMPLES = 5_000_000;

/**
 * The sampling step of a run: |step| when given, else the median of the positive spacings
 * between consecutive finite depths. Throws RangeError when there are fewer than 2 depths.
 *
 * @example runStep([100, 100.5, 101, 101.5]) // 0.5
 */
export function runStep(depth: Float64Array | readonly number[], step?: number | null): number {
  if (step != null && Number.isFinite(step) && step !== 0) return Math.abs(step);
  const finite = Array.from(depth).filter(Number.isFinite).sort((a, b) => a - b);
  const gaps: number[] = [];
  for (let i = 1; i < finite.length; i++) if (finite[i] > finite[i - 1]) gaps.push(finite[i] - finite[i - 1]);
  if (!gaps.length) throw new RangeError('runStep: depth must hold at least 2 distinct finite depths');
  gaps.sort((a, b) => a - b);
  const mid = gaps.length >> 1;
  return gaps.length % 2 ? gaps[mid] : (gaps[mid - 1] + gaps[mid]) / 2;
}

/**
 * Resamples a curve onto `target` by nearest sample: target depth t takes the value of the
 * source sample nearest to t when it lies within `tolerance` of t (the shallower one on a
 * tie), NaN otherwise. Source depths may run either way or be unordered; NaN depths are skipped.
 *
 * @example resampleNearest([0, 1, 2], [10, 11, 12], [0.4, 0.6, 5], 0.5) // [10, 11, NaN]
 */
export function resampleNearest(
  depth: Float64Array | readonly number[],
  values: Float64Array | readonly number[],
  target: Float64Array | readonly number[],
  tolerance: number,
): Float64Array {
  if (depth.length !== values.length) throw new RangeError(`resampleNearest: values has ${values.length} samples, depth ${depth.length}`);
  if (!(tolerance >= 0)) throw new RangeError('resampleNearest: tolerance must be >= 0');
  const order = Array.from({ length: depth.length }, (_, i) => i)
    .filter((i) => Number.isFinite(depth[i]))
    .sort((a, b) => depth[a] - depth[b] || a - b);
  const out = new Float64Array(target.length).fill(NaN);
  let j = 0;
  for (let k = 0; k < target.length; k++) {
    const t = target[k];
    if (!order.length || !Number.isFinite(t)) continue;
    while (j + 1 < order.length && depth[order[j + 1]] <= t) j++;
    let best = order[j];
    const next = order[j + 1];
    if (next !== undefined && Math.abs(depth[next] - t) < Math.abs(depth[best] - t)) best = next;
    if (Math.abs(depth[best] - t) <= tolerance) out[k] = values[best];
  }
  return out;
}

/**
 * Merges curves of several runs: the index spans every input's depth range at the finest
 * step of the inputs (start + i * step, increasing); each curve is resampled by nearest
 * sample within half of the coarser of its own step and the merged step (so a coarser run
 * is held over its own sample interval), NaN outside its run.
 *
 * @throws RangeError when there is no input, an input has fewer than 2 depths, or the index would exceed MAX_MERGED_SAMPLES
 * @example mergeRuns([{ depth: [0, 1, 2], values: [1, 2, 3] }, { depth: [1, 1.5], values: [7, 8] }]).depth // [0, 0.5, 1, 1.5, 2]
 */
export function mergeRuns(inputs: readonly MergeInput[]): MergedCurves {
  if (!inputs.length) throw new RangeError('mergeRuns: inputs must not be empty');
  const steps = inputs.map((c, i) => {
    try {
      return runStep(c.depth, c.step);
    } catch {
      throw new RangeError(`mergeRuns: input ${i} must hold at least 2 distinct finite depths`);
    }
  });
  const step = Math.min(...steps);
  let start = Infinity;
  let end = -Infinity;
  for (const c of inputs) {
    for (const d of c.depth) {
      if (!Number.isFinite(d)) continue;
      if (d < start) start = d;
      if (d > end) end = d;
    }
  }
  // The relative slack keeps the last depth when (end - start) / step is a whole number up to rounding.
  const n = Math.floor((end - start) / step + 1e-6) + 1;
  if (n > MAX_MERGED_SAMPLES) throw new RangeError(`mergeRuns: the merged index would hold ${n} samples (step ${step}), more than ${MAX_MERGED_SAMPLES}`);
  const depth = new Float64Array(n);
  for (let i = 0; i < n; i++) depth[i] = start + i * step;
  const values = inputs.map((c, i) => resampleNearest(c.depth, c.values, depth, (Math.max(steps[i], step) / 2) * (1 + 1e-9)));
  return { depth, step, values };
}

/**
 * Splices a bound curve with the same kind of curve from other runs: where the primary run
 * has no sample because the depth lies outside its logged interval [primaryTop, primaryBase],
 * the first fallback (in the order given) with a value there supplies it. Null runs inside
 * the primary interval stay null (they are the primary run's own gaps, shown in the curve
 * check). Returns the spliced curve and, per fallback, how many samples it supplied.
 *
 * @example spliceOutside([0,1,2,3], [NaN, 5, 6, NaN], 1, 2, [[9, 9, 9, 9]]) // values [9, 5, 6, 9], used [2]
 */
export function spliceOutside(
  depth: Float64Array | readonly number[],
  primary: Float64Array | readonly number[],
  primaryTop: number,
  primaryBase: number,
  fallbacks: readonly (Float64Array | readonly number[])[],
): { values: Float64Array; used: number[] } {
  const values = Float64Array.from(primary);
  const used = fallbacks.map(() => 0);
  for (let i = 0; i < depth.length; i++) {
    const d = depth[i];
    if (!Number.isNaN(values[i]) || (d >= primaryTop && d <= primaryBase)) continue;
    for (let f = 0; f < fallbacks.length; f++) {
      const v = fallbacks[f][i];
      if (!Number.isNaN(v)) {
        values[i] = v;
        used[f]++;
        break;
      }
    }
  }
  return { values, used };
}
