import { BadRequestException } from '@nestjs/common';
import { MAX_RANK_CORRELATION, type Distribution, type InputCorrelation, type ReservesInputName } from '@poreline/core';
import { z } from 'zod';

/**
 * The engineer's inputs of a reserves case (the `inputs` jsonb): weighting of the wells,
 * overrides with reasons, area, fluid and PVT, recovery factor, standard conditions, one
 * distribution per input. Checked here with zod for shape (the message names the field path),
 * then by core for the numbers.
 */

export const INPUT_NAMES = ['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'] as const satisfies readonly ReservesInputName[];
export type InputName = (typeof INPUT_NAMES)[number];
export const OVERRIDABLE = ['netPay', 'porosity', 'sw'] as const;
export type Overridable = (typeof OVERRIDABLE)[number];
export const WELL_OVERRIDABLE = ['netPay', 'porosity', 'sw'] as const;
export type WellOverridable = (typeof WELL_OVERRIDABLE)[number];

/** A value the engineer put in place of the computed one, with why, who and when. */
export interface Override {
  value: number;
  reason: string;
  by: string | null;
  byName: string | null;
  at: string;
}

export interface GasInputs {
  pressurePsia: number;
  temperatureF: number;
  gasGravity: number;
  zMethod: 'dak' | 'hall-yarborough';
}

export interface DeclineCheck {
  kind: 'exponential' | 'hyperbolic' | 'harmonic';
  economicLimit: number;
}

export interface CaseInputs {
  weighting: 'arithmetic' | 'thickness' | 'area';
  /** Drainage area per well, in `areaUnit` (area weighting). */
  drainageAreas: Record<string, number>;
  /** Per-well replacements of the interpretation's values (netPay in `lengthUnit`). */
  wellOverrides: Record<string, Partial<Record<WellOverridable, Override>>>;
  /** Replacements of the combined values (netPay in `lengthUnit`). */
  overrides: Partial<Record<Overridable, Override>>;
  areaUnit: 'acre' | 'km2';
  lengthUnit: 'ft' | 'm';
  area: number | null;
  fluid: 'oil' | 'gas';
  /** Oil formation volume factor, rb/STB. */
  bo: number | null;
  gas: GasInputs | null;
  recoveryFactor: number | null;
  standard: { pressurePsia: number; temperatureF: number };
  /** One distribution per input (Bo for oil only; a gas case's Bg comes from PVT and is fixed); absent = fixed at the deterministic value. */
  distributions: Partial<Record<InputName, Distribution>>;
  /** Rank (Spearman) correlations between inputs that have distributions; none = independent. */
  correlations: InputCorrelation<InputName>[];
  trials: number;
  /** Decline fits kept with the case, per production series id. */
  declineChecks: Record<string, DeclineCheck>;
}

export const MAX_CASE_TRIALS = 1_000_000;

export function defaultInputs(): CaseInputs {
  return {
    weighting: 'thickness',
    drainageAreas: {},
    wellOverrides: {},
    overrides: {},
    areaUnit: 'acre',
    lengthUnit: 'ft',
    area: null,
    fluid: 'oil',
    bo: null,
    gas: null,
    recoveryFactor: null,
    standard: { pressurePsia: 14.696, temperatureF: 60 },
    distributions: {},
    correlations: [],
    trials: 100_000,
    declineChecks: {},
  };
}

const num = (field: string) => z.number({ error: `${field} must be a number` });
const positive = (field: string) => num(field).gt(0, { error: `${field} must be > 0` });
const fraction = (field: string) => num(field).min(0, { error: `${field} must be in [0, 1]` }).max(1, { error: `${field} must be in [0, 1]` });

const overrideIn = z.object({
  value: num('value'),
  reason: z.string({ error: 'reason is required' }).trim().min(1, { error: 'reason is required: say why the value is overridden' }),
  by: z.unknown().optional(),
  byName: z.unknown().optional(),
  at: z.unknown().optional(),
});

const truncate = z.object({ min: num('truncate.min').optional(), max: num('truncate.max').optional() }).strict().optional();

const distribution = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('fixed'), value: num('value') }).strict(),
    z.object({ kind: z.literal('uniform'), min: num('min'), max: num('max'), truncate }).strict(),
    z.object({ kind: z.literal('triangular'), min: num('min'), mode: num('mode'), max: num('max'), truncate }).strict(),
    z.object({ kind: z.literal('normal'), mean: num('mean'), sd: num('sd'), truncate }).strict(),
    z
      .object({ kind: z.literal('lognormal'), mean: num('mean').optional(), sd: num('sd').optional(), p90: num('p90').optional(), p10: num('p10').optional(), truncate })
      .strict()
      .refine((d) => (d.mean !== undefined && d.sd !== undefined) !== (d.p90 !== undefined && d.p10 !== undefined), {
        error: 'lognormal needs either mean and sd, or p90 and p10',
      }),
  ],
  { error: 'kind must be fixed, uniform, triangular, normal or lognormal' },
);

