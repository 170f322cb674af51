import { describe, expect, it } from 'vitest';
import { linearRegression } from 'simple-statistics';
import { fitPZ, pzCumulativeAt } from './material-balance.js';

describe('fitPZ (p/z material balance, Craft & Hawkins 1991 ch. 2)', () => {
  it('fitPZ reproduces the published "Original gas in place with a p/z chart" worksheet: G = 41.68 MMscf', () => {
    // Worksheet example (Scribd document 145697212): Gp [MMscf] and p/z [psia]; least-squares line
    // y = -121.7047 x + 5072.661, G = 41.68 MMscf.
    const fit = fitPZ({ gp: [0, 2.46, 4.92, 7.88, 11.2], pz: [5000, 4795, 4545, 4167, 3636] });
    expect(fit.slope).toBeCloseTo(-121.7047, 3);
    expect(fit.intercept).toBeCloseTo(5072.661, 2);
    expect(fit.gasInPlace).toBeCloseTo(41.68, 2);
  });

  it('fitPZ regresses p/z on Gp: same line as simple-statistics linearRegression([Gp, p/z]), not Gp on p/z', () => {
    const gp = [0, 2.46, 4.92, 7.88, 11.2];
    const pz = [5000, 4795, 4545, 4167, 3636];
    const ref = linearRegression(gp.map((x, i) => [x, pz[i]]));
    const fit = fitPZ({ gp, pz });
    expect(fit.slope).toBeCloseTo(ref.m, 10);
    expect(fit.intercept).toBeCloseTo(ref.b, 8);
    // The reverse regression (Gp on p/z) gives a different G: its p/z = 0 intercept.
    const rev = linearRegression(pz.map((y, i) => [y, gp[i]]));
    expect(Math.abs(rev.b - fit.gasInPlace)).toBeGreaterThan(0.1);
  });

  it('fitPZ on an exact line p/z = (pi/zi)(1 - Gp/G) returns G (Craft & Hawkins 1991 p/z equation)', () => {
    const G = 50e9;
    const gp = [0, 5e9, 12e9, 20e9, 30e9];
    const p = [4500, 4100, 3600, 3050, 2400];
    const z = gp.map((g, i) => p[i] / (4000 * (1 - g / G)));
    const fit = fitPZ({ gp, pressurePsia: p, z });
    expect(fit.gasInPlace / G).toBeCloseTo(1, 10);
    expect(fit.intercept).toBeCloseTo(4000, 8);
    expect(fit.rSquared).toBeCloseTo(1, 12);
    expect(pzCumulativeAt(fit, 1000) / (0.75 * G)).toBeCloseTo(1, 10);
  });

  it('fitPZ skips NaN and rejects rising p/z or bad values naming the field', () => {
    const fit = fitPZ({ gp: [0, 1, Number.NaN, 3], pz: [4000, 3900, 3800, 3700] });
    expect(fit.skipped).toBe(1);
    expect(fit.n).toBe(3);
    expect(() => fitPZ({ gp: [0, 1, 2], pz: [3000, 3100, 3200] })).toThrow(/fitPZ: p\/z does not fall/);
    expect(() => fitPZ({ gp: [0, 1], pressurePsia: [3000, 2900], z: [0.9, 0] })).toThrow(/fitPZ: z\[1\]/);
    expect(() => fitPZ({ gp: [0], pz: [3000] })).toThrow(/at least 2 points/);
    expect(fit.method).toMatch(/p\/z on cumulative gas/);
  });
});
