// Conversion checks against definitions: 1 ft = 0.3048 m and 1 in = 25.4 mm exactly
// (Thompson & Taylor (2008) NIST SP 811, App. B.8; from memory: both exact);
// 1 g/cm3 = 1000 kg/m3 (SI prefixes); 1 p.u. = 1 % (common practice).
import { describe, expect, it } from 'vitest';
import { convertDepths, depthUnitOf, feetToMetres, metresToFeet, parseUnit } from './units.js';
import { normaliseCurveUnits } from './normalise-curve-units.js';

describe('depth units', () => {
  it('feetToMetres(1000) = 304.8 m (0.3048 m per ft, NIST SP 811 App. B.8)', () => {
    expect(feetToMetres(1000)).toBeCloseTo(304.8, 12);
  });
  it('metresToFeet(0.3048) = 1 ft and round-trips within 1e-12', () => {
    expect(metresToFeet(0.3048)).toBeCloseTo(1, 14);
    for (const ft of [0.5, 1234.5, 9876.25]) expect(Math.abs(metresToFeet(feetToMetres(ft)) - ft)).toBeLessThan(1e-12 * ft);
  });
  it('convertDepths([0, 100, NaN], ft, m) gives a new array [0, 30.48, NaN]', () => {
    const input = new Float64Array([0, 100, Number.NaN]);
    const out = convertDepths(input, 'ft', 'm');
    expect(out).not.toBe(input);
    expect(out[1]).toBeCloseTo(30.48, 12);
    expect(out[2]).toBeNaN();
    expect(input[1]).toBe(100);
  });
  it('convertDepths with a bad unit throws a RangeError naming the field', () => {
    expect(() => convertDepths([1], 'yd' as 'ft', 'm')).toThrow('convertDepths: from must be');
  });
  it.each([['F', 'ft'], ['ft', 'ft'], ['FEET', 'ft'], ['M', 'm'], ['metres', 'm'], ['S', null], ['', null]])('depthUnitOf(%j) = %j', (u, d) => {
    expect(depthUnitOf(u)).toBe(d);
  });
});

describe('parseUnit', () => {
  it.each([
    ['G/CC', 'density', 1],
    ['g/cm3', 'density', 1],
    ['K/M3', 'density', 0.001],
    ['kg/m3', 'density', 0.001],
    ['V/V', 'fraction', 1],
    ['%', 'fraction', 0.01],
    ['PU', 'fraction', 0.01],
    ['p.u.', 'fraction', 0.01],
    ['US/F', 'slowness', 1],
    ['µs/ft', 'slowness', 1],
    ['US/M', 'slowness', 0.3048],
    ['OHMM', 'resistivity', 1],
    ['ohm.m', 'resistivity', 1],
    ['MM', 'diameter', 1 / 25.4],
  ])('parseUnit(%j) is %s with factor %d', (u, q, f) => {
    expect(parseUnit(u)).toMatchObject({ quantity: q });
    expect(parseUnit(u)!.factor).toBeCloseTo(f, 15);
  });
  it('parseUnit of an unknown spelling is null', () => {
    expect(parseUnit('CPS')).toBeNull();
  });
});

describe('normaliseCurveUnits', () => {
  it('normaliseCurveUnits(kg/m3, bulk_density) divides by 1000 (SI prefixes)', () => {
    const r = normaliseCurveUnits([2450, Number.NaN], 'kg/m3', 'bulk_density');
    expect(r.unit).toBe('g/cm3');
    expect(r.values[0]).toBeCloseTo(2.45, 12);
    expect(r.values[1]).toBeNaN();
  });
  it('normaliseCurveUnits(PU, neutron_porosity) gives v/v (1 p.u. = 0.01, common practice)', () => {
    expect(normaliseCurveUnits([25], 'PU', 'neutron_porosity').values[0]).toBeCloseTo(0.25, 14);
  });
  it('normaliseCurveUnits(us/m, sonic): 328.0839895 us/m is 100 us/ft (100 / 0.3048, computed by hand)', () => {
    expect(normaliseCurveUnits([328.0839895013123], 'US/M', 'sonic').values[0]).toBeCloseTo(100, 9);
  });
  it('normaliseCurveUnits with no unit assumes the canonical unit and says so', () => {
    expect(normaliseCurveUnits([1], '', 'gamma_ray')).toMatchObject({ unit: 'gAPI', factor: 1, assumed: true });
  });
  it('normaliseCurveUnits with a unit of another quantity throws a RangeError', () => {
    expect(() => normaliseCurveUnits([1], 'OHMM', 'bulk_density')).toThrow(/normaliseCurveUnits: unit "OHMM" is a resistivity unit/);
    expect(() => normaliseCurveUnits([1], 'CPS', 'gamma_ray')).toThrow(RangeError);
  });
  it('normaliseCurveUnits never mutates its input', () => {
    const input = new Float64Array([2450]);
    normaliseCurveUnits(input, 'kg/m3', 'bulk_density');
    expect(input[0]).toBe(2450);
  });
});
