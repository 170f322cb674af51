/** Where a curve has values, as depths of the first and last value and the share of samples holding one. */
export interface Coverage {
  first: number | null;
  last: number | null;
  /** Samples with a value / all samples (0 for an empty curve). */
  fraction: number;
}

/** A gap of consecutive null samples between the first and the last value. */
export interface NullRun {
  from: number;
  to: number;
  samples: number;
}

export interface RangeViolations {
  below: number;
  above: number;
  /** Smallest and largest value of the curve (null when it has none). */
  min: number | null;
  max: number | null;
  /** The plausible range in the curve's own unit (null when the class or unit is unknown). */
  expectedMin: number | null;
  expectedMax: number | null;
}

export interface CurveCheckResult {
  coverage: Coverage;
  nullRuns: NullRun[];
  /** True when more gaps exist than `maxNullRuns` listed. */
  nullRunsTruncated: boolean;
  rangeViolations: RangeViolations;
}

/**
 * Coverage, gaps and range violations of one curve against its depth index.
 * Leading and trailing nulls show in `coverage` (first/last value), not as gaps. Values are
 * compared with `expected` as given (the caller converts the range to the curve's unit).
 *
 * @example checkCurve([100, 101, 102, 103], [NaN, 5, NaN, 7], { min: 0, max: 6 })
 *   // coverage { first: 101, last: 103, fraction: 0.5 }, nullRuns [{ from: 102, to: 102, samples: 1 }], 1 above
 */
export function checkCurve(
  depth: Float64Array | readonly number[],
  values: Float64Array | readonly number[],
  expected: { min: number; max: number } | null,
  maxNullRuns = 100,
): CurveCheckResult {
  if (depth.length !== values.length) throw new RangeError(`checkCurve: values has ${values.length} samples, depth ${depth.length}`);
  let firstI = -1;
  let lastI = -1;
  let count = 0;
  let min = Infinity;
  let max = -Infinity;
  let below = 0;
  let above = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isNaN(v)) continue;
    if (firstI < 0) firstI = i;
    lastI = i;
    count++;
    if (v < min) min = v;
    if (v > max) max = v;
    if (expected && v < expected.min) below++;
    if (expected && v > expected.max) above++;
  }
  const nullRuns: NullRun[] = [];
  let truncated = false;
  for (let i = firstI + 1; firstI >= 0 && i < lastI; i++) {
    if (!Number.isNaN(values[i])) continue;
    let j = i;
    while (j + 1 < lastI && Number.isNaN(values[j + 1])) j++;
    if (nullRuns.length < maxNullRuns) nullRuns.push({ from: depth[i], to: depth[j], samples: j - i + 1 });
    else truncated = true;
    i = j;
  }
  return {
    coverage: { first: firstI >= 0 ? depth[firstI] : null, last: lastI >= 0 ? depth[lastI] : null, fraction: values.length ? count / values.length : 0 },
    nullRuns,
    nullRunsTruncated: truncated,
    rangeViolations: { below, above, min: count ? min : null, max: count ? max : null, expectedMin: expected?.min ?? null, expectedMax: expected?.max ?? null },
  };
}
