/**
 * Cutoffs per formation and the net reservoir / net pay flags.
 *
 * Conventions (EVALUATION_CONVENTIONS 'cutoffs-inclusive', 'net-definitions'):
 * - a sample passes when Vsh <= vshMax, porosity >= phiMin, Sw <= swMax and, when set,
 *   permeability >= permMin (bounds inclusive);
 * - net reservoir passes the Vsh, porosity (and permeability) cutoffs; net pay is net
 *   reservoir that also passes the Sw cutoff (Worthington & Cosentino 2005, SPE REE 8(4));
 * - porosity is the effective porosity PHIE;
 * - a flag is 0 as soon as one known value fails, NaN when none fails but a needed value is
 *   missing, 1 otherwise (a non-reservoir sample is non-pay even with Sw missing).
 */
import { type ParameterIssue, throwIfIssues } from './errors.js';
import { type ZoneBounds, depthIssues, zoneBoundsIssues, zoneRangesUnchecked } from './sample-thickness.js';

export interface CutoffSet {
  /** Maximum shale volume, v/v (inclusive). */
  vshMax: number;
  /** Minimum effective porosity, v/v (inclusive). */
  phiMin: number;
  /** Maximum water saturation, v/v (inclusive). */
  swMax: number;
  /** Optional minimum permeability, mD (inclusive); needs a permeability transform. */
  permMin?: number | null;
}

/** A zone as the cutoff and summary functions see it. */
export interface ZoneInterval extends ZoneBounds {
  /** Formation whose cutoffs apply (default: the zone name). */
  formation?: string;
  /** Formation dip, degrees, and dip azimuth (direction of deepening), degrees; for TVT. Default 0. */
  dipDeg?: number;
  dipAzimuthDeg?: number;
}

export type CutoffTable = Readonly<Record<string, CutoffSet>>;

export function formationOf(z: ZoneInterval): string {
  return z.formation ?? z.name;
}

/**
 * Net reservoir flag of one sample (kernel): 1, 0 or NaN (see the file comment).
 * permMin = -Infinity (or NaN) means no permeability cutoff.
 */
export function reservoirFlag(vsh: number, phi: number, perm: number, vshMax: number, phiMin: number, permMin: number): number {
  const usePerm = permMin > -Infinity;
  if (vsh > vshMax || phi < phiMin || (usePerm && perm < permMin)) return 0;
  if (vsh !== vsh || phi !== phi || (usePerm && perm !== perm)) return NaN;
  return 1;
}

/** Net pay flag of one sample from its reservoir flag (kernel): 1, 0 or NaN. */
export function payFlag(res: number, sw: number, swMax: number): number {
  if (res === 0 || sw > swMax) return 0;
  if (res !== res || sw !== sw) return NaN;
  return 1;
}

/** Issues with one formation's cutoffs (fractions in [0, 1], permMin >= 0 or unset). */
export function cutoffIssues(c: CutoffSet | undefined, zone: string, formation: string): ParameterIssue[] {
  if (!c) return [{ zone, field: 'cutoffs', message: `cutoffs are missing for formation '${formation}'` }];
  const issues: ParameterIssue[] = [];
  for (const f of ['vshMax', 'phiMin', 'swMax'] as const) {
    const v = c[f];
    if (typeof v !== 'number' || !(v >= 0 && v <= 1)) issues.push({ zone, field: `cutoffs.${f}`, message: `cutoffs.${f} must be in [0, 1] (formation '${formation}')` });
  }
  const p = c.permMin;
  if (p !== undefined && p !== null && !(typeof p === 'number' && p >= 0 && Number.isFinite(p))) {
    issues.push({ zone, field: 'cutoffs.permMin', message: `cutoffs.permMin must be >= 0 or unset (formation '${formation}')` });
  }
  return issues;
}

export interface CutoffCurves {
  VSH: Float64Array | readonly number[];
  PHIE: Float64Array | readonly number[];
  SW: Float64Array | readonly number[];
  PERM?: Float64Array | readonly number[];
}

/** Issues with curves given to the cutoff/summary functions (lengths; PERM when a permMin is set). */
export function cutoffCurveIssues(n: number, curves: CutoffCurves, needPerm: boolean): ParameterIssue[] {
  const issues: ParameterIssue[] = [];
  for (const k of ['VSH', 'PHIE', 'SW', 'PERM'] as const) {
    const c = curves[k];
    if (c && c.length !== n) issues.push({ zone: null, field: `curves.${k}`, message: `curves.${k} has ${c.length} samples, expected ${n}` });
  }
  if (needPerm && !curves.PERM) issues.push({ zone: null, field: 'curves.PERM', message: 'curves.PERM is required by a permMin cutoff' });
  return issues;
}

/**
 * Net reservoir and net pay flags (1 / 0 / NaN) of every sample, each sample judged with the
 * cutoffs of the formation of the zone that owns it (its centre lies in the zone, or it
 * straddles the zone's edge next to no other zone); NaN outside every zone. Cheap: the
 * browser re-runs it while a cutoff slider moves.
 * Throws EvaluationInputError naming the zone and field on bad zones, missing or invalid
 * cutoffs, or curves of the wrong length.
 */
export function applyCutoffs(input: {
  depth: Float64Array | readonly number[];
  curves: CutoffCurves;
  zones: readonly ZoneInterval[];
  cutoffs: CutoffTable;
}): { NET_RES: Float64Array; NET_PAY: Float64Array } {
  const fn = 'applyCutoffs';
  const { depth, curves, zones, cutoffs } = input;
  const n = depth.length;
  const issues = zones.flatMap((z) => cutoffIssues(cutoffs[formationOf(z)], z.name, formationOf(z)));
  const needPerm = zones.some((z) => cutoffs[formationOf(z)]?.permMin != null);
  issues.push(...cutoffCurveIssues(n, curves, needPerm));
  const depthBad = depthIssues(depth);
  issues.push(...depthBad, ...(depthBad.length ? [] : zoneBoundsIssues(depth, zones)));
  throwIfIssues(fn, issues);
  const ranges = zoneRangesUnchecked(depth, zones);
  const NET_RES = new Float64Array(n).fill(NaN);
  const NET_PAY = new Float64Array(n).fill(NaN);
  const { VSH, PHIE, SW } = curves;
  const PERM = curves.PERM;
  zones.forEach((z, k) => {
    const c = cutoffs[formationOf(z)];
    const permMin = c.permMin ?? -Infinity;
    for (let i = ranges[k].computeStart; i < ranges[k].computeEnd; i++) {
      const res = reservoirFlag(VSH[i], PHIE[i], PERM ? PERM[i] : NaN, c.vshMax, c.phiMin, permMin);
      NET_RES[i] = res;
      NET_PAY[i] = payFlag(res, SW[i], c.swMax);
    }
  });
  return { NET_RES, NET_PAY };
}
