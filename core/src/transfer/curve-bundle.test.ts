import { describe, expect, it } from 'vitest';
import { decodeCurveBundle, encodeCurveBundle } from './curve-bundle.js';

describe('curve bundle', () => {
  it('decodeCurveBundle(encodeCurveBundle(x)) gives back names, units and every value, NaN included', () => {
    const depth = new Float64Array([1000, 1000.5, 1001]);
    const gr = new Float64Array([45.25, NaN, 120.125]);
    const bytes = encodeCurveBundle(
      [
        { mnemonic: 'DEPT', unit: 'ft' },
        { mnemonic: 'GR', unit: 'gAPI', curveClass: 'gamma_ray' },
      ],
      [depth, gr],
    );
    const back = decodeCurveBundle(bytes);
    expect(back.entries.map((e) => e.mnemonic)).toEqual(['DEPT', 'GR']);
    expect(back.entries[1].curveClass).toBe('gamma_ray');
    expect(Array.from(back.values[0])).toEqual([1000, 1000.5, 1001]);
    expect(back.values[1][0]).toBe(45.25);
    expect(Number.isNaN(back.values[1][1])).toBe(true);
    expect(back.values[1][2]).toBe(120.125);
  });

  it('encodeCurveBundle refuses curves of unequal length, naming the curve', () => {
    expect(() => encodeCurveBundle([{ mnemonic: 'A', unit: '' }, { mnemonic: 'B', unit: '' }], [new Float64Array(2), new Float64Array(3)])).toThrow(
      /curve B has 3 samples/,
    );
  });

  it('decodeCurveBundle refuses bytes that are not a bundle and truncated data', () => {
    expect(() => decodeCurveBundle(new Uint8Array([1, 2, 3, 4, 5, 6, 7, 8]))).toThrow(/bad magic/);
    const ok = encodeCurveBundle([{ mnemonic: 'A', unit: '' }], [new Float64Array([1, 2, 3])]);
    expect(() => decodeCurveBundle(ok.subarray(0, ok.length - 4))).toThrow(/truncated data/);
  });
});
