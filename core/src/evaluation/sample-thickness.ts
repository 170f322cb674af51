/**
 * Sample thickness and which samples belong to which zone.
 *
 * Convention (EVALUATION_CONVENTIONS 'sample-thickness'): sample i stands for the interval
 * between the midpoints to its neighbours, [b(i), b(i+1)] with b(i) = (d(i-1) + d(i)) / 2;
 * the first and last samples extend half their neighbour distance outward. On a regular
 * log this is one step centred on the sample; on an irregular log it is the half-distances
 * to the neighbours. In a zone [top, base] each sample counts only the part of its interval
 * inside the zone, so the gross of a zone is exactly base - top.
 * Depth must be finite and strictly increasing.
 */
import { type ParameterIssue, throwIfIssues } from './errors.js';

type Depth = Float64Array | readonly number[];

/** Issues with a depth index (non-finite, not strictly increasing, fewer than 2 samples). */
export function depthIssues(depth: Depth): ParameterIssue[] {
  const n = depth.length;
  if (n < 2) return [{ zone: null, field: 'depth', message: 'depth must have at least 2 samples' }];
  const i = firstBadDepth(depth);
  if (i === n) return [];
  if (!Number.isFinite(depth[i])) return [{ zone: null, field: 'depth', message: `depth must be finite (sample ${i})` }];
  return [{ zone: null, field: 'depth', message: `depth must increase strictly (sample ${i}: ${depth[i]} after ${depth[i - 1]})` }];
}

/** Index of the first sample that is not finite or not deeper than the one before (n if none). */
function firstBadDepth(depth: Depth): number {
  const n = depth.length;
  let prev = depth[0];
  if (!Number.isFinite(prev)) return 0;
  for (let i = 1; i < n; i++) {
    const x = depth[i];
    if (!(x > prev && Number.isFinite(x))) return i;
    prev = x;
  }
  return n;
}

/** Upper (shallower) boundary of sample i's interval. */
export function upperBoundary(depth: Depth, i: number): number {
  return i === 0 ? depth[0] - 0.5 * (depth[1] - depth[0]) : 0.5 * (depth[i - 1] + depth[i]);
}

/** Lower (deeper) boundary of sample i's interval. */
export function lowerBoundary(depth: Depth, i: number): number {
  const n = depth.length;
  return i === n - 1 ? depth[n - 1] + 0.5 * (depth[n - 1] - depth[n - 2]) : 0.5 * (depth[i] + depth[i + 1]);
}

/**
 * The n + 1 sample boundaries b(0..n) (see the file comment).
 * Throws EvaluationInputError (field 'depth') on a bad depth index.
 * @example sampleBoundaries([1000, 1000.5, 1001]) // [999.75, 1000.25, 1000.75, 1001.25]
 */
export function sampleBoundaries(depth: Depth): Float64Array {
  throwIfIssues('sampleBoundaries', depthIssues(depth));
  const n = depth.length;
  const b = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) b[i] = upperBoundary(depth, i);
  b[n] = lowerBoundary(depth, n - 1);
  return b;
}

/**
 * Thickness each sample contributes, optionally clipped to [top, base] (0 outside).
 * Throws EvaluationInputError on a bad depth index.
 * @example sampleThickness([1000, 1000.5, 1001], 1000, 1001) // [0.25, 0.5, 0.25]
 */
export function sampleThickness(depth: Depth, top = -Infinity, base = Infinity): Float64Array {
  const b = sampleBoundaries(depth);
  const out = new Float64Array(depth.length);
  for (let i = 0; i < depth.length; i++) {
    const h = Math.min(b[i + 1], base) - Math.max(b[i], top);
    out[i] = h > 0 ? h : 0;
  }
  return out;
}

export interface ZoneBounds {
  name: string;
  top: number;
  base: number;
}

/**
 * Index ranges of a zone (half-open [start, end)).
 * - overlap: every sample whose interval overlaps the zone (used by the summary, with the
 *   thickness clipped to the zone);
 * - compute: the samples whose curves are computed with this zone's parameters: samples
 *   whose centre lies in [top, base), plus a straddling sample at either end whose centre
 *   is in no zone (so every overlapping sample has values).
 */
