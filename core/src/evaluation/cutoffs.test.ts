import { describe, expect, it } from 'vitest';
import { applyCutoffs, payFlag, reservoirFlag } from './cutoffs.js';

describe('cutoffs', () => {
  it('reservoirFlag and payFlag are inclusive at the cutoff values', () => {
    // Convention 'cutoffs-inclusive': Vsh <= max, phi >= min, Sw <= max (Worthington & Cosentino 2005 define
    // cutoffs as limits; inclusiveness is our stated choice).
    expect(reservoirFlag(0.4, 0.08, NaN, 0.4, 0.08, -Infinity)).toBe(1);
    expect(payFlag(1, 0.6, 0.6)).toBe(1);
    expect(reservoirFlag(0.40001, 0.08, NaN, 0.4, 0.08, -Infinity)).toBe(0);
    expect(reservoirFlag(0.4, 0.07999, NaN, 0.4, 0.08, -Infinity)).toBe(0);
    expect(payFlag(1, 0.60001, 0.6)).toBe(0);
    expect(reservoirFlag(0.1, 0.2, 5, 0.4, 0.08, 5)).toBe(1);
    expect(reservoirFlag(0.1, 0.2, 4.9, 0.4, 0.08, 5)).toBe(0);
  });

  it('a missing value makes a flag NaN only when no known value fails', () => {
    expect(reservoirFlag(NaN, 0.2, NaN, 0.4, 0.08, -Infinity)).toBeNaN();
    expect(reservoirFlag(NaN, 0.01, NaN, 0.4, 0.08, -Infinity)).toBe(0);
    expect(reservoirFlag(0.1, 0.2, NaN, 0.4, 0.08, 1)).toBeNaN();
    expect(payFlag(0, NaN, 0.6)).toBe(0);
    expect(payFlag(1, NaN, 0.6)).toBeNaN();
    expect(payFlag(NaN, 0.9, 0.6)).toBe(0);
  });

  it('applyCutoffs judges each sample with its own formation, NaN outside every zone', () => {
    const depth = [100, 101, 102, 103, 104, 105];
    const curves = { VSH: [0.1, 0.1, 0.1, 0.1, 0.1, 0.1], PHIE: [0.12, 0.12, 0.12, 0.12, 0.12, 0.12], SW: [0.5, 0.5, 0.5, 0.5, 0.5, 0.5] };
    const r = applyCutoffs({
      depth,
      curves,
      zones: [
        { name: 'Upper', formation: 'F1', top: 100, base: 102 },
        { name: 'Lower', formation: 'F2', top: 102, base: 104 },
      ],
      cutoffs: { F1: { vshMax: 0.5, phiMin: 0.1, swMax: 0.6 }, F2: { vshMax: 0.5, phiMin: 0.15, swMax: 0.6 } },
    });
    expect(Array.from(r.NET_RES.subarray(0, 4))).toEqual([1, 1, 0, 0]);
    // Sample 104 straddles Lower's base with no zone below, so Lower computes it; 105 is outside.
    expect(r.NET_RES[4]).toBe(0);
    expect(r.NET_RES[5]).toBeNaN();
    expect(Array.from(r.NET_PAY.subarray(0, 4))).toEqual([1, 1, 0, 0]);
  });

  it('applyCutoffs refuses a formation without cutoffs and a permMin without PERM, naming zone and field', () => {
    const base = { depth: [1, 2, 3], curves: { VSH: [0, 0, 0], PHIE: [0.2, 0.2, 0.2], SW: [0.3, 0.3, 0.3] } };
    expect(() => applyCutoffs({ ...base, zones: [{ name: 'Z', formation: 'F', top: 1, base: 3 }], cutoffs: {} })).toThrow(
      "applyCutoffs: zone 'Z': cutoffs are missing for formation 'F'",
    );
    expect(() =>
      applyCutoffs({ ...base, zones: [{ name: 'Z', top: 1, base: 3 }], cutoffs: { Z: { vshMax: 0.5, phiMin: 0.1, swMax: 1.2 } } }),
    ).toThrow("zone 'Z': cutoffs.swMax must be in [0, 1]");
    expect(() =>
      applyCutoffs({ ...base, zones: [{ name: 'Z', top: 1, base: 3 }], cutoffs: { Z: { vshMax: 0.5, phiMin: 0.1, swMax: 0.6, permMin: 1 } } }),
    ).toThrow('curves.PERM is required by a permMin cutoff');
  });
});
