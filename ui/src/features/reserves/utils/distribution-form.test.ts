import { describe, expect, it } from 'vitest';
import { distributionFormErrors, distributionFromForm, distributionPercentiles, formFromDistribution, lognormalBothForms } from './distribution-form';

describe('distribution form', () => {
  it('round-trips each kind through core Distribution, with truncation', () => {
    const tri = { kind: 'triangular' as const, min: 480, mode: 640, max: 900, truncate: { max: 850 } };
    expect(distributionFromForm(formFromDistribution(tri))).toEqual(tri);
    const ln = { kind: 'lognormal' as const, p90: 0.2, p10: 0.4 };
    expect(distributionFromForm(formFromDistribution(ln))).toEqual(ln);
    expect(distributionFromForm(formFromDistribution(undefined))).toBeUndefined();
  });

  it('names the field at fault: a missing number, max below min', () => {
    expect(distributionFormErrors({ kind: 'uniform', a: '', b: '2', c: '', truncMin: '', truncMax: '' })).toEqual({ a: 'Min must be a number' });
    const errors = distributionFormErrors({ kind: 'uniform', a: '3', b: '2', c: '', truncMin: '', truncMax: '' });
    expect(errors.b).toMatch(/max must be > min/);
  });

  it('a lognormal by P90/P10 shows its mean and SD; by mean/SD shows its P90/P10 (same numbers back)', () => {
    // lognormal: mu = (ln 50 + ln 200)/2 = ln 100, sigma = ln 4 / (2 x 1.2815515655446004) (standard normal table)
    const s = lognormalBothForms({ kind: 'lognormal-percentiles', a: '50', b: '200', c: '', truncMin: '', truncMax: '' })!;
    expect(s.mu).toBeCloseTo(Math.log(100), 12);
    expect(s.sigma).toBeCloseTo(Math.log(4) / (2 * 1.2815515655446004), 12);
    const back = lognormalBothForms({ kind: 'lognormal-moments', a: String(s.mean), b: String(s.sd), c: '', truncMin: '', truncMax: '' })!;
    expect(back.p90).toBeCloseTo(50, 8);
    expect(back.p10).toBeCloseTo(200, 8);
  });

  it('P90 of an input is its 10th percentile (uniform 0..10 -> P90 1, P10 9; PRMS exceedance)', () => {
    expect(distributionPercentiles({ kind: 'uniform', a: '0', b: '10', c: '', truncMin: '', truncMax: '' })).toEqual({ p90: 1, p50: 5, p10: 9 });
  });
});
