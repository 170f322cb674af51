import { z } from 'zod';
import type { CaseInputs, CaseInputsPatch, InputName } from '../../../types/reserves';
import { EMPTY_DISTRIBUTION, distributionFormErrors, distributionFromForm, formFromDistribution, type DistributionForm } from './distribution-form';

/**
 * The case inputs form: values as typed (strings), checked with zod (each message names the
 * field), and turned into the PATCH body. Empty optional numbers are saved as "not set"; the
 * run then says which input is missing.
 */

export const INPUT_ORDER: readonly InputName[] = ['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'];

export interface InputsFormValues {
  area: string;
  areaUnit: 'acre' | 'km2';
  lengthUnit: 'ft' | 'm';
  fluid: 'oil' | 'gas';
  bo: string;
  gasPressure: string;
  gasTemperature: string;
  gasGravity: string;
  zMethod: 'dak' | 'hall-yarborough';
  recoveryFactor: string;
  stdPressure: string;
  stdTemperature: string;
  trials: string;
  seed: string;
  dist: Record<InputName, DistributionForm>;
  /** Rank correlations as typed. */
  correlations: CorrelationForm[];
}

export interface CorrelationForm {
  a: InputName;
  b: InputName;
  rank: string;
}

/** Largest |rank correlation| the service accepts. */
export const MAX_RANK = 0.99;

const s = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));
const num = (v: string) => Number(v.trim());
const blank = (v: string) => v.trim() === '';

export function formValuesOf(inputs: CaseInputs, seed: number): InputsFormValues {
  const dist = {} as Record<InputName, DistributionForm>;
  for (const k of INPUT_ORDER) dist[k] = formFromDistribution(inputs.distributions[k]);
  return {
    area: s(inputs.area),
    areaUnit: inputs.areaUnit,
    lengthUnit: inputs.lengthUnit,
    fluid: inputs.fluid,
    bo: s(inputs.bo),
    gasPressure: s(inputs.gas?.pressurePsia),
    gasTemperature: s(inputs.gas?.temperatureF),
    gasGravity: s(inputs.gas?.gasGravity),
    zMethod: inputs.gas?.zMethod ?? 'dak',
    recoveryFactor: s(inputs.recoveryFactor),
    stdPressure: s(inputs.standard.pressurePsia),
    stdTemperature: s(inputs.standard.temperatureF),
    trials: String(inputs.trials),
    seed: String(seed),
    dist,
    correlations: (inputs.correlations ?? []).map((c) => ({ a: c.a, b: c.b, rank: String(c.rank) })),
  };
}

const text = z.string();
const distForm = z.object({ kind: z.enum(['base', 'uniform', 'triangular', 'normal', 'lognormal-moments', 'lognormal-percentiles']), a: text, b: text, c: text, truncMin: text, truncMax: text });

function check(ctx: z.RefinementCtx, path: (string | number)[], ok: boolean, message: string) {
  if (!ok) ctx.addIssue({ code: 'custom', path, message });
}

