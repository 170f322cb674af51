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
  payFlag,
  reservoirFlag,
} from './cutoffs.js';
import { type SampleGeometry, type SurveyInput, geometryPositionAt, sampleGeometry } from './sample-geometry.js';
import { type ZoneRange, depthIssues, zoneBoundsIssues, zoneRangesUnchecked } from './sample-thickness.js';
import { QC_PHIE_CLAMPED, QC_PHIT_CLAMPED, QC_SW_CLAMPED, QC_VSH_CLIPPED } from './qc.js';

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

/** Running sums of one interval class (gross, net reservoir or net pay). */
class Sums {
  h = 0; hv = 0; ht = 0;
  hPhi = 0; phiH = 0; phiHv = 0; phiHt = 0;
  phiHSw = 0; phiSwH = 0; hc = 0; hcv = 0; hct = 0;
  hVsh = 0; vshH = 0;
  add(h: number, hv: number, ht: number, vsh: number, phi: number, sw: number): void {
    this.h += h; this.hv += hv; this.ht += ht;
    if (phi === phi) {
      this.hPhi += h; this.phiH += phi * h; this.phiHv += phi * hv; this.phiHt += phi * ht;
      if (sw === sw) {
        this.phiHSw += phi * h; this.phiSwH += phi * sw * h;
        const so = phi * (1 - sw);
        this.hc += so * h; this.hcv += so * hv; this.hct += so * ht;
      }
    }
    if (vsh === vsh) { this.hVsh += h; this.vshH += vsh * h; }
  }
  result(geo: boolean, grossMd?: number, grossTvd?: number, grossTvt?: number): IntervalSummary {
    const t = (md: number, v: number, tt: number): Thickness => ({ md, tvd: geo ? v : null, tvt: geo ? tt : null });
    return {
      thickness: grossMd === undefined ? t(this.h, this.hv, this.ht) : t(grossMd, grossTvd!, grossTvt!),
      meanPhi: this.hPhi > 0 ? this.phiH / this.hPhi : null,
      meanSw: this.phiHSw > 0 ? this.phiSwH / this.phiHSw : null,
      meanVsh: this.hVsh > 0 ? this.vshH / this.hVsh : null,
      phiH: t(this.phiH, this.phiHv, this.phiHt),
      hcpt: t(this.hc, this.hcv, this.hct),
    };
  }
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
  const n = d.length;
  const { VSH, PHIE, SW } = curves;
  const PERM = curves.PERM;
  const permMin = c.permMin ?? -Infinity;
  const gross = new Sums(), res = new Sums(), pay = new Sums();
  let sampleCount = 0, nullCount = 0, nullThickness = 0;
  const clamped = { vsh: 0, phit: 0, phie: 0, sw: 0 };
  const top = z.top, base = z.base;
  // Vertical geometry: positions at the zone's top and base, and the TVT dip terms.
  const geo = g !== undefined;
  const pTop = geo ? geometryPositionAt(g, top) : undefined;
  const pBase = geo ? geometryPositionAt(g, base) : undefined;
  const dip = geo && g.hasHorizontal ? (z.dipDeg ?? 0) : 0;
  const tanDip = Math.tan((dip * Math.PI) / 180);
  const az = ((z.dipAzimuthDeg ?? 0) * Math.PI) / 180;
  const kN = tanDip * Math.cos(az), kE = tanDip * Math.sin(az);
  const tvd = g?.at.tvd, north = g?.at.north, east = g?.at.east;

  let upper = start === 0 ? d[0] - 0.5 * (d[1] - d[0]) : 0.5 * (d[start - 1] + d[start]);
  for (let i = start; i < end; i++) {
    const lower = i < n - 1 ? 0.5 * (d[i] + d[i + 1]) : d[n - 1] + 0.5 * (d[n - 1] - d[n - 2]);
    const clipTop = upper < top, clipBase = lower > base;
    const a = clipTop ? top : upper, b = clipBase ? base : lower;
    upper = lower;
    const h = b - a;
    if (!(h > 0)) continue;
    let hv = 0, ht = 0;
    if (geo) {
      const tvA = clipTop ? pTop!.tvd : tvd![i], tvB = clipBase ? pBase!.tvd : tvd![i + 1];
      hv = tvB - tvA;
      if (dip !== 0) {
        const dN = (clipBase ? pBase!.north : north![i + 1]) - (clipTop ? pTop!.north : north![i]);
        const dE = (clipBase ? pBase!.east : east![i + 1]) - (clipTop ? pTop!.east : east![i]);
        ht = hv - (kN * dN + kE * dE);
      } else ht = hv;
    }
    sampleCount++;
    const vsh = VSH[i], phi = PHIE[i], sw = SW[i];
    gross.add(h, hv, ht, vsh, phi, sw);
    const r = reservoirFlag(vsh, phi, PERM ? PERM[i] : NaN, c.vshMax, c.phiMin, permMin);
    const p = payFlag(r, sw, c.swMax);
    if (r === 1) res.add(h, hv, ht, vsh, phi, sw);
    if (p === 1) pay.add(h, hv, ht, vsh, phi, sw);
    else if (p !== p) { nullCount++; nullThickness += h; }
    if (qc) {
      const q = qc[i];
      if (q !== 0) {
        if (q & QC_VSH_CLIPPED) clamped.vsh++;
        if (q & QC_PHIT_CLAMPED) clamped.phit++;
        if (q & QC_PHIE_CLAMPED) clamped.phie++;
        if (q & QC_SW_CLAMPED) clamped.sw++;
      }
    }
  }
  const grossMd = base - top;
  const grossTvd = geo ? pBase!.tvd - pTop!.tvd : 0;
  const grossTvt = geo ? grossTvd - (dip !== 0 ? kN * (pBase!.north - pTop!.north) + kE * (pBase!.east - pTop!.east) : 0) : 0;
  return {
    zone: z.name,
    formation: formationOf(z),
    top,
    base,
    cutoffs: { ...c },
    gross: gross.result(geo, grossMd, grossTvd, grossTvt),
    netReservoir: res.result(geo),
    netPay: pay.result(geo),
    netToGross: res.h / grossMd,
    payToGross: pay.h / grossMd,
    sampleCount,
    nullCount,
    nullThickness,
    clamped,
  };
}
