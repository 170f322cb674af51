import { describe, expect, it } from 'vitest';
import { MAX_MERGED_SAMPLES, mergeRuns, resampleNearest, runStep, spliceOutside } from './merge-runs.js';

// Expected values below are worked by hand from the definitions in merge-runs.ts.
describe('runStep', () => {
  it('runStep(depth, -0.5) uses the declared step without its sign', () => {
    expect(runStep([10, 9.5, 9], -0.5)).toBe(0.5);
  });
  it('runStep(depth) without a step takes the median spacing (one missing depth does not change it)', () => {
    expect(runStep([0, 1, 2, NaN, 4, 5])).toBe(1); // spacings 1, 1, 2, 1 -> median 1
  });
  it('runStep of a single depth throws naming the function', () => {
    expect(() => runStep([5])).toThrow(/runStep: depth must hold at least 2/);
  });
});

describe('resampleNearest', () => {
  it('takes the nearest sample within the tolerance and NaN beyond it', () => {
    const out = resampleNearest([0, 1, 2], [10, 11, 12], [0.4, 0.6, 2.5, 5], 0.5);
    expect(Array.from(out)).toEqual([10, 11, 12, NaN]); // 0.4 -> 0; 0.6 -> 1; 2.5 is 0.5 from 2 (inside); 5 is 3 away
  });
  it('keeps the shallower sample on an exact tie and accepts a descending source', () => {
    const out = resampleNearest([2, 1, 0], [12, 11, 10], [0.5, 1.5], 0.5);
    expect(Array.from(out)).toEqual([10, 11]);
  });
  it('lets a null (NaN) source value through as NaN and does not change its inputs', () => {
    const depth = new Float64Array([0, 1, 2]);
    const values = new Float64Array([1, NaN, 3]);
    const out = resampleNearest(depth, values, [0, 1, 2], 0.25);
    expect(Array.from(out)).toEqual([1, NaN, 3]);
    expect(Array.from(values)).toEqual([1, NaN, 3]);
  });
});

describe('mergeRuns', () => {
  it('uses the finest step over the union of the runs and holds the coarse run over its own half step', () => {
    // run A: 100..102 every 1 ft; run B: 101..103 every 0.5 ft
    const merged = mergeRuns([
      { depth: [100, 101, 102], values: [1, 2, 3], step: 1 },
      { depth: [101, 101.5, 102, 102.5, 103], values: [10, 11, 12, 13, 14], step: 0.5 },
    ]);
    expect(merged.step).toBe(0.5);
    expect(Array.from(merged.depth)).toEqual([100, 100.5, 101, 101.5, 102, 102.5, 103]);
    // A: nearest within 0.5 ft (half of its own 1 ft step); ties go to the shallower sample; 103 is 1 ft below A's last sample
    expect(Array.from(merged.values[0])).toEqual([1, 1, 2, 2, 3, 3, NaN]);
    // B: exact on its own samples, NaN above its first sample by more than 0.25 ft
    expect(Array.from(merged.values[1])).toEqual([NaN, NaN, 10, 11, 12, 13, 14]);
  });

  it('merges two runs offset by less than half a step: every sample still finds its partner', () => {
    const merged = mergeRuns([
      { depth: [1000, 1000.5, 1001], values: [1, 2, 3] },
      { depth: [1000.1, 1000.6, 1001.1], values: [7, 8, 9] },
    ]);
    expect(merged.depth.length).toBe(3); // (1001.1 - 1000) / 0.5 = 2.2 -> 3 samples from 1000
    expect(Array.from(merged.values[1])).toEqual([7, 8, 9]); // each 0.1 ft from its target
  });

  it('refuses an empty input list and an index larger than MAX_MERGED_SAMPLES', () => {
    expect(() => mergeRuns([])).toThrow(/mergeRuns: inputs must not be empty/);
    expect(() => mergeRuns([{ depth: [0, 1e-3], values: [1, 2] }, { depth: [0, MAX_MERGED_SAMPLES], values: [1, 2] }])).toThrow(/more than/);
  });
});

describe('spliceOutside', () => {
  it('fills only depths outside the primary interval, from the first fallback that has a value', () => {
    const depth = [0, 1, 2, 3, 4];
    const primary = [NaN, 5, NaN, 6, NaN]; // logged 1..3, null run at 2
    const r = spliceOutside(depth, primary, 1, 3, [
      [NaN, 8, 8, 8, NaN],
      [7, 7, 7, 7, 7],
    ]);
    expect(Array.from(r.values)).toEqual([7, 5, NaN, 6, 7]);
    expect(r.used).toEqual([0, 2]);
  });

  it('does not change the primary array', () => {
    const primary = new Float64Array([NaN, 1]);
    spliceOutside([0, 1], primary, 1, 1, [[2, 2]]);
    expect(Number.isNaN(primary[0])).toBe(true);
  });
});
