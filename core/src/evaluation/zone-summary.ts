/**
 * Zone summaries: gross, net reservoir and net pay thickness (MD and, with a survey, TVD and
 * TVT), averages, phi-h, hydrocarbon pore thickness, null and clamped counts.
 *
 * Conventions (EVALUATION_CONVENTIONS):
 * - each sample stands for its interval between midpoints to its neighbours, clipped to the
 *   zone (so gross = base - top exactly);
 * - porosity (PHIE) and Vsh are averaged by thickness, Sw by pore volume (phi * h);
 * - phi-h = sum(phi * h); hydrocarbon pore thickness HCPT = sum(phi * (1 - Sw) * h);
 * - averages are MD-thickness weighted; phi-h and HCPT are given with MD, TVD and TVT h;
 * - the flags use the cutoffs of the zone's formation; a sample straddling two zones is
 *   judged in each zone with that zone's cutoffs, for the part inside it;
 * - gross averages use the samples where the value is known; null samples are those whose
 *   net pay flag is NaN (a needed value missing); clamped counts come from the QC mask.
 */
import { type ParameterIssue, throwIfIssues } from './errors.js';
import {
  type CutoffCurves,
  type CutoffSet,
  type CutoffTable,
  type ZoneInterval,
  cutoffCurveIssues,
  cutoffIssues,
  formationOf,
} from './cutoffs.js';
import { type SampleGeometry, type SurveyInput, geometryPositionAt, sampleGeometry } from './sample-geometry.js';
import { type ZoneRange, depthIssues, zoneBoundsIssues, zoneRangesUnchecked } from './sample-thickness.js';
import { type IntervalSums, type ZoneSums, zoneSumsGeo, zoneSumsMd } from './zone-sums.js';

export interface Thickness {
  md: number;
  /** null without a survey. */
  tvd: number | null;
  /** null without a survey (equals tvd when the zone has no dip or the survey no north/east). */
  tvt: number | null;
}

export interface IntervalSummary {
  thickness: Thickness;
  /** Thickness-weighted mean PHIE, v/v (null when no thickness has a value). */
  meanPhi: number | null;
  /** Pore-volume-weighted mean SW: sum(phi Sw h) / sum(phi h), v/v. */
  meanSw: number | null;
  /** Thickness-weighted mean VSH, v/v. */
  meanVsh: number | null;
  /** sum(phi h), depth units. */
  phiH: Thickness;
  /** Hydrocarbon pore thickness sum(phi (1 - Sw) h), depth units. */
  hcpt: Thickness;
}

export interface ZoneSummary {
  zone: string;
  formation: string;
  top: number;
  base: number;
  cutoffs: CutoffSet;
  gross: IntervalSummary;
  netReservoir: IntervalSummary;
  netPay: IntervalSummary;
  /** Net reservoir / gross (MD). */
  netToGross: number;
  /** Net pay / gross (MD). */
  payToGross: number;
  /** Samples overlapping the zone. */
  sampleCount: number;
  /** Samples whose net pay flag is undetermined (a needed value missing), and their MD thickness. */
  nullCount: number;
  nullThickness: number;
  /** Samples clamped or clipped (from the QC mask; zero without one). */
  clamped: { vsh: number; phit: number; phie: number; sw: number };
}

/** Summary of one interval class from its sums; gross thickness given for the gross class. */
function intervalSummary(s: IntervalSums, geo: boolean, grossMd?: number, grossTvd?: number, grossTvt?: number): IntervalSummary {
  const t = (md: number, v: number, tt: number): Thickness => ({ md, tvd: geo ? v : null, tvt: geo ? tt : null });
  return {
    thickness: grossMd === undefined ? t(s.h, s.hv, s.ht) : t(grossMd, grossTvd!, grossTvt!),
    meanPhi: s.hPhi > 0 ? s.phiH / s.hPhi : null,
    meanSw: s.phiHSw > 0 ? s.phiSwH / s.phiHSw : null,
    meanVsh: s.hVsh > 0 ? s.vshH / s.hVsh : null,
    phiH: t(s.phiH, s.phiHv, s.phiHt),
    hcpt: t(s.hc, s.hcv, s.hct),
  };
}

export interface SummariseInput {
  depth: Float64Array | readonly number[];
  curves: CutoffCurves;
  /** QC mask from evaluateWell (optional): clamped counts. */
  qc?: Uint8Array;
  zones: readonly ZoneInterval[];
  cutoffs: CutoffTable;
  /** Deviation survey for TVD/TVT thickness ... */
  survey?: SurveyInput;
  /** ... or its precomputed geometry (see sampleGeometry), reused while sliders move. */
  geometry?: SampleGeometry;
}

