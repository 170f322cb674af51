import { distributionQuantile, lognormalFromMeanSd, lognormalFromP90P10, lognormalSummary, type Distribution, type LognormalSummary } from '@poreline/core';

/**
 * The distribution editor's form values (strings, as typed) and their conversion to core's
 * Distribution. 'base' means no distribution: the input stays at its deterministic value.
 */
export type DistributionKind = 'base' | 'uniform' | 'triangular' | 'normal' | 'lognormal-moments' | 'lognormal-percentiles';

export interface DistributionForm {
  kind: DistributionKind;
  a: string;
  b: string;
  c: string;
  truncMin: string;
  truncMax: string;
}

export const EMPTY_DISTRIBUTION: DistributionForm = { kind: 'base', a: '', b: '', c: '', truncMin: '', truncMax: '' };

/** Parameter labels per kind, in the order a, b, c. */
export const PARAMETERS: Record<DistributionKind, readonly string[]> = {
  base: [],
  uniform: ['Min', 'Max'],
  triangular: ['Min', 'Mode', 'Max'],
  normal: ['Mean', 'SD'],
  'lognormal-moments': ['Mean', 'SD'],
  'lognormal-percentiles': ['P90 (low)', 'P10 (high)'],
};

export const KIND_LABELS: Record<DistributionKind, string> = {
  base: 'Fixed (deterministic value)',
  uniform: 'Uniform',
  triangular: 'Triangular',
  normal: 'Normal',
  'lognormal-moments': 'Lognormal (mean, SD)',
  'lognormal-percentiles': 'Lognormal (P90, P10)',
};

const num = (s: string): number => (s.trim() === '' ? NaN : Number(s));
const str = (n: number | undefined): string => (n === undefined ? '' : String(n));

/** Form values of a stored distribution (absent or fixed -> 'base'). */
export function formFromDistribution(d: Distribution | undefined): DistributionForm {
  if (!d || d.kind === 'fixed') return { ...EMPTY_DISTRIBUTION };
  const t = 'truncate' in d && d.truncate ? d.truncate : {};
  const trunc = { truncMin: str(t.min), truncMax: str(t.max) };
  switch (d.kind) {
    case 'uniform':
      return { kind: 'uniform', a: str(d.min), b: str(d.max), c: '', ...trunc };
    case 'triangular':
      return { kind: 'triangular', a: str(d.min), b: str(d.mode), c: str(d.max), ...trunc };
    case 'normal':
      return { kind: 'normal', a: str(d.mean), b: str(d.sd), c: '', ...trunc };
    case 'lognormal':
      return 'p90' in d
        ? { kind: 'lognormal-percentiles', a: str(d.p90), b: str(d.p10), c: '', ...trunc }
        : { kind: 'lognormal-moments', a: str(d.mean), b: str(d.sd), c: '', ...trunc };
  }
}

/** Problems of a form, keyed by field ('a', 'b', 'c', 'truncMin', 'truncMax'); empty when valid. */
export function distributionFormErrors(f: DistributionForm): Partial<Record<keyof DistributionForm, string>> {
  const errors: Partial<Record<keyof DistributionForm, string>> = {};
  const names = PARAMETERS[f.kind];
  (['a', 'b', 'c'] as const).forEach((k, i) => {
    if (i < names.length && !Number.isFinite(num(f[k]))) errors[k] = `${names[i]} must be a number`;
  });
  for (const k of ['truncMin', 'truncMax'] as const) if (f[k].trim() !== '' && !Number.isFinite(num(f[k]))) errors[k] = 'must be a number or empty';
  if (Object.keys(errors).length) return errors;
  const d = distributionFromForm(f);
  if (d) {
    try {
      distributionQuantile(d, 0.5);
    } catch (error) {
      const message = (error as Error).message.replace(/^distributionQuantile: distribution\.?/, '');
      errors[fieldOf(message)] = message;
    }
  }
  return errors;
}

function fieldOf(message: string): keyof DistributionForm {
  if (/^truncate\.min/.test(message)) return 'truncMin';
  if (/^truncate/.test(message)) return 'truncMax';
  if (/^(max|p10)/.test(message)) return 'b';
  if (/^mode/.test(message)) return 'b';
  if (/^(sd)/.test(message)) return 'b';
  return 'a';
}

/** The core distribution of a valid form; undefined for 'base' (fixed at the deterministic value). */
export function distributionFromForm(f: DistributionForm): Distribution | undefined {
  const [a, b, c] = [num(f.a), num(f.b), num(f.c)];
  const truncate = f.truncMin.trim() === '' && f.truncMax.trim() === '' ? undefined : { ...(f.truncMin.trim() !== '' ? { min: num(f.truncMin) } : {}), ...(f.truncMax.trim() !== '' ? { max: num(f.truncMax) } : {}) };
  const t = truncate ? { truncate } : {};
  switch (f.kind) {
    case 'base':
      return undefined;
    case 'uniform':
      return { kind: 'uniform', min: a, max: b, ...t };
    case 'triangular':
      // the form orders min, mode, max as a, b, c
      return { kind: 'triangular', min: a, mode: b, max: c, ...t };
    case 'normal':
      return { kind: 'normal', mean: a, sd: b, ...t };
    case 'lognormal-moments':
      return { kind: 'lognormal', mean: a, sd: b, ...t };
    case 'lognormal-percentiles':
      return { kind: 'lognormal', p90: a, p10: b, ...t };
  }
}

/** A lognormal form shown in both forms (mu, sigma, mean, SD, P90/P50/P10), or null. */
export function lognormalBothForms(f: DistributionForm): LognormalSummary | null {
  try {
    if (f.kind === 'lognormal-moments') return lognormalSummary(lognormalFromMeanSd(num(f.a), num(f.b)));
    if (f.kind === 'lognormal-percentiles') return lognormalSummary(lognormalFromP90P10(num(f.a), num(f.b)));
  } catch {
    return null;
  }
  return null;
}

/** The input's own P90 / P50 / P10 (PRMS: P90 = 10th percentile), or null for 'base' or invalid. */
export function distributionPercentiles(f: DistributionForm): { p90: number; p50: number; p10: number } | null {
  const d = distributionFromForm(f);
  if (!d) return null;
  try {
    return { p90: distributionQuantile(d, 0.1), p50: distributionQuantile(d, 0.5), p10: distributionQuantile(d, 0.9) };
  } catch {
    return null;
  }
}
