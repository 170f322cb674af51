import { describe, expect, it } from 'vitest';
import { combineWellInputs } from './well-averages.js';

const TWO = [
  { name: 'A', netPayFt: 10, porosity: 0.2, sw: 0.3, drainageAreaAcres: 80 },
  { name: 'B', netPayFt: 30, porosity: 0.1, sw: 0.5, drainageAreaAcres: 160 },
];

describe('combineWellInputs', () => {
  it("combineWellInputs(..., 'arithmetic') takes plain means", () => {
    const r = combineWellInputs(TWO, 'arithmetic');
    expect(r.netPayFt).toBeCloseTo(20, 12);
    expect(r.porosity).toBeCloseTo(0.15, 12);
    expect(r.sw).toBeCloseTo(0.4, 12);
  });

  it("combineWellInputs(..., 'thickness') weights porosity by h and Sw by phi*h (by hand)", () => {
    // phi = (10*0.2 + 30*0.1) / 40 = 0.125; Sw = (2*0.3 + 3*0.5) / (2 + 3) = 0.42
    const r = combineWellInputs(TWO, 'thickness');
    expect(r.netPayFt).toBeCloseTo(20, 12);
    expect(r.porosity).toBeCloseTo(0.125, 12);
    expect(r.sw).toBeCloseTo(0.42, 12);
  });

  it("combineWellInputs(..., 'area') conserves hydrocarbon pore volume sum(A h phi (1-Sw))", () => {
    const r = combineWellInputs(TWO, 'area');
    const perWell = TWO.reduce((s, w) => s + w.drainageAreaAcres * w.netPayFt * w.porosity * (1 - w.sw), 0);
    expect(r.totalAreaAcres).toBe(240);
    expect(r.totalAreaAcres * r.netPayFt * r.porosity * (1 - r.sw)).toBeCloseTo(perWell, 9);
    // h = (80*10 + 160*30)/240 = 23.333; phi = (800*0.2 + 4800*0.1)/5600 = 0.114286 (by hand)
    expect(r.netPayFt).toBeCloseTo(23.333333, 5);
    expect(r.porosity).toBeCloseTo(640 / 5600, 12);
  });

  it('combineWellInputs skips and counts wells with a missing (NaN) value', () => {
    const r = combineWellInputs([...TWO, { netPayFt: Number.NaN, porosity: 0.2, sw: 0.3 }], 'thickness');
    expect(r.wellsUsed).toBe(2);
    expect(r.wellsSkipped).toBe(1);
    expect(r.porosity).toBeCloseTo(0.125, 12);
  });

  it('combineWellInputs rejects bad input naming the field', () => {
    expect(() => combineWellInputs([], 'thickness')).toThrow(/combineWellInputs: wells/);
    expect(() => combineWellInputs([{ netPayFt: 10, porosity: 0.2, sw: 0.3 }], 'area')).toThrow(
      /combineWellInputs: wells\[0\]\.drainageAreaAcres is required/,
    );
    expect(() => combineWellInputs([{ netPayFt: 10, porosity: 1.4, sw: 0.3 }], 'thickness')).toThrow(/wells\[0\]\.porosity/);
    expect(() => combineWellInputs([{ netPayFt: 0, porosity: 0.2, sw: 0.3 }], 'thickness')).toThrow(/total net pay is 0/);
  });
});