/**
 * One summary per zone (same order as `zones`). Cheap enough to re-run on every cutoff
 * change in the browser (one pass over the zone's samples).
 * Throws EvaluationInputError naming the zone and field on bad depth, zones, cutoffs or curves.
 */
export function summariseZones(input: SummariseInput): ZoneSummary[] {
  const fn = 'summariseZones';
  const { depth, curves, zones, cutoffs, qc } = input;
  const n = depth.length;
  const issues: ParameterIssue[] = [...depthIssues(depth)];
  for (const z of zones) issues.push(...cutoffIssues(cutoffs[formationOf(z)], z.name, formationOf(z)));
  const needPerm = zones.some((z) => cutoffs[formationOf(z)]?.permMin != null);
  issues.push(...cutoffCurveIssues(n, curves, needPerm));
  if (qc && qc.length !== n) issues.push({ zone: null, field: 'qc', message: `qc has ${qc.length} samples, expected ${n}` });
  if (issues.length === 0) issues.push(...zoneBoundsIssues(depth, zones));
  if (input.geometry && input.geometry.boundaries.length !== n + 1) {
    issues.push({ zone: null, field: 'geometry', message: `geometry has ${input.geometry.boundaries.length - 1} samples, expected ${n}` });
  }
  throwIfIssues(fn, issues);
  const geometry = input.geometry ?? (input.survey ? sampleGeometry(depth, input.survey) : undefined);
  return summariseUnchecked(depth, curves, qc, zones, cutoffs, zoneRangesUnchecked(depth, zones), geometry);
}

/** {@link summariseZones} on validated inputs with precomputed ranges (internal, used by evaluateWell). */
export function summariseUnchecked(
  depth: Float64Array | readonly number[],
  curves: CutoffCurves,
  qc: Uint8Array | undefined,
  zones: readonly ZoneInterval[],
  cutoffs: CutoffTable,
  ranges: readonly ZoneRange[],
  geometry: SampleGeometry | undefined,
): ZoneSummary[] {
  return zones.map((z, k) => summariseOne(depth, curves, qc, z, cutoffs[formationOf(z)], ranges[k].overlapStart, ranges[k].overlapEnd, geometry));
}

function summariseOne(
  d: Float64Array | readonly number[],
  curves: CutoffCurves,
  qc: Uint8Array | undefined,
  z: ZoneInterval,
  c: CutoffSet,
  start: number,
  end: number,
  g: SampleGeometry | undefined,
): ZoneSummary {
  const top = z.top, base = z.base;
  const grossMd = base - top;
  let grossTvd = 0, grossTvt = 0, sums: ZoneSums;
  if (g === undefined) sums = zoneSumsMd(d, curves.VSH, curves.PHIE, curves.SW, curves.PERM, qc, c, top, base, start, end);
  else {
    // Vertical geometry: positions at the zone's top and base, and the TVT dip terms.
    const pTop = geometryPositionAt(g, top), pBase = geometryPositionAt(g, base);
    const dip = g.hasHorizontal ? (z.dipDeg ?? 0) : 0;
    const tanDip = Math.tan((dip * Math.PI) / 180);
    const az = ((z.dipAzimuthDeg ?? 0) * Math.PI) / 180;
    const kN = tanDip * Math.cos(az), kE = tanDip * Math.sin(az);
    const { tvd, north, east } = g.at;
    sums = zoneSumsGeo(d, curves.VSH, curves.PHIE, curves.SW, curves.PERM, qc, c, top, base, start, end, { tvd, north, east, top: pTop, base: pBase, dipping: dip !== 0, kN, kE });
    grossTvd = pBase.tvd - pTop.tvd;
    grossTvt = grossTvd - (dip !== 0 ? kN * (pBase.north - pTop.north) + kE * (pBase.east - pTop.east) : 0);
  }
  const geo = g !== undefined;
  return {
    zone: z.name,
    formation: formationOf(z),
    top,
    base,
    cutoffs: { ...c },
    gross: intervalSummary(sums.gross, geo, grossMd, grossTvd, grossTvt),
    netReservoir: intervalSummary(sums.res, geo),
    netPay: intervalSummary(sums.pay, geo),
    netToGross: sums.res.h / grossMd,
    payToGross: sums.pay.h / grossMd,
    sampleCount: sums.sampleCount,
    nullCount: sums.nullCount,
    nullThickness: sums.nullThickness,
    clamped: sums.clamped,
  };
}
