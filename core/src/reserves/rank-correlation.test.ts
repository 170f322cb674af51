import fc from 'fast-check';
import { sampleRankCorrelation as ssRankCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { distributionQuantile, type Distribution } from './distributions.js';
import { sampleInputs } from './monte-carlo.js';
import { choleskyLower, normalCorrelationForRank, ranks, sampleRankCorrelation } from './rank-correlation.js';
import { evaluateReservesCase, TORNADO_CORRELATION_NOTE, type ReservesCaseInput } from './reserves-case.js';

/** Standard error of a sample Spearman correlation near rho_s: about (1 - rho_s^2) / sqrt(n) (common practice; conservative). */
const se = (rs: number, n: number) => (1 - rs * rs + 0.1) / Math.sqrt(n);

describe('sampleRankCorrelation', () => {
  it('equals simple-statistics sampleRankCorrelation (the reference), ties included', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: -5, max: 5 }), fc.double({ min: -10, max: 10, noNaN: true })), { minLength: 3, maxLength: 60 }), (pairs) => {
        const x = Float64Array.from(pairs, (p) => p[0]);
        const y = Float64Array.from(pairs, (p) => p[1]);
        const ref = ssRankCorrelation(Array.from(x), Array.from(y));
        const ours = sampleRankCorrelation(x, y);
        if (Number.isNaN(ref)) return Number.isNaN(ours);
        return Math.abs(ours - ref) < 1e-12;
      }),
      { numRuns: 300 },
    );
  });

  it('ranks ties by their average rank, negatives and -0 in their numeric order', () => {
    expect(Array.from(ranks(Float64Array.from([10, 20, 10, 30, 20, 20])))).toEqual([1.5, 4, 1.5, 6, 4, 4]);
    expect(Array.from(ranks(Float64Array.from([-1e300, 3, -0, -2.5, 0, Infinity, -Infinity, 1e-310])))).toEqual([2, 7, 4.5, 3, 4.5, 8, 1, 6]);
  });

  it('the radix order equals a plain numeric sort (fast-check, any finite doubles)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true }), { minLength: 1, maxLength: 200 }), (xs) => {
        const x = Float64Array.from(xs);
        const r = ranks(x);
        const sorted = [...xs].sort((a, b) => a - b);
        return xs.every((v, i) => {
          const first = sorted.findIndex((s) => s === v);
          const last = sorted.length - 1 - [...sorted].reverse().findIndex((s) => s === v);
          return r[i] === (first + 1 + last + 1) / 2;
        });
      }),
      { numRuns: 300 },
    );
  });
});

describe('normalCorrelationForRank: rho = 2 sin(pi rho_s / 6) (Kruskal 1958)', () => {
  it('fixes -1, 0 and 1 and is odd', () => {
    expect(normalCorrelationForRank(0)).toBe(0);
    expect(normalCorrelationForRank(1)).toBeCloseTo(1, 15);
    expect(normalCorrelationForRank(-0.4)).toBe(-normalCorrelationForRank(0.4));
  });

  it('bivariate normal scores with that Pearson correlation have the asked rank correlation (sampled check)', () => {
    const n = 40_000;
    for (const target of [-0.7, 0.3, 0.8]) {
      const s = sampleInputs(
        { x: { kind: 'normal', mean: 0, sd: 1 }, y: { kind: 'normal', mean: 0, sd: 1 } } as Record<'x' | 'y', Distribution>,
        n,
        11,
        'test',
        [{ a: 'x', b: 'y', rank: target }],
      );
      expect(Math.abs(sampleRankCorrelation(s.x, s.y) - target)).toBeLessThan(4 * se(target, n));
    }
  });
});

describe('choleskyLower', () => {
  it('factors a positive definite matrix (L L^T = m) and refuses one that is not', () => {
    const m = [
      [4, 2, 0.4],
      [2, 5, 1],
      [0.4, 1, 3],
    ];
    const l = choleskyLower(m);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) expect(l[i].reduce((s, v, k) => s + v * l[j][k], 0)).toBeCloseTo(m[i][j], 12);
    expect(() =>
      choleskyLower([
        [1, 0.9, -0.9],
        [0.9, 1, 0.9],
        [-0.9, 0.9, 1],
      ]),
    ).toThrow(/not positive definite/);
  });
});

