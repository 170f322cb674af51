import { describe, expect, it } from 'vitest';
import {
  type Distribution,
  distributionQuantile,
  lognormalFromMeanSd,
  lognormalFromP90P10,
  lognormalSummary,
  sampleDistribution,
} from './distributions.js';
import { normalCdf } from './normal.js';
import { fillUniform } from './random.js';

const N = 200_000;
const U = fillUniform(20240601, new Float64Array(N));

function moments(x: Float64Array): { mean: number; sd: number } {
  let s = 0;
  for (const v of x) s += v;
  const mean = s / x.length;
  let s2 = 0;
  for (const v of x) s2 += (v - mean) ** 2;
  return { mean, sd: Math.sqrt(s2 / x.length) };
}

describe('lognormal conversions (Aitchison & Brown 1957 moments; PRMS 2018 P90/P10)', () => {
  it('lognormalFromMeanSd(100, 30) gives sigma^2 = ln(1.09), mu = ln 100 - sigma^2/2 (by hand)', () => {
    const p = lognormalFromMeanSd(100, 30);
    expect(p.sigma).toBeCloseTo(Math.sqrt(Math.log(1.09)), 14); // 0.293560
    expect(p.mu).toBeCloseTo(Math.log(100) - Math.log(1.09) / 2, 14); // 4.562081
  });

  it('lognormalSummary(lognormalFromMeanSd(m, s)) round-trips the mean and sd', () => {
    for (const [m, s] of [[100, 30], [0.2, 0.05], [5e6, 1e7]] as const) {
      const r = lognormalSummary(lognormalFromMeanSd(m, s));
      expect(r.mean / m).toBeCloseTo(1, 12);
      expect(r.sd / s).toBeCloseTo(1, 12);
    }
  });

  it('lognormalSummary(lognormalFromP90P10(p90, p10)) round-trips P90 and P10, P50 = sqrt(P90 P10)', () => {
    const r = lognormalSummary(lognormalFromP90P10(50, 200));
    expect(r.p90).toBeCloseTo(50, 10);
    expect(r.p10).toBeCloseTo(200, 10);
    expect(r.p50).toBeCloseTo(100, 10); // geometric mean of P90 and P10, by hand
    expect(r.mean).toBeGreaterThan(r.p50); // right-skewed
  });

  it('lognormalFromP90P10 rejects P90 >= P10 (P90 is the low value)', () => {
    expect(() => lognormalFromP90P10(200, 50)).toThrow(/lognormalFromP90P10: p10 must be > p90/);
    expect(() => lognormalFromMeanSd(-1, 2)).toThrow(/lognormalFromMeanSd: mean/);
  });
});

describe('distributionQuantile', () => {
  it('distributionQuantile of uniform, triangular and normal match closed forms', () => {
    expect(distributionQuantile({ kind: 'uniform', min: 10, max: 20 }, 0.1)).toBeCloseTo(11, 12);
    // Symmetric triangle: median at the mode; 10th percentile = a + sqrt(0.1 * 2 * 1) = 0.4472
    expect(distributionQuantile({ kind: 'triangular', min: 0, mode: 1, max: 2 }, 0.5)).toBeCloseTo(1, 12);
    expect(distributionQuantile({ kind: 'triangular', min: 0, mode: 1, max: 2 }, 0.1)).toBeCloseTo(Math.sqrt(0.2), 12);
    expect(distributionQuantile({ kind: 'normal', mean: 5, sd: 2 }, 0.9)).toBeCloseTo(5 + 2 * 1.2815515655446004, 12);
    expect(distributionQuantile({ kind: 'fixed', value: 3 }, 0.9)).toBe(3);
  });

  it('distributionQuantile of a truncated normal stays inside the truncation', () => {
    const d: Distribution = { kind: 'normal', mean: 0.2, sd: 0.05, truncate: { min: 0.15, max: 0.3 } };
    expect(distributionQuantile(d, 0)).toBeCloseTo(0.15, 12);
    expect(distributionQuantile(d, 1)).toBeCloseTo(0.3, 12);
  });
});