const patchSchema = z
  .object({
    weighting: z.enum(['arithmetic', 'thickness', 'area'], { error: 'weighting must be arithmetic, thickness or area' }),
    drainageAreas: z.record(z.string(), positive('drainage area')),
    wellOverrides: z.record(z.string(), z.object({ netPay: overrideIn.optional(), porosity: overrideIn.optional(), sw: overrideIn.optional() }).strict()),
    overrides: z.object({ netPay: overrideIn.optional(), porosity: overrideIn.optional(), sw: overrideIn.optional() }).strict(),
    areaUnit: z.enum(['acre', 'km2'], { error: 'areaUnit must be acre or km2' }),
    lengthUnit: z.enum(['ft', 'm'], { error: 'lengthUnit must be ft or m' }),
    area: positive('area').nullable(),
    fluid: z.enum(['oil', 'gas'], { error: 'fluid must be oil or gas' }),
    bo: positive('bo').nullable(),
    gas: z
      .object({
        pressurePsia: positive('pressurePsia'),
        temperatureF: num('temperatureF'),
        gasGravity: num('gasGravity').min(0.55, { error: 'gasGravity must be in [0.55, 1.8] (Sutton 1985 range)' }).max(1.8, { error: 'gasGravity must be in [0.55, 1.8] (Sutton 1985 range)' }),
        zMethod: z.enum(['dak', 'hall-yarborough'], { error: 'zMethod must be dak or hall-yarborough' }),
      })
      .strict()
      .nullable(),
    recoveryFactor: fraction('recoveryFactor').nullable(),
    standard: z.object({ pressurePsia: positive('pressurePsia'), temperatureF: num('temperatureF') }).strict(),
    distributions: z
      .object({
        area: distribution.optional(),
        netPay: distribution.optional(),
        porosity: distribution.optional(),
        sw: distribution.optional(),
        bo: distribution.optional(),
        recoveryFactor: distribution.optional(),
      })
      .strict(),
    correlations: z
      .array(
        z
          .object({
            a: z.enum(['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'], { error: 'a must be area, netPay, porosity, sw, bo or recoveryFactor' }),
            b: z.enum(['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'], { error: 'b must be area, netPay, porosity, sw, bo or recoveryFactor' }),
            rank: num('rank')
              .min(-MAX_RANK_CORRELATION, { error: `rank must be in [-${MAX_RANK_CORRELATION}, ${MAX_RANK_CORRELATION}]` })
              .max(MAX_RANK_CORRELATION, { error: `rank must be in [-${MAX_RANK_CORRELATION}, ${MAX_RANK_CORRELATION}]` }),
          })
          .strict()
          .refine((c) => c.a !== c.b, { error: 'a and b must be two different inputs' }),
        { error: 'correlations must be a list of { a, b, rank }' },
      )
      .max(15, { error: 'correlations: at most 15 pairs (every pair of the six inputs)' }),
    trials: z
      .number({ error: 'trials must be a number' })
      .int({ error: 'trials must be an integer' })
      .min(100, { error: 'trials must be at least 100' })
      .max(MAX_CASE_TRIALS, { error: `trials must be at most ${MAX_CASE_TRIALS}` }),
    declineChecks: z.record(
      z.string(),
      z.object({ kind: z.enum(['exponential', 'hyperbolic', 'harmonic'], { error: 'kind must be exponential, hyperbolic or harmonic' }), economicLimit: positive('economicLimit') }).strict(),
    ),
  })
  .partial()
  .strict();

export type CaseInputsPatch = z.infer<typeof patchSchema>;

/** One line per problem: "inputs.distributions.porosity.sd: sd must be a number". */
function describeIssues(error: z.ZodError, prefix: string): string[] {
  return error.issues.map((issue) => {
    const path = [prefix, ...issue.path.map(String)].join('.');
    if (issue.code === 'unrecognized_keys') return `${path}: unknown field(s) ${issue.keys.join(', ')}`;
    return `${path}: ${issue.message}`;
  });
}

/** Parses a partial inputs object from a request; 400 naming each bad field. */
export function parseInputsPatch(value: unknown, prefix = 'inputs'): CaseInputsPatch {
  if (value === undefined) return {};
  const parsed = patchSchema.safeParse(value);
  if (!parsed.success) throw new BadRequestException(describeIssues(parsed.error, prefix));
  return parsed.data;
}

function stampOverride(next: z.infer<typeof overrideIn>, previous: Override | undefined, who: { id: string; name: string }, now: string): Override {
  if (previous && previous.value === next.value && previous.reason === next.reason) return previous;
  return { value: next.value, reason: next.reason, by: who.id, byName: who.name, at: now };
}

