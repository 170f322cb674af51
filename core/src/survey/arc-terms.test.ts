import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { arcSin, arcVersine } from './arc-terms.js';

// References: Math.sin, and 1 - cos x = 2 sin^2(x/2) (the half-angle identity; common
// practice as the cancellation-free form), both through the platform's Math.sin.
describe('arc terms', () => {
  it('arcSin agrees with Math.sin to 2 units in the last place, on both sides of the series bound', () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 3, noNaN: true }), (x) => {
        expect(Math.abs(arcSin(x) - Math.sin(x))).toBeLessThanOrEqual(2 * Number.EPSILON * Math.abs(Math.sin(x)) + Number.MIN_VALUE);
      }),
      { numRuns: 3000, seed: 7 },
    );
  });

  it('arcVersine agrees with 2 sin^2(x/2) to 4 units in the last place', () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 3, noNaN: true }), (x) => {
        const s = Math.sin(0.5 * x);
        const ref = 2 * s * s;
        expect(Math.abs(arcVersine(x) - ref)).toBeLessThanOrEqual(4 * Number.EPSILON * ref + Number.MIN_VALUE);
      }),
      { numRuns: 3000, seed: 11 },
    );
  });

  it('keeps 1 - cos x accurate where 1 - Math.cos(x) cancels (x = 1e-5: 5e-11 - 4.2e-22)', () => {
    // 1 - cos x = x^2/2 - x^4/24 + ... ; at x = 1e-5 that is 5e-11 - 4.17e-22.
    expect(arcVersine(1e-5)).toBeCloseTo(5e-11 - 1e-20 / 24, 25);
    expect(Math.abs(arcVersine(1e-5) / 5e-11 - 1)).toBeLessThan(1e-10);
    expect(Math.abs((1 - Math.cos(1e-5)) / 5e-11 - 1)).toBeGreaterThan(1e-8); // the cancelling form is off
  });
});