describe('sampleDistribution (inversion of seeded uniforms)', () => {
  it('uniform samples: P90/P50/P10 close to analytic (within 4 standard errors of a quantile)', () => {
    const x = Float64Array.from(sampleDistribution({ kind: 'uniform', min: 100, max: 300 }, U)).sort();
    const se = (p: number) => 4 * Math.sqrt((p * (1 - p)) / N) * 200;
    expect(Math.abs(x[Math.floor(0.1 * N)] - 120)).toBeLessThan(se(0.1));
    expect(Math.abs(x[Math.floor(0.5 * N)] - 200)).toBeLessThan(se(0.5));
    expect(Math.abs(x[Math.floor(0.9 * N)] - 280)).toBeLessThan(se(0.9));
  });

  it('triangular samples have mean (a+b+c)/3 and the closed-form sd (within 5 standard errors)', () => {
    const [a, c, b] = [10, 15, 40];
    const m = moments(sampleDistribution({ kind: 'triangular', min: a, mode: c, max: b }, U));
    const sd = Math.sqrt((a * a + b * b + c * c - a * b - a * c - b * c) / 18);
    expect(Math.abs(m.mean - (a + b + c) / 3)).toBeLessThan((5 * sd) / Math.sqrt(N));
    expect(Math.abs(m.sd / sd - 1)).toBeLessThan(0.01);
  });

  it('lognormal samples (mean/sd form) reproduce the mean and sd', () => {
    const m = moments(sampleDistribution({ kind: 'lognormal', mean: 0.25, sd: 0.05 }, U));
    expect(Math.abs(m.mean - 0.25)).toBeLessThan((5 * 0.05) / Math.sqrt(N));
    expect(Math.abs(m.sd / 0.05 - 1)).toBeLessThan(0.02);
  });

  it('truncated normal samples lie in range and have the truncated-normal mean', () => {
    const [mu, s, lo, hi] = [0.2, 0.05, 0.15, 0.3];
    const x = sampleDistribution({ kind: 'normal', mean: mu, sd: s, truncate: { min: lo, max: hi } }, U);
    expect(x.reduce((m, v) => Math.min(m, v), Infinity)).toBeGreaterThanOrEqual(lo);
    expect(x.reduce((m, v) => Math.max(m, v), -Infinity)).toBeLessThanOrEqual(hi);
    // Truncated normal mean: mu + s (phi(alpha) - phi(beta)) / (Phi(beta) - Phi(alpha)) (Johnson, Kotz & Balakrishnan 1994, ch. 13)
    const phi = (z: number) => Math.exp(-z * z / 2) / Math.sqrt(2 * Math.PI);
    const [al, be] = [(lo - mu) / s, (hi - mu) / s];
    const expected = mu + (s * (phi(al) - phi(be))) / (normalCdf(be) - normalCdf(al));
    expect(Math.abs(moments(x).mean - expected)).toBeLessThan((5 * s) / Math.sqrt(N));
  });

  it('sampleDistribution of a fixed input returns the value everywhere; inputs are not modified', () => {
    const u = Float64Array.from([0.1, 0.5, 0.9]);
    expect(Array.from(sampleDistribution({ kind: 'fixed', value: 7 }, u))).toEqual([7, 7, 7]);
    sampleDistribution({ kind: 'uniform', min: 0, max: 1 }, u);
    expect(Array.from(u)).toEqual([0.1, 0.5, 0.9]);
  });

  it('sampleDistribution rejects bad parameters naming the field', () => {
    expect(() => sampleDistribution({ kind: 'normal', mean: 1, sd: 0 }, U)).toThrow(/distribution\.sd must be > 0/);
    expect(() => sampleDistribution({ kind: 'triangular', min: 0, mode: 5, max: 2 }, U)).toThrow(/distribution\.mode/);
    expect(() => sampleDistribution({ kind: 'uniform', min: 0, max: 1, truncate: { min: 2, max: 3 } }, U)).toThrow(
      /truncate leaves no probability/,
    );
    expect(() => sampleDistribution({ kind: 'beta' } as unknown as Distribution, U)).toThrow(/distribution\.kind/);
  });
});

describe('truncation bounds far out in a tail', () => {
  it('distributionQuantile of N(0.2, 0.02) truncated to [0, 1] stays finite and inside the bounds', () => {
    // 1 is 40 sd above the mean: F(1) rounds to 1 in double precision, so the untruncated
    // inverse at p = 1 is infinite; the truncated distribution ends at 1.
    const d = { kind: 'normal', mean: 0.2, sd: 0.02, truncate: { min: 0, max: 1 } } as const;
    expect(distributionQuantile(d, 1)).toBe(1);
    expect(distributionQuantile(d, 0)).toBeGreaterThanOrEqual(0);
    // Median unchanged by bounds 10 and 40 sd away: mean of a symmetric normal (exact).
    expect(distributionQuantile(d, 0.5)).toBeCloseTo(0.2, 9);
  });
});
