import { describe, expect, it } from 'vitest';
import { checkCurve } from './check-curve.js';

// Expected values are counted by hand from the arrays.
describe('checkCurve', () => {
  it('reports coverage from the first to the last value, inner gaps only, and counts below/above the range', () => {
    const depth = [100, 100.5, 101, 101.5, 102, 102.5, 103, 103.5];
    const values = [NaN, 40, NaN, NaN, 600, -5, NaN, NaN];
    const r = checkCurve(depth, values, { min: 0, max: 500 });
    expect(r.coverage).toEqual({ first: 100.5, last: 102.5, fraction: 3 / 8 });
    expect(r.nullRuns).toEqual([{ from: 101, to: 101.5, samples: 2 }]);
    expect(r.rangeViolations).toEqual({ below: 1, above: 1, min: -5, max: 600, expectedMin: 0, expectedMax: 500 });
  });

  it('an all-null curve has no coverage and no range; without an expected range nothing is flagged', () => {
    const r = checkCurve([1, 2], [NaN, NaN], null);
    expect(r.coverage).toEqual({ first: null, last: null, fraction: 0 });
    expect(r.rangeViolations).toEqual({ below: 0, above: 0, min: null, max: null, expectedMin: null, expectedMax: null });
  });

  it('lists at most maxNullRuns gaps and says so', () => {
    const r = checkCurve([0, 1, 2, 3, 4, 5, 6], [1, NaN, 1, NaN, 1, NaN, 1], null, 2);
    expect(r.nullRuns).toHaveLength(2);
    expect(r.nullRunsTruncated).toBe(true);
  });

  it('refuses values and depth of different lengths, naming the function', () => {
    expect(() => checkCurve([1, 2], [1], null)).toThrow(/checkCurve: values has 1 samples, depth 2/);
  });
});
