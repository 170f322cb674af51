import { describe, expect, it } from 'vitest';
import { EvaluationInputError } from './errors.js';
import { sampleBoundaries, sampleThickness, zoneSampleRanges } from './sample-thickness.js';

describe('sample thickness (midpoint rule)', () => {
  it('sampleThickness on a regular 0.5 ft log clipped to [1000, 1001] gives [0.25, 0.5, 0.25]: gross = base - top', () => {
    // Convention 'sample-thickness' (one step centred on each sample, clipped at zone boundaries); hand-computed.
    const h = sampleThickness([1000, 1000.5, 1001], 1000, 1001);
    expect(Array.from(h)).toEqual([0.25, 0.5, 0.25]);
    expect(h.reduce((s, x) => s + x, 0)).toBe(1);
  });

  it('sampleBoundaries on an irregular log uses half-distances to the neighbours', () => {
    // depth 0, 1, 3, 6: midpoints 0.5, 2, 4.5; ends extend half their neighbour distance (hand-computed).
    expect(Array.from(sampleBoundaries([0, 1, 3, 6]))).toEqual([-0.5, 0.5, 2, 4.5, 7.5]);
    expect(Array.from(sampleThickness([0, 1, 3, 6]))).toEqual([1, 1.5, 2.5, 3]);
  });

  it('a zone edge between samples splits the straddling sample between the two zones', () => {
    const depth = [1000, 1000.5, 1001, 1001.5, 1002];
    const upper = sampleThickness(depth, 1000, 1000.6);
    const lower = sampleThickness(depth, 1000.6, 1002);
    expect(upper[1]).toBeCloseTo(0.35, 12); // [1000.25, 1000.6]
    expect(lower[1]).toBeCloseTo(0.15, 12); // [1000.6, 1000.75]
    expect(upper.reduce((s, x) => s + x, 0)).toBeCloseTo(0.6, 12);
    expect(lower.reduce((s, x) => s + x, 0)).toBeCloseTo(1.4, 12);
  });

  it('zoneSampleRanges: overlap ranges include straddlers; a straddler belongs to the zone holding its centre', () => {
    const depth = [1000, 1000.5, 1001, 1001.5, 1002];
    const [a, b] = zoneSampleRanges(depth, [
      { name: 'A', top: 1000, base: 1000.6 },
      { name: 'B', top: 1000.6, base: 1002 },
    ]);
    expect(a).toEqual({ overlapStart: 0, overlapEnd: 2, computeStart: 0, computeEnd: 2 });
    expect(b).toEqual({ overlapStart: 1, overlapEnd: 5, computeStart: 2, computeEnd: 5 });
  });

  it('a sample straddling a zone top with no zone above is computed by that zone', () => {
    // Sample 1000 covers [999.75, 1000.25]: it overlaps a zone from 1000.2 though its centre is above it.
    const [z] = zoneSampleRanges([1000, 1000.5, 1001, 1001.5], [{ name: 'Z', top: 1000.2, base: 1001.5 }]);
    expect(z.overlapStart).toBe(0);
    expect(z.computeStart).toBe(0);
    // With a top at 1000.4 it does not overlap at all.
    const [y] = zoneSampleRanges([1000, 1000.5, 1001, 1001.5], [{ name: 'Y', top: 1000.4, base: 1001.5 }]);
    expect(y.overlapStart).toBe(1);
    expect(y.computeStart).toBe(1);
  });

  it('zoneSampleRanges refuses a zone outside the logged interval and overlapping zones, naming zone and field', () => {
    const depth = [1000, 1000.5, 1001];
    try {
      zoneSampleRanges(depth, [
        { name: 'Deep', top: 1000.5, base: 1200 },
        { name: 'Other', top: 1000, base: 1000.7 },
      ]);
      throw new Error('expected an error');
    } catch (e) {
      expect(e).toBeInstanceOf(EvaluationInputError);
      const issues = (e as EvaluationInputError).issues;
      expect(issues).toContainEqual(expect.objectContaining({ zone: 'Deep', field: 'base' }));
      expect(issues).toContainEqual(expect.objectContaining({ zone: 'Deep', field: 'top' }));
      expect((e as Error).message).toMatch(/zone 'Deep': base \(1200\) is below the logged interval, which ends at 1001.25/);
    }
  });

  it('sampleBoundaries refuses a depth index that does not increase', () => {
    expect(() => sampleBoundaries([1000, 1000, 1001])).toThrow(/depth must increase strictly \(sample 1/);
  });
});
