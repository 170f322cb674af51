import { describe, expect, it } from 'vitest';
import { curvePath, flagPath } from './curve-path';

const id = (v: number) => v;

describe('curvePath', () => {
  it('draws one point per sample when they fit, and breaks the line at NaN', () => {
    const d = curvePath({ depth: [0, 1, 2, 3], values: [10, NaN, 30, 40], start: 0, end: 4, x: id, y: id, rows: 100 });
    expect(d).toBe('M10,0M30,2L40,3');
  });

  it('skips values a log scale cannot place', () => {
    const d = curvePath({ depth: [0, 1, 2], values: [1, 0, 10], start: 0, end: 3, x: id, y: id, rows: 100, usable: (v) => v > 0 });
    expect(d.split('M').length - 1).toBe(2);
  });

  it('decimates to four points a pixel row and keeps a one-sample spike', () => {
    const n = 10000;
    const depth = Float64Array.from({ length: n }, (_, i) => i);
    const values = new Float64Array(n).fill(5);
    values[5000] = 99; // the spike
    const y = (v: number) => (v / n) * 100; // 100 rows
    const d = curvePath({ depth, values, start: 0, end: n, x: id, y, rows: 100 });
    const points = d.split(/[ML]/).filter(Boolean);
    expect(points.length).toBeLessThanOrEqual(4 * 101);
    expect(points.some((p) => p.startsWith('99,'))).toBe(true);
  });

  it('clamps off-scale values to the track edges', () => {
    const d = curvePath({ depth: [0, 1], values: [-5, 500], start: 0, end: 2, x: id, y: id, rows: 10, clampX: [0, 100] });
    expect(d).toBe('M0,0L100,1');
  });
});

describe('flagPath', () => {
  it('draws one band per run of flagged samples, each sample covering half a step either side', () => {
    const depth = [0, 1, 2, 3, 4, 5];
    const flags = [0, 1, 1, 0, NaN, 1];
    const d = flagPath(depth, flags, 0, 6, id, 0, 10);
    expect(d).toBe('M0,0.5H10V2.5H0ZM0,4.5H10V5.5H0Z');
  });
});
