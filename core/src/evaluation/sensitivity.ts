/**
 * Cutoff sensitivity: net reservoir, net pay, phi-h and HCPT of net pay as one cutoff is
 * swept and the others are held at each formation's values; and the share of the total
 * storage capacity (phi-h) lost at each porosity cutoff (Worthington & Cosentino 2005,
 * SPE REE 8(4), the cumulative storage-capacity view of a porosity cutoff).
 * Thickness is MD; each sample counts its interval clipped to the zone, as in the summaries.
 */
import { type ParameterIssue, throwIfIssues } from './errors.js';
import {
  type CutoffCurves,
  type CutoffTable,
  type ZoneInterval,
  cutoffCurveIssues,
  cutoffIssues,
  formationOf,
  payFlag,
  reservoirFlag,
} from './cutoffs.js';
import { depthIssues, lowerBoundary, upperBoundary, zoneBoundsIssues, zoneRangesUnchecked } from './sample-thickness.js';

export type CutoffName = 'vshMax' | 'phiMin' | 'swMax' | 'permMin';

export interface CutoffSensitivity {
  cutoff: CutoffName;
  values: Float64Array;
  /** Net reservoir thickness (MD) at each value, summed over the chosen zones. */
  netReservoir: Float64Array;
  /** Net pay thickness (MD). */
  netPay: Float64Array;
  /** phi-h of net pay, sum(PHIE h). */
  phiH: Float64Array;
  /** Hydrocarbon pore thickness of net pay, sum(PHIE (1 - SW) h). */
  hcpt: Float64Array;
  /**
   * Only for 'phiMin': share of the total phi-h (all samples with a porosity, no other
   * cutoff) in samples with PHIE below the value: sum_{phi < c} phi h / sum phi h.
   */
  storageLostShare: Float64Array | null;
}

/**
 * Sweeps one cutoff over `values`; the swept value replaces that cutoff for every chosen
 * zone's formation. `zones` option restricts the sums to the named zones (default all).
 * Throws EvaluationInputError naming the field on bad inputs (including non-finite values,
 * and 'permMin' swept without a PERM curve).
 * @example cutoffSensitivity(input, 'phiMin', [0.04, 0.06, 0.08, 0.1]).netPay
 */
export function cutoffSensitivity(
  input: { depth: Float64Array | readonly number[]; curves: CutoffCurves; zones: readonly ZoneInterval[]; cutoffs: CutoffTable },
  cutoff: CutoffName,
  values: readonly number[] | Float64Array,
  options: { zones?: readonly string[] } = {},
): CutoffSensitivity {
  const fn = 'cutoffSensitivity';
  const { depth, curves, cutoffs } = input;
  const n = depth.length;
  const chosen = options.zones ? input.zones.filter((z) => options.zones!.includes(z.name)) : input.zones;
  const issues: ParameterIssue[] = [...depthIssues(depth)];
  if (!['vshMax', 'phiMin', 'swMax', 'permMin'].includes(cutoff)) issues.push({ zone: null, field: 'cutoff', message: `cutoff '${cutoff}' is not one of vshMax, phiMin, swMax, permMin` });
  for (let k = 0; k < values.length; k++) {
    if (!Number.isFinite(values[k])) issues.push({ zone: null, field: 'values', message: `values[${k}] must be finite` });
  }
  for (const name of options.zones ?? []) {
    if (!input.zones.some((z) => z.name === name)) issues.push({ zone: name, field: 'zones', message: `zone '${name}' is not among the zones` });
  }
  for (const z of chosen) issues.push(...cutoffIssues(cutoffs[formationOf(z)], z.name, formationOf(z)));
  const needPerm = cutoff === 'permMin' || chosen.some((z) => cutoffs[formationOf(z)]?.permMin != null);
  issues.push(...cutoffCurveIssues(n, curves, needPerm));
  if (issues.length === 0) issues.push(...zoneBoundsIssues(depth, input.zones));
  throwIfIssues(fn, issues);

  const all = zoneRangesUnchecked(depth, input.zones);
  const { VSH, PHIE, SW } = curves;
  const PERM = curves.PERM;
  const m = values.length;
  const out: CutoffSensitivity = {
    cutoff,
    values: Float64Array.from(values),
    netReservoir: new Float64Array(m),
    netPay: new Float64Array(m),
    phiH: new Float64Array(m),
    hcpt: new Float64Array(m),
    storageLostShare: cutoff === 'phiMin' ? new Float64Array(m) : null,
  };
  let totalPhiH = 0;
  for (const z of chosen) {
    const r = all[input.zones.indexOf(z)];
    const c = cutoffs[formationOf(z)];
    for (let i = r.overlapStart; i < r.overlapEnd; i++) {
      const h = Math.min(lowerBoundary(depth, i), z.base) - Math.max(upperBoundary(depth, i), z.top);
      if (!(h > 0)) continue;
      const vsh = VSH[i], phi = PHIE[i], sw = SW[i], perm = PERM ? PERM[i] : NaN;
      if (phi === phi) totalPhiH += phi * h;
      for (let k = 0; k < m; k++) {
        const v = out.values[k];
        const vshMax = cutoff === 'vshMax' ? v : c.vshMax;
        const phiMin = cutoff === 'phiMin' ? v : c.phiMin;
        const swMax = cutoff === 'swMax' ? v : c.swMax;
        const permMin = cutoff === 'permMin' ? v : (c.permMin ?? -Infinity);
        const res = reservoirFlag(vsh, phi, perm, vshMax, phiMin, permMin);
        if (res === 1) out.netReservoir[k] += h;
        if (payFlag(res, sw, swMax) === 1) {
          out.netPay[k] += h;
          out.phiH[k] += phi * h;
          out.hcpt[k] += phi * (1 - sw) * h;
        }
        if (out.storageLostShare && phi === phi && phi < v) out.storageLostShare[k] += phi * h;
      }
    }
  }
  if (out.storageLostShare) {
    for (let k = 0; k < m; k++) out.storageLostShare[k] = totalPhiH > 0 ? out.storageLostShare[k] / totalPhiH : 0;
  }
  return out;
}