export interface ZoneRange {
  overlapStart: number;
  overlapEnd: number;
  computeStart: number;
  computeEnd: number;
}

/** First index i with depth[i] >= x (binary search). */
export function lowerBound(depth: Depth, x: number): number {
  let lo = 0, hi = depth.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (depth[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Issues with zone bounds against a depth index: top/base not finite, top >= base, a zone
 * outside the logged interval [b(0), b(n)], zones overlapping. Zones may come in any order.
 */
export function zoneBoundsIssues(depth: Depth, zones: readonly ZoneBounds[]): ParameterIssue[] {
  const issues: ParameterIssue[] = [];
  const n = depth.length;
  const first = upperBoundary(depth, 0), last = lowerBoundary(depth, n - 1);
  const tol = 1e-9 * Math.max(1, Math.abs(first), Math.abs(last));
  const names = new Set<string>();
  for (const z of zones) {
    if (names.has(z.name)) issues.push({ zone: z.name, field: 'name', message: 'name must be unique among the zones' });
    names.add(z.name);
    if (!Number.isFinite(z.top)) issues.push({ zone: z.name, field: 'top', message: 'top must be a finite depth' });
    if (!Number.isFinite(z.base)) issues.push({ zone: z.name, field: 'base', message: 'base must be a finite depth' });
    if (!(z.top < z.base)) {
      issues.push({ zone: z.name, field: 'base', message: `base (${z.base}) must be deeper than top (${z.top})` });
      continue;
    }
    if (z.top < first - tol) {
      issues.push({ zone: z.name, field: 'top', message: `top (${z.top}) is above the logged interval, which starts at ${first}` });
    }
    if (z.base > last + tol) {
      issues.push({ zone: z.name, field: 'base', message: `base (${z.base}) is below the logged interval, which ends at ${last}` });
    }
  }
  const sorted = [...zones].filter((z) => z.top < z.base).sort((a, b) => a.top - b.top);
  for (let k = 1; k < sorted.length; k++) {
    if (sorted[k].top < sorted[k - 1].base) {
      issues.push({ zone: sorted[k].name, field: 'top', message: `top (${sorted[k].top}) overlaps zone '${sorted[k - 1].name}' (base ${sorted[k - 1].base})` });
    }
  }
  return issues;
}

/**
 * Sample ranges of each zone (same order as `zones`). Zones must be valid
 * (see {@link zoneBoundsIssues}); throws EvaluationInputError otherwise.
 */
export function zoneSampleRanges(depth: Depth, zones: readonly ZoneBounds[]): ZoneRange[] {
  throwIfIssues('zoneSampleRanges', [...depthIssues(depth), ...zoneBoundsIssues(depth, zones)]);
  return zoneRangesUnchecked(depth, zones);
}

/** {@link zoneSampleRanges} without the checks, for callers that validated already (internal). */
export function zoneRangesUnchecked(depth: Depth, zones: readonly ZoneBounds[]): ZoneRange[] {
  const n = depth.length;
  const claimed = (i: number): boolean => zones.some((z) => depth[i] >= z.top && depth[i] < z.base);
  return zones.map((z) => {
    let computeStart = lowerBound(depth, z.top);
    let computeEnd = lowerBound(depth, z.base);
    // Overlap: samples whose interval [b(i), b(i+1)] meets (top, base).
    let overlapStart = computeStart;
    while (overlapStart > 0 && lowerBoundary(depth, overlapStart - 1) > z.top) overlapStart--;
    let overlapEnd = computeEnd;
    while (overlapEnd < n && upperBoundary(depth, overlapEnd) < z.base) overlapEnd++;
    while (computeStart > overlapStart && !claimed(computeStart - 1)) computeStart--;
    while (computeEnd < overlapEnd && !claimed(computeEnd)) computeEnd++;
    return { overlapStart, overlapEnd, computeStart, computeEnd };
  });
}
