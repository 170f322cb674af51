import { describe, expect, it } from 'vitest';
import { gasInPlace } from './volumetrics.js';
import { WELL_COUNT_ASSUMPTIONS, drainageAreaFromGas, wellsNeeded } from './well-count.js';

describe('wellsNeeded / drainageAreaFromGas', () => {
  it('wellsNeeded rounds the volume ratio up and carries the assumptions', () => {
    const r = wellsNeeded(120e9, 35e9);
    expect(r.ratio).toBeCloseTo(120 / 35, 12);
    expect(r.wells).toBe(4);
    expect(wellsNeeded(100, 25).wells).toBe(4); // exact multiple, no extra well
    expect(r.assumptions).toBe(WELL_COUNT_ASSUMPTIONS);
    expect(WELL_COUNT_ASSUMPTIONS.length).toBeGreaterThanOrEqual(4);
    expect(() => wellsNeeded(1e9, 0)).toThrow(/wellsNeeded: drainedPerWell/);
  });

  it('drainageAreaFromGas inverts gasInPlace (area back from drained gas)', () => {
    const rock = { netPayFt: 30, porosity: 0.2, sw: 0.25 };
    const g = gasInPlace({ areaAcres: 160, ...rock, bg: 0.0045 });
    expect(drainageAreaFromGas({ gasInPlaceScf: g, bg: 0.0045, ...rock })).toBeCloseTo(160, 9);
    expect(() => drainageAreaFromGas({ gasInPlaceScf: g, bg: 0.0045, ...rock, sw: 1 })).toThrow(/drainageAreaFromGas: sw/);
  });
});
