import { distributionQuantile, normalCdf } from '@poreline/core';
import { describe, expect, it } from 'vitest';
import { tightenFarTails } from './distribution-tails.js';

describe('tightenFarTails', () => {
  it('pulls a normal truncated far out in the upper tail in to mean + 8 SD, so the support is finite', () => {
    const d = { kind: 'normal' as const, mean: 0.2, sd: 0.02, truncate: { min: 0, max: 1 } };
    expect(distributionQuantile(d, 1)).toBe(Infinity); // the far bound rounds to probability 1
    const t = tightenFarTails(d);
    expect(t.tightened).toBe(true);
    expect(t.distribution).toEqual({ kind: 'normal', mean: 0.2, sd: 0.02, truncate: { min: 0.2 - 8 * 0.02, max: 0.2 + 8 * 0.02 } });
    const top = distributionQuantile(t.distribution, 1);
    // finite and at the new bound (the inverse of Phi near 1 - 6e-16 is good to about 1e-3 SD)
    expect(top).toBeGreaterThan(0.359);
    expect(top).toBeLessThanOrEqual(0.36 + 1e-12);
    // probability left out on each side: 1 - Phi(8) = 6.2e-16 (standard normal table, Abramowitz & Stegun 1964, 26.2)
    expect(1 - normalCdf(8)).toBeLessThan(1.3e-15);
  });

  it('leaves a bound inside 8 SD, and a distribution without truncation, unchanged', () => {
    const d = { kind: 'normal' as const, mean: 0.2, sd: 0.02, truncate: { min: 0.15, max: 0.25 } };
    expect(tightenFarTails(d)).toEqual({ distribution: d, tightened: false });
    const u = { kind: 'uniform' as const, min: 0, max: 1 };
    expect(tightenFarTails(u).tightened).toBe(false);
  });

  it('works in log space for a lognormal given by P90/P10', () => {
    const d = { kind: 'lognormal' as const, p90: 0.2, p10: 0.4, truncate: { max: 100 } };
    const t = tightenFarTails(d);
    expect(t.tightened).toBe(true);
    // mu = ln(sqrt(0.08)), sigma = ln 2 / (2 x 1.2815515655446004): exp(mu + 8 sigma) by hand
    const mu = Math.log(Math.sqrt(0.08));
    const sigma = Math.log(2) / (2 * 1.2815515655446004);
    expect((t.distribution as { truncate: { max: number } }).truncate.max).toBeCloseTo(Math.exp(mu + 8 * sigma), 10);
  });
});
