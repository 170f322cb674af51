// Mnemonic/unit pairs below are common practice in LAS files (no single published source);
// the expected classes are those the PWLS-based table in curve-classes.ts assigns.
import { describe, expect, it } from 'vitest';
import { recogniseCurve } from './recognise-curve.js';
import { CURVE_CLASSES } from './curve-classes.js';

describe('recogniseCurve', () => {
  it.each([
    ['GR', 'GAPI', 'gamma_ray'],
    ['SP', 'MV', 'spontaneous_potential'],
    ['CALI', 'IN', 'caliper'],
    ['RHOB', 'G/CC', 'bulk_density'],
    ['NPHI', 'V/V', 'neutron_porosity'],
    ['DT', 'US/F', 'sonic'],
    ['PEF', 'B/E', 'photoelectric'],
    ['ILD', 'OHMM', 'deep_resistivity'],
    ['ILM', 'OHMM', 'medium_resistivity'],
    ['SFLU', 'OHMM', 'shallow_resistivity'],
  ])('recogniseCurve(%j, %j) proposes %s with confidence 0.95', (m, u, cls) => {
    expect(recogniseCurve(m, u)).toMatchObject({ curveClass: cls, confidence: 0.95, matchedBy: 'mnemonic', unitFactor: 1 });
  });

  it('recogniseCurve is case-insensitive and gives the unit factor (RHOZ in kg/m3)', () => {
    expect(recogniseCurve('rhoz', 'kg/m3')).toMatchObject({ curveClass: 'bulk_density', canonicalUnit: 'g/cm3', unitFactor: 0.001 });
  });

  it('recogniseCurve reads a run suffix (GR_2, RHOB1) with lower confidence', () => {
    expect(recogniseCurve('GR_2', 'GAPI')).toMatchObject({ curveClass: 'gamma_ray', matchedBy: 'mnemonic_suffix', confidence: 0.85 });
    expect(recogniseCurve('RHOB1', 'G/C3')).toMatchObject({ curveClass: 'bulk_density', matchedBy: 'mnemonic_suffix' });
  });

  it('recogniseCurve keeps digit-bearing aliases exact (AT90 deep, AT10 shallow, C1 caliper)', () => {
    expect(recogniseCurve('AT90', 'OHMM')?.curveClass).toBe('deep_resistivity');
    expect(recogniseCurve('AT10', 'OHMM')?.curveClass).toBe('shallow_resistivity');
    expect(recogniseCurve('C1', 'IN')?.curveClass).toBe('caliper');
  });

  it('recogniseCurve lowers confidence for a missing, unknown or conflicting unit and says why', () => {
    expect(recogniseCurve('GR', '')?.confidence).toBe(0.7);
    const unknown = recogniseCurve('GR', 'CPS');
    expect(unknown?.confidence).toBe(0.5);
    expect(unknown?.reason).toContain('CPS is not a known gamma ray unit');
    const conflict = recogniseCurve('RHOB', 'OHMM');
    expect(conflict?.confidence).toBe(0.2);
    expect(conflict?.unitFactor).toBeNull();
  });

  it('recogniseCurve falls back to the description, preferring the longest phrase', () => {
    expect(recogniseCurve('XR7', 'OHMM', 'Deep induction, phasor')).toMatchObject({ curveClass: 'deep_resistivity', matchedBy: 'description', confidence: 0.6 });
    expect(recogniseCurve('ZZ', 'G/CC', 'Bulk density corrected')?.curveClass).toBe('bulk_density');
  });

  it('recogniseCurve returns null for unknown curves and for a description hit with a conflicting unit', () => {
    expect(recogniseCurve('DEPT', 'FT', 'Depth')).toBeNull();
    expect(recogniseCurve('XYZ', 'G/CC', 'gamma ray')).toBeNull();
  });

  it('the alias table lists each mnemonic under one class only', () => {
    const all = CURVE_CLASSES.flatMap((c) => c.mnemonics);
    expect(new Set(all).size).toBe(all.length);
  });
});
