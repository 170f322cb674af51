import { describe, expect, it } from 'vitest';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { skipN } from 'pure-rand/utils/skipN';
import { WARM_UP_STEPS, fillUniform, streamSeed } from './random.js';

describe('fillUniform (xoroshiro128+, Blackman & Vigna 2018)', () => {
  it('fillUniform gives the same sequence as pure-rand xoroshiro128plus + uniformFloat64 (reference package)', () => {
    for (const seed of [0, 1, 42, -7, 2147483647, 0xdeadbeef | 0, streamSeed(2024, 'porosity')]) {
      const ours = fillUniform(seed, new Float64Array(20_000));
      const rng = xoroshiro128plus(seed);
      skipN(rng, WARM_UP_STEPS);
      for (let i = 0; i < ours.length; i++) {
        const ref = uniformFloat64(rng);
        if (ours[i] !== ref) throw new Error(`seed ${seed}: draw ${i} differs (${ours[i]} vs ${ref})`);
      }
    }
  });

  it('fillUniform draws have the moments of U(0,1): mean 1/2, variance 1/12 (within 5 standard errors)', () => {
    const n = 200_000;
    const u = fillUniform(12345, new Float64Array(n));
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n; i++) {
      s += u[i];
      s2 += u[i] * u[i];
    }
    const mean = s / n;
    const variance = s2 / n - mean * mean;
    expect(Math.abs(mean - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(5 * Math.sqrt(1 / 180 / n)); // Var(U^2)-based bound, loose
    expect(u.reduce((m, v) => Math.min(m, v), 1)).toBeGreaterThanOrEqual(0);
    expect(u.reduce((m, v) => Math.max(m, v), 0)).toBeLessThan(1);
  });

  it('fillUniform is reproducible for a seed and differs between seeds', () => {
    const a = fillUniform(7, new Float64Array(100));
    const b = fillUniform(7, new Float64Array(100));
    const c = fillUniform(8, new Float64Array(100));
    expect(Array.from(a)).toEqual(Array.from(b));
    expect(Array.from(a)).not.toEqual(Array.from(c));
    expect(() => fillUniform(1.5, new Float64Array(1))).toThrow(/fillUniform: seed/);
  });

  it('streamSeed gives different streams per input name and per case seed', () => {
    const names = ['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'];
    const seeds = new Set(names.map((n) => streamSeed(1, n)));
    expect(seeds.size).toBe(names.length);
    expect(streamSeed(1, 'area')).not.toBe(streamSeed(2, 'area'));
    expect(streamSeed(1, 'area')).toBe(streamSeed(1, 'area'));
  });
});
