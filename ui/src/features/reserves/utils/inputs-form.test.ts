import { describe, expect, it } from 'vitest';
import type { CaseInputs } from '../../../types/reserves';
import { formValuesOf, inputsFormSchema, patchOf, scaleDistributionForm } from './inputs-form';

const inputs: CaseInputs = {
  weighting: 'thickness',
  drainageAreas: {},
  wellOverrides: {},
  overrides: {},
  areaUnit: 'acre',
  lengthUnit: 'ft',
  area: 640,
  fluid: 'oil',
  bo: 1.2,
  gas: null,
  recoveryFactor: 0.3,
  standard: { pressurePsia: 14.696, temperatureF: 60 },
  distributions: { area: { kind: 'triangular', min: 480, mode: 640, max: 900 } },
  correlations: [],
  trials: 100000,
  declineChecks: {},
};

describe('case inputs form', () => {
  it('round-trips stored inputs to the PATCH body', () => {
    const values = formValuesOf(inputs, 42);
    expect(inputsFormSchema.safeParse(values).success).toBe(true);
    const { inputs: patch, seed } = patchOf(values);
    expect(seed).toBe(42);
    expect(patch).toMatchObject({ area: 640, bo: 1.2, recoveryFactor: 0.3, trials: 100000, distributions: { area: inputs.distributions.area } });
  });

  it('names the field at fault: a gas case needs pressure, gravity in the Sutton range, and no Bo distribution', () => {
    const values = { ...formValuesOf(inputs, 1), fluid: 'gas' as const, gasPressure: '', gasGravity: '2.1', gasTemperature: '180' };
    values.dist = { ...values.dist, bo: { kind: 'uniform', a: '1', b: '2', c: '', truncMin: '', truncMax: '' } };
    const r = inputsFormSchema.safeParse(values);
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['gasPressure', 'gasGravity', 'dist.bo.kind']));
  });

  it('a unit change scales a distribution form (1 acre = 0.0040468564224 km2, NIST SP 811)', () => {
    const f = scaleDistributionForm({ kind: 'uniform', a: '100', b: '', c: '', truncMin: '', truncMax: '300' }, 0.0040468564224);
    // the form keeps 10 significant digits
    expect(Number(f.a)).toBeCloseTo(0.40468564224, 9);
    expect(f.b).toBe('');
    expect(Number(f.truncMax)).toBeCloseTo(1.21405692672, 9);
  });

  it('rank correlations: round-trip to the PATCH body; each problem named on its row and field', () => {
    const withDists: CaseInputs = {
      ...inputs,
      distributions: { ...inputs.distributions, porosity: { kind: 'uniform', min: 0.15, max: 0.25 }, sw: { kind: 'uniform', min: 0.2, max: 0.4 } },
      correlations: [{ a: 'porosity', b: 'sw', rank: -0.6 }],
    };
    const values = formValuesOf(withDists, 1);
    expect(values.correlations).toEqual([{ a: 'porosity', b: 'sw', rank: '-0.6' }]);
    expect(inputsFormSchema.safeParse(values).success).toBe(true);
    expect(patchOf(values).inputs.correlations).toEqual([{ a: 'porosity', b: 'sw', rank: -0.6 }]);

    const bad = {
      ...values,
      correlations: [
        { a: 'porosity' as const, b: 'sw' as const, rank: '1.5' },
        { a: 'sw' as const, b: 'sw' as const, rank: '0.2' },
        { a: 'sw' as const, b: 'porosity' as const, rank: '0.1' },
        { a: 'bo' as const, b: 'area' as const, rank: '0.3' },
      ],
    };
    const r = inputsFormSchema.safeParse(bad);
    expect(r.success).toBe(false);
    const byPath = Object.fromEntries(r.error!.issues.map((i) => [i.path.join('.'), i.message]));
    expect(byPath['correlations.0.rank']).toMatch(/from -0.99 to 0.99/);
    expect(byPath['correlations.1.b']).toMatch(/two different inputs/);
    expect(byPath['correlations.2.b']).toMatch(/already correlated/);
    expect(byPath['correlations.3.a']).toMatch(/Give this input a distribution first/);
  });
});
