import { describe, expect, it } from 'vitest';
import { type Distribution } from './distributions.js';
import { percentilesPrms } from './percentiles.js';
import { perTrial, runMonteCarlo, sampleInputs } from './monte-carlo.js';
import { oilInPlace } from './volumetrics.js';

type OilKey = 'area' | 'h' | 'phi' | 'sw' | 'bo';
const OIL: Record<OilKey, Distribution> = {
  area: { kind: 'triangular', min: 400, mode: 640, max: 900 },
  h: { kind: 'lognormal', p90: 20, p10: 45 },
  phi: { kind: 'normal', mean: 0.2, sd: 0.03, truncate: { min: 0.08, max: 0.35 } },
  sw: { kind: 'uniform', min: 0.2, max: 0.4 },
  bo: { kind: 'fixed', value: 1.2 },
};
const oilModel = perTrial<OilKey>((v) => oilInPlace({ areaAcres: v.area, netPayFt: v.h, porosity: v.phi, sw: v.sw, bo: v.bo }));

describe('runMonteCarlo', () => {
  it('runMonteCarlo is reproducible with a seed and changes with another seed', () => {
    const a = runMonteCarlo({ inputs: OIL, model: oilModel, trials: 5000, seed: 42 });
    const b = runMonteCarlo({ inputs: OIL, model: oilModel, trials: 5000, seed: 42 });
    const c = runMonteCarlo({ inputs: OIL, model: oilModel, trials: 5000, seed: 43 });
    expect(Array.from(a.output)).toEqual(Array.from(b.output));
    expect(a.output[0]).not.toBe(c.output[0]);
  });

  it('runMonteCarlo with every input fixed returns the deterministic oilInPlace in every trial', () => {
    const fixed: Record<OilKey, Distribution> = {
      area: { kind: 'fixed', value: 640 },
      h: { kind: 'fixed', value: 30 },
      phi: { kind: 'fixed', value: 0.2 },
      sw: { kind: 'fixed', value: 0.25 },
      bo: { kind: 'fixed', value: 1.2 },
    };
    const det = oilInPlace({ areaAcres: 640, netPayFt: 30, porosity: 0.2, sw: 0.25, bo: 1.2 });
    const r = runMonteCarlo({ inputs: fixed, model: oilModel, trials: 100, seed: 1 });
    for (const v of r.output) expect(v).toBe(det);
    const s = percentilesPrms(r.output);
    expect(s.p90).toBe(det);
    expect(s.p10).toBe(det);
  });

  it('runMonteCarlo output has P90 <= P50 <= P10 and the mean of a product of independent inputs', () => {
    const r = runMonteCarlo({
      inputs: { a: { kind: 'uniform', min: 1, max: 3 }, b: { kind: 'triangular', min: 0, mode: 3, max: 3 } },
      model: (s, n) => {
        const out = new Float64Array(n);
        for (let i = 0; i < n; i++) out[i] = s.a[i] * s.b[i];
        return out;
      },
      trials: 100_000,
      seed: 7,
    });
    const p = percentilesPrms(r.output);
    expect(p.p90).toBeLessThanOrEqual(p.p50);
    expect(p.p50).toBeLessThanOrEqual(p.p10);
    // E[ab] = E[a] E[b] = 2 x (0+3+3)/3 = 4 for independent inputs (by hand); 5 standard errors
    expect(Math.abs(p.mean - 4)).toBeLessThan((5 * p.sd) / Math.sqrt(100_000));
  });

  it('sampleInputs gives an input the same samples whatever other inputs are present (own stream per name)', () => {
    const one = sampleInputs({ phi: OIL.phi }, 1000, 99);
    const all = sampleInputs(OIL, 1000, 99);
    expect(Array.from(one.phi)).toEqual(Array.from(all.phi));
  });

  it('runMonteCarlo rejects bad trials, seed, distributions and model output', () => {
    expect(() => runMonteCarlo({ inputs: OIL, model: oilModel, trials: 0, seed: 1 })).toThrow(/runMonteCarlo: trials/);
    expect(() => runMonteCarlo({ inputs: OIL, model: oilModel, trials: 10, seed: 0.5 })).toThrow(/runMonteCarlo: seed/);
    expect(() =>
      runMonteCarlo({ inputs: { ...OIL, sw: { kind: 'uniform', min: 0.4, max: 0.2 } }, model: oilModel, trials: 10, seed: 1 }),
    ).toThrow(/runMonteCarlo: inputs\.sw\.max must be > min/);
    expect(() => runMonteCarlo({ inputs: OIL, model: () => new Float64Array(3), trials: 10, seed: 1 })).toThrow(
      /runMonteCarlo: model must return/,
    );
  });
});
