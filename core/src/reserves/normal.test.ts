import { describe, expect, it } from 'vitest';
import { errorFunction } from 'simple-statistics';
import { Z_P10, erfc, normalCdf, normalQuantile, normalQuantileFast } from './normal.js';

// Tabulated standard normal values: Abramowitz & Stegun (1964) Handbook of Mathematical
// Functions, Tables 26.1 and 26.5 (from memory, to the digits shown).
const QUANTILES: ReadonlyArray<readonly [number, number]> = [
  [0.5, 0],
  [0.9, 1.2815515655446004],
  [0.975, 1.959963984540054],
  [0.99, 2.3263478740408408],
  [0.999, 3.090232306167813],
  [0.1, -1.2815515655446004],
  [1e-6, -4.753424308822899],
];

describe('normalCdf / erfc (Abramowitz & Stegun 7.1.6 and 7.1.14)', () => {
  it('normalCdf matches tabulated Phi(1), Phi(-3), Phi(-6)', () => {
    expect(normalCdf(1)).toBeCloseTo(0.8413447460685429, 14); // A&S Table 26.1, from memory
    expect(Math.abs(normalCdf(-3) / 0.0013498980316300933 - 1)).toBeLessThan(1e-12); // from memory
    expect(Math.abs(normalCdf(-6) / 9.865876450376946e-10 - 1)).toBeLessThan(1e-11); // from memory
  });

  it('erfc agrees with simple-statistics errorFunction (Numerical Recipes, ~1.2e-7) and erfc(3) = 2.209050e-5', () => {
    for (const x of [0.1, 0.5, 1, 1.5, 2, 2.5]) expect(Math.abs(1 - erfc(x) - errorFunction(x))).toBeLessThan(2e-7);
    expect(Math.abs(erfc(3) / 2.209049699858544e-5 - 1)).toBeLessThan(1e-12); // A&S Table 7.1, from memory
  });

  it('erfc is continuous across the series / continued-fraction switch at x = 3', () => {
    expect(Math.abs(erfc(3 - 1e-12) / erfc(3) - 1)).toBeLessThan(1e-10);
  });
});

describe('normalQuantile', () => {
  it('normalQuantile reproduces tabulated quantiles to 1e-12 (A&S Table 26.5)', () => {
    for (const [p, z] of QUANTILES) expect(Math.abs(normalQuantile(p) - z), `p ${p}`).toBeLessThan(1e-12);
    expect(normalQuantile(0.9)).toBeCloseTo(Z_P10, 14);
  });

  it('normalQuantileFast is within Acklam\'s stated 1.15e-9 relative error', () => {
    for (const [p, z] of QUANTILES) {
      if (z !== 0) expect(Math.abs(normalQuantileFast(p) / z - 1), `p ${p}`).toBeLessThan(1.2e-9);
    }
  });

  it('normalQuantile inverts normalCdf across the range', () => {
    for (let i = 1; i < 100; i++) {
      const p = i / 100;
      expect(Math.abs(normalCdf(normalQuantile(p)) - p)).toBeLessThan(1e-15);
    }
  });

  it('normalQuantile rejects p outside [0, 1]', () => {
    expect(() => normalQuantile(1.5)).toThrow(/normalQuantile: p/);
    expect(normalQuantile(0)).toBe(-Infinity);
  });
});