/**
 * Applies a patch: each top-level key given replaces that key. Overrides keep their author and
 * time when value and reason are unchanged, else they are stamped with the caller and now.
 */
export function applyInputsPatch(current: CaseInputs, patch: CaseInputsPatch, who: { id: string; name: string }, now = new Date().toISOString()): CaseInputs {
  const next: CaseInputs = { ...current, ...(patch as Partial<CaseInputs>) };
  if (patch.overrides) {
    const out: CaseInputs['overrides'] = {};
    for (const key of OVERRIDABLE) {
      const o = patch.overrides[key];
      if (o) out[key] = stampOverride(o, current.overrides[key], who, now);
    }
    next.overrides = out;
  }
  if (patch.wellOverrides) {
    const out: CaseInputs['wellOverrides'] = {};
    for (const [wellId, values] of Object.entries(patch.wellOverrides)) {
      const entry: Partial<Record<WellOverridable, Override>> = {};
      for (const key of WELL_OVERRIDABLE) {
        const o = values[key];
        if (o) entry[key] = stampOverride(o, current.wellOverrides[wellId]?.[key], who, now);
      }
      if (Object.keys(entry).length) out[wellId] = entry;
    }
    next.wellOverrides = out;
  }
  if (patch.distributions) next.distributions = patch.distributions as CaseInputs['distributions'];
  convertUnits(current, patch, next);
  return next;
}

const ACRES_PER_KM2 = 1e6 / 4046.8564224; // NIST SP 811 acre (43,560 international ft2)
const M_PER_FT = 0.3048; // NIST SP 811, exact

/** A distribution of a quantity measured in a unit k times larger: every parameter scales by k. */
export function scaleDistribution(d: Distribution, k: number): Distribution {
  const t = 'truncate' in d && d.truncate ? { truncate: { ...(d.truncate.min !== undefined ? { min: d.truncate.min * k } : {}), ...(d.truncate.max !== undefined ? { max: d.truncate.max * k } : {}) } } : {};
  switch (d.kind) {
    case 'fixed':
      return { kind: 'fixed', value: d.value * k };
    case 'uniform':
      return { kind: 'uniform', min: d.min * k, max: d.max * k, ...t };
    case 'triangular':
      return { kind: 'triangular', min: d.min * k, mode: d.mode * k, max: d.max * k, ...t };
    case 'normal':
      return { kind: 'normal', mean: d.mean * k, sd: d.sd * k, ...t };
    case 'lognormal':
      return 'p90' in d ? { kind: 'lognormal', p90: d.p90 * k, p10: d.p10 * k, ...t } : { kind: 'lognormal', mean: d.mean * k, sd: d.sd * k, ...t };
  }
}

/**
 * When the area or length unit changes, values stored in the old unit that the patch does not
 * replace (area, drainage areas, net pay overrides, area/net pay distributions) are converted,
 * so a unit change never silently reinterprets a number.
 */
function convertUnits(current: CaseInputs, patch: CaseInputsPatch, next: CaseInputs): void {
  if (patch.areaUnit && patch.areaUnit !== current.areaUnit) {
    const k = patch.areaUnit === 'km2' ? 1 / ACRES_PER_KM2 : ACRES_PER_KM2;
    if (patch.area === undefined && current.area !== null) next.area = current.area * k;
    if (!patch.drainageAreas) next.drainageAreas = Object.fromEntries(Object.entries(current.drainageAreas).map(([w, a]) => [w, a * k]));
    if (!patch.distributions && current.distributions.area) next.distributions = { ...next.distributions, area: scaleDistribution(current.distributions.area, k) };
  }
  if (patch.lengthUnit && patch.lengthUnit !== current.lengthUnit) {
    const k = patch.lengthUnit === 'm' ? M_PER_FT : 1 / M_PER_FT;
    const scale = (o: Override | undefined) => (o ? { ...o, value: o.value * k } : undefined);
    if (!patch.overrides && current.overrides.netPay) next.overrides = { ...next.overrides, netPay: scale(current.overrides.netPay) };
    if (!patch.wellOverrides) {
      next.wellOverrides = Object.fromEntries(Object.entries(current.wellOverrides).map(([w, o]) => [w, o.netPay ? { ...o, netPay: scale(o.netPay) } : o]));
    }
    if (!patch.distributions && current.distributions.netPay) next.distributions = { ...next.distributions, netPay: scaleDistribution(current.distributions.netPay, k) };
  }
}

/** Stored inputs read back, with defaults for keys an older case may lack. */
export function readInputs(stored: Record<string, unknown> | null | undefined): CaseInputs {
  return { ...defaultInputs(), ...((stored ?? {}) as Partial<CaseInputs>) };
}