export const inputsFormSchema = z
  .object({
    area: text,
    areaUnit: z.enum(['acre', 'km2']),
    lengthUnit: z.enum(['ft', 'm']),
    fluid: z.enum(['oil', 'gas']),
    bo: text,
    gasPressure: text,
    gasTemperature: text,
    gasGravity: text,
    zMethod: z.enum(['dak', 'hall-yarborough']),
    recoveryFactor: text,
    stdPressure: text,
    stdTemperature: text,
    trials: text,
    seed: text,
    dist: z.object({ area: distForm, netPay: distForm, porosity: distForm, sw: distForm, bo: distForm, recoveryFactor: distForm }),
    correlations: z.array(z.object({ a: z.enum(INPUT_ORDER as [InputName, ...InputName[]]), b: z.enum(INPUT_ORDER as [InputName, ...InputName[]]), rank: text })),
  })
  .superRefine((v, ctx) => {
    check(ctx, ['area'], blank(v.area) || num(v.area) > 0, 'Area must be a number > 0.');
    check(ctx, ['recoveryFactor'], blank(v.recoveryFactor) || (num(v.recoveryFactor) >= 0 && num(v.recoveryFactor) <= 1), 'Recovery factor is a fraction between 0 and 1.');
    if (v.fluid === 'oil') check(ctx, ['bo'], blank(v.bo) || num(v.bo) > 0, 'Bo must be a number > 0 (rb/STB).');
    if (v.fluid === 'gas') {
      check(ctx, ['gasPressure'], num(v.gasPressure) > 0, 'Reservoir pressure must be a number > 0 (psia).');
      check(ctx, ['gasTemperature'], !blank(v.gasTemperature) && Number.isFinite(num(v.gasTemperature)), 'Reservoir temperature must be a number (F).');
      check(ctx, ['gasGravity'], num(v.gasGravity) >= 0.55 && num(v.gasGravity) <= 1.8, 'Gas gravity must be between 0.55 and 1.8 (Sutton 1985 range).');
      check(ctx, ['dist', 'bo', 'kind'], v.dist.bo.kind === 'base', 'A gas case holds Bg at its PVT value: no distribution.');
    }
    check(ctx, ['stdPressure'], num(v.stdPressure) > 0, 'Standard pressure must be a number > 0 (psia).');
    check(ctx, ['stdTemperature'], !blank(v.stdTemperature) && Number.isFinite(num(v.stdTemperature)), 'Standard temperature must be a number (F).');
    check(ctx, ['trials'], Number.isInteger(num(v.trials)) && num(v.trials) >= 100 && num(v.trials) <= 1_000_000, 'Trials must be a whole number from 100 to 1,000,000.');
    check(ctx, ['seed'], Number.isInteger(num(v.seed)) && num(v.seed) >= 0 && num(v.seed) <= 2_147_483_647, 'Seed must be a whole number from 0 to 2,147,483,647.');
    for (const k of INPUT_ORDER) {
      const errors = distributionFormErrors(v.dist[k]);
      for (const [field, message] of Object.entries(errors)) ctx.addIssue({ code: 'custom', path: ['dist', k, field], message });
    }
    const pairs = new Set<string>();
    v.correlations.forEach((c, i) => {
      const r = num(c.rank);
      check(ctx, ['correlations', i, 'rank'], !blank(c.rank) && Number.isFinite(r) && Math.abs(r) <= MAX_RANK, `Rank correlation must be a number from -${MAX_RANK} to ${MAX_RANK}.`);
      check(ctx, ['correlations', i, 'b'], c.a !== c.b, 'Pick two different inputs.');
      for (const side of ['a', 'b'] as const) {
        check(ctx, ['correlations', i, side], v.dist[c[side]].kind !== 'base', 'Give this input a distribution first: a fixed input cannot be correlated.');
      }
      const key = [c.a, c.b].sort().join('~');
      check(ctx, ['correlations', i, 'b'], !pairs.has(key), 'This pair is already correlated above.');
      pairs.add(key);
    });
  });

/** The PATCH body of valid form values (seed is a top-level field of the case). */
export function patchOf(v: InputsFormValues): { inputs: CaseInputsPatch; seed: number } {
  const opt = (x: string) => (blank(x) ? null : num(x));
  const distributions: CaseInputsPatch['distributions'] = {};
  for (const k of INPUT_ORDER) {
    const d = distributionFromForm(v.dist[k]);
    if (d) distributions[k] = d;
  }
  return {
    inputs: {
      area: opt(v.area),
      areaUnit: v.areaUnit,
      lengthUnit: v.lengthUnit,
      fluid: v.fluid,
      bo: v.fluid === 'oil' ? opt(v.bo) : null,
      gas:
        v.fluid === 'gas'
          ? { pressurePsia: num(v.gasPressure), temperatureF: num(v.gasTemperature), gasGravity: num(v.gasGravity), zMethod: v.zMethod }
          : null,
      recoveryFactor: opt(v.recoveryFactor),
      standard: { pressurePsia: num(v.stdPressure), temperatureF: num(v.stdTemperature) },
      distributions,
      correlations: v.correlations.map((c) => ({ a: c.a, b: c.b, rank: num(c.rank) })),
      trials: num(v.trials),
    },
    seed: num(v.seed),
  };
}

/** Multiplies the numbers of a distribution form by k (unit change); blank fields stay blank. */
export function scaleDistributionForm(f: DistributionForm, k: number): DistributionForm {
  const sc = (x: string) => (blank(x) || !Number.isFinite(num(x)) ? x : String(Number((num(x) * k).toPrecision(10))));
  return { ...f, a: sc(f.a), b: sc(f.b), c: sc(f.c), truncMin: sc(f.truncMin), truncMax: sc(f.truncMax) };
}

export { EMPTY_DISTRIBUTION };
