import { describe, expect, it } from 'vitest';
import { histogram } from './histogram.js';

describe('histogram', () => {
  it('histogram([1, 2, 2, 3], 2) puts the maximum in the last bin (counted by hand: [1, 3])', () => {
    const h = histogram([1, 2, 2, 3], 2);
    expect(Array.from(h.edges)).toEqual([1, 2, 3]);
    expect(Array.from(h.counts)).toEqual([1, 3]);
  });

  it('histogram density integrates to 1 and counts sum to the samples inside the range', () => {
    const x = Float64Array.from({ length: 1000 }, (_, i) => (i * 7919) % 1000);
    const h = histogram(x, { bins: 25, min: 100, max: 899 });
    let integral = 0;
    let total = 0;
    for (let i = 0; i < 25; i++) {
      integral += h.density[i] * (h.edges[i + 1] - h.edges[i]);
      total += h.counts[i];
    }
    expect(integral).toBeCloseTo(1, 12);
    expect(total + h.outside).toBe(1000);
    expect(h.outside).toBe(200); // 0..99 and 900..999
  });

  it('histogram skips NaN, handles a constant sample and rejects bad bins', () => {
    const h = histogram([5, 5, Number.NaN], 10);
    expect(h.missing).toBe(1);
    expect(Array.from(h.counts)).toEqual([2]);
    expect(() => histogram([1, 2], 0)).toThrow(/histogram: bins/);
    expect(() => histogram([Number.NaN], 3)).toThrow(/histogram: samples has no finite value/);
  });
});