describe('sampleInputs with correlations', () => {
  const inputs: Record<'area' | 'porosity' | 'sw' | 'rf', Distribution> = {
    area: { kind: 'triangular', min: 500, mode: 800, max: 1500 },
    porosity: { kind: 'normal', mean: 0.2, sd: 0.03, truncate: { min: 0.1, max: 0.3 } },
    sw: { kind: 'triangular', min: 0.15, mode: 0.3, max: 0.55 },
    rf: { kind: 'fixed', value: 0.3 },
  };
  const n = 50_000;

  it('draws the asked rank correlation, keeps each distribution, and leaves the other inputs as an independent run draws them', () => {
    const free = sampleInputs(inputs, n, 7);
    const tied = sampleInputs(inputs, n, 7, 'test', [{ a: 'porosity', b: 'sw', rank: -0.6 }]);
    expect(Math.abs(sampleRankCorrelation(tied.porosity, tied.sw) + 0.6)).toBeLessThan(4 * se(0.6, n));
    expect(Math.abs(sampleRankCorrelation(free.porosity, free.sw))).toBeLessThan(4 * se(0, n));
    expect(tied.area).toEqual(free.area);
    for (const k of ['porosity', 'sw'] as const) {
      const sorted = Float64Array.from(tied[k]).sort();
      for (const p of [0.1, 0.5, 0.9]) {
        // The sample quantile of an exact distribution lies within a few 1/sqrt(n) in probability (common practice).
        const q = sorted[Math.floor(p * n)];
        const lo = distributionQuantile(inputs[k], Math.max(0, p - 0.01));
        const hi = distributionQuantile(inputs[k], Math.min(1, p + 0.01));
        expect(q).toBeGreaterThanOrEqual(lo);
        expect(q).toBeLessThanOrEqual(hi);
      }
      expect(Math.min(...tied[k])).toBeGreaterThanOrEqual(k === 'porosity' ? 0.1 : 0.15);
      expect(Math.max(...tied[k])).toBeLessThanOrEqual(k === 'porosity' ? 0.3 : 0.55);
    }
  });

  it('three inputs at once: each pair near its target; the same seed gives the same draws', () => {
    const c = [
      { a: 'porosity' as const, b: 'sw' as const, rank: -0.5 },
      { a: 'area' as const, b: 'porosity' as const, rank: 0.3 },
    ];
    const s1 = sampleInputs(inputs, n, 3, 'test', c);
    const s2 = sampleInputs(inputs, n, 3, 'test', c);
    expect(s1.sw).toEqual(s2.sw);
    expect(Math.abs(sampleRankCorrelation(s1.porosity, s1.sw) + 0.5)).toBeLessThan(4 * se(0.5, n));
    expect(Math.abs(sampleRankCorrelation(s1.area, s1.porosity) - 0.3)).toBeLessThan(4 * se(0.3, n));
    expect(Math.abs(sampleRankCorrelation(s1.area, s1.sw))).toBeLessThan(0.3); // induced, not asked: weaker than either
  });

  it('refuses, naming the entry: an unknown or fixed input, a pair with itself or twice, a rank out of range, contradictory pairs', () => {
    const run = (c: { a: string; b: string; rank: number }[]) => () => sampleInputs(inputs, 10, 1, 'test', c as never);
    expect(run([{ a: 'porosity', b: 'perm', rank: 0.2 }])).toThrow(/correlations\[0\]\.b must be one of area, porosity, sw, rf/);
    expect(run([{ a: 'rf', b: 'sw', rank: 0.2 }])).toThrow(/correlations\[0\]\.a: rf is fixed/);
    expect(run([{ a: 'sw', b: 'sw', rank: 0.2 }])).toThrow(/two different inputs/);
    expect(run([{ a: 'sw', b: 'porosity', rank: 0.2 }, { a: 'porosity', b: 'sw', rank: 0.1 }])).toThrow(/correlations\[1\]: the pair porosity and sw is given twice/);
    expect(run([{ a: 'sw', b: 'porosity', rank: 1 }])).toThrow(/correlations\[0\]\.rank must be a number in \[-0.99, 0.99\]/);
    expect(
      run([
        { a: 'area', b: 'porosity', rank: 0.9 },
        { a: 'porosity', b: 'sw', rank: 0.9 },
        { a: 'area', b: 'sw', rank: -0.9 },
      ]),
    ).toThrow(/contradict each other/);
  });
});

describe('evaluateReservesCase with correlated inputs', () => {
  const base: ReservesCaseInput = {
    fluid: 'oil',
    area: 800,
    areaUnit: 'acre',
    netPay: 30,
    porosity: 0.2,
    sw: 0.3,
    recoveryFactor: 0.3,
    bo: 1.2,
    distributions: {
      porosity: { kind: 'normal', mean: 0.2, sd: 0.03, truncate: { min: 0.1, max: 0.3 } },
      sw: { kind: 'triangular', min: 0.15, mode: 0.3, max: 0.55 },
    },
    monteCarlo: { trials: 20_000, seed: 5 },
  };

  it('porosity against Sw at -0.7 widens the in-place P90-P10 spread (phi and 1 - Sw move together) and reports the sampled rank correlation', () => {
    const free = evaluateReservesCase(base).probabilistic!;
    const tied = evaluateReservesCase({ ...base, correlations: [{ a: 'porosity', b: 'sw', rank: -0.7 }] });
    const p = tied.probabilistic!;
    const spread = (r: typeof free) => r.inPlace.field.p10 / r.inPlace.field.p90;
    expect(spread(p)).toBeGreaterThan(spread(free) * 1.05);
    expect(p.correlations).toHaveLength(1);
    expect(p.correlations[0]).toMatchObject({ a: 'porosity', b: 'sw', rank: -0.7 });
    expect(Math.abs(p.correlations[0].sampled + 0.7)).toBeLessThan(4 * se(0.7, 20_000));
    expect(free.correlations).toEqual([]);
    expect(tied.notes).toContain(TORNADO_CORRELATION_NOTE);
  });

  it('a correlation with an input held fixed is refused, naming it', () => {
    expect(() => evaluateReservesCase({ ...base, correlations: [{ a: 'area', b: 'sw', rank: 0.3 }] })).toThrow(/correlations\[0\]\.a: area is fixed/);
  });
});
