import { describe, expect, it } from 'vitest';
import { exceedanceCurve, percentilesPrms } from './percentiles.js';

describe('percentilesPrms (SPE-PRMS 2018: P90 = 10th percentile)', () => {
  it('percentilesPrms([1..11]) gives P90 2, P50 6, P10 10 (type-7 quantiles at 0.1, 0.5, 0.9, by hand)', () => {
    const r = percentilesPrms([11, 3, 1, 2, 5, 4, 6, 8, 7, 9, 10]);
    expect(r.p90).toBe(2);
    expect(r.p50).toBe(6);
    expect(r.p10).toBe(10);
    expect(r.mean).toBe(6);
    expect(r.sd).toBeCloseTo(Math.sqrt(10), 12); // population variance of 1..11 = (11^2 - 1)/12 = 10
  });

  it('percentilesPrms interpolates like numpy.percentile default: 10th percentile of 1..10 is 1.9', () => {
    // NumPy documentation, numpy.percentile, method 'linear' (Hyndman & Fan 1996 type 7).
    const r = percentilesPrms(Float64Array.from({ length: 10 }, (_, i) => i + 1));
    expect(r.p90).toBeCloseTo(1.9, 12);
    expect(r.p10).toBeCloseTo(9.1, 12);
    expect(r.p90).toBeLessThanOrEqual(r.p50);
    expect(r.p50).toBeLessThanOrEqual(r.p10);
  });

  it('percentilesPrms skips NaN and counts it; throws when nothing is finite', () => {
    const r = percentilesPrms([1, Number.NaN, 3]);
    expect(r.count).toBe(2);
    expect(r.missing).toBe(1);
    expect(r.p50).toBe(2);
    expect(() => percentilesPrms([Number.NaN])).toThrow(/percentilesPrms: samples has no finite value/);
  });

  it('percentilesPrms does not modify its input', () => {
    const x = Float64Array.from([3, 1, 2]);
    percentilesPrms(x);
    expect(Array.from(x)).toEqual([3, 1, 2]);
  });
});

describe('exceedanceCurve', () => {
  it('exceedanceCurve read at exceedance 0.9 / 0.5 / 0.1 equals P90 / P50 / P10', () => {
    const x = Float64Array.from({ length: 1001 }, (_, i) => Math.sqrt(i));
    const c = exceedanceCurve(x, 11);
    const r = percentilesPrms(x);
    expect(c.exceedance[1]).toBeCloseTo(0.9, 12);
    expect(c.value[1]).toBeCloseTo(r.p90, 12);
    expect(c.value[5]).toBeCloseTo(r.p50, 12);
    expect(c.value[9]).toBeCloseTo(r.p10, 12);
    expect(c.value[0]).toBe(0);
    expect(c.value[10]).toBeCloseTo(Math.sqrt(1000), 12);
  });

  it('exceedanceCurve rejects fewer than 2 points', () => {
    expect(() => exceedanceCurve([1, 2], 1)).toThrow(/exceedanceCurve: points/);
  });
});
