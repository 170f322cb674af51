import { describe, expect, it } from 'vitest';
import {
  clavier,
  gammaRayIndex,
  gammaRayPercentiles,
  larionovOlder,
  larionovTertiary,
  shaleVolume,
  steiber,
  vshFromIndex,
} from './shale-volume.js';

describe('shale volume from gamma ray', () => {
  it('gammaRayIndex(60, 20, 120) is 0.4 and clips to [0, 1] outside the GR range', () => {
    // Definition IGR = (GR - GRmin)/(GRmax - GRmin): Asquith & Krygowski (2004) ch. 3; hand-computed.
    expect(gammaRayIndex(60, 20, 120)).toBeCloseTo(0.4, 12);
    expect(gammaRayIndex(10, 20, 120)).toBe(0);
    expect(gammaRayIndex(150, 20, 120)).toBe(1);
    expect(Number.isNaN(gammaRayIndex(NaN, 20, 120))).toBe(true);
  });

  it('larionovTertiary(0.5) = 0.083 (2^1.85 - 1) = 0.2162 and reaches 0.9957 at IGR = 1', () => {
    // Larionov (1969) Tertiary form 0.083(2^(3.7 IGR) - 1) as printed in Asquith & Krygowski (2004)
    // // from memory; values hand-computed: 2^1.85 = 3.6050, 2^3.7 = 12.996.
    expect(larionovTertiary(0.5)).toBeCloseTo(0.083 * (3.60500 - 1), 4);
    expect(larionovTertiary(1)).toBeCloseTo(0.9957, 4);
    expect(larionovTertiary(0)).toBe(0);
  });

  it('larionovOlder(0.5) = 0.33 and larionovOlder(1) = 0.99', () => {
    // Larionov (1969) older rocks 0.33(2^(2 IGR) - 1) // from memory; 2^1 - 1 = 1, 2^2 - 1 = 3.
    expect(larionovOlder(0.5)).toBeCloseTo(0.33, 12);
    expect(larionovOlder(1)).toBeCloseTo(0.99, 12);
  });

  it('steiber(0.5) = 0.25 and steiber(1) = 1', () => {
    // Steiber (1970) SPE 2961, Vsh = IGR/(3 - 2 IGR) // from memory; 0.5/2 = 0.25.
    expect(steiber(0.5)).toBeCloseTo(0.25, 12);
    expect(steiber(1)).toBeCloseTo(1, 12);
  });

  it('clavier(0) = 0, clavier(1) = 1 and clavier(0.5) = 1.7 - sqrt(1.94) = 0.30716', () => {
    // Clavier, Hoyle & Meunier (1971) JPT 23(6): 1.7 - sqrt(3.38 - (IGR+0.7)^2) // from memory.
    // Endpoints exact: 3.38 - 0.49 = 2.89 = 1.7^2; 3.38 - 2.89 = 0.49 = 0.7^2.
    expect(clavier(0)).toBeCloseTo(0, 12);
    expect(clavier(1)).toBeCloseTo(1, 12);
    expect(clavier(0.5)).toBeCloseTo(1.7 - Math.sqrt(1.94), 12);
    expect(clavier(0.5)).toBeCloseTo(0.30716, 5);
  });

  it('vshFromIndex orders the methods linear > Larionov older > Clavier > Steiber > Larionov tertiary at mid-range', () => {
    // Ordering of the curves as plotted in Asquith & Krygowski (2004) ch. 3, Vsh vs IGR chart // from memory.
    for (const igr of [0.3, 0.5, 0.7]) {
      const v = (m: Parameters<typeof vshFromIndex>[0]) => vshFromIndex(m, igr);
      expect(v('linear')).toBeGreaterThan(v('larionov_older'));
      expect(v('larionov_older')).toBeGreaterThan(v('clavier'));
      expect(v('clavier')).toBeGreaterThan(v('steiber'));
      expect(v('steiber')).toBeGreaterThan(v('larionov_tertiary'));
    }
  });

  it('shaleVolume clips the index before Larionov and Clavier so Vsh stays in [0, 1], NaN passes', () => {
    const out = shaleVolume([0, 20, 70, 120, 200, NaN], { method: 'clavier', grClean: 20, grShale: 120 });
    expect(out[0]).toBe(0);
    expect(out[1]).toBeCloseTo(0, 12);
    expect(out[2]).toBeCloseTo(0.30716, 5);
    expect(out[3]).toBeCloseTo(1, 12);
    expect(out[4]).toBeCloseTo(1, 12); // unclipped index 1.8 would make the root imaginary
    expect(Number.isNaN(out[5])).toBe(true);
  });

  it('shaleVolume refuses grShale <= grClean, naming the field', () => {
    expect(() => shaleVolume([50], { method: 'linear', grClean: 100, grShale: 100 })).toThrow('shaleVolume: grShale must be > grClean');
  });

  it('gammaRayPercentiles(1..101, 5, 95) gives 6 and 96 (type 7 interpolation, hand-computed)', () => {
    const gr = Float64Array.from({ length: 101 }, (_, i) => i + 1);
    const p = gammaRayPercentiles(gr, 0, gr.length, 5, 95);
    expect(p.grClean).toBeCloseTo(6, 12);
    expect(p.grShale).toBeCloseTo(96, 12);
    expect(() => gammaRayPercentiles(new Float64Array([50, 50, 50]), 0, 3, 5, 95)).toThrow(/no GR contrast/);
  });
});
