/**
 * Reading one formation's values out of an interpretation's stored zone summaries (the
 * `summaries` jsonb written by the interpretation service from core's zone summaries).
 */

/** What a reserves case takes from one approved interpretation, for its target formation. */
export interface SourceSnapshot {
  wellId: string;
  wellName: string;
  interpretationId: string;
  version: number;
  approvedAt: string | null;
  formationName: string;
  /** Depth unit of the interpretation's thicknesses ('ft' or 'm'). */
  depthUnit: 'ft' | 'm';
  /** Net pay thickness, depth unit (null when the zone has none recorded). */
  netPay: number | null;
  /** Net pay, feet. */
  netPayFt: number | null;
  /** Thickness-weighted mean porosity over net pay, fraction (null when there is no net pay). */
  porosity: number | null;
  /** Pore-volume-weighted mean Sw over net pay, fraction. */
  sw: number | null;
  gross: number | null;
  /** Which thickness net pay is: true vertical (TVT), vertical (TVD) or measured (MD). */
  thicknessBasis: 'TVT' | 'TVD' | 'MD' | null;
}

type Summary = Record<string, unknown>;

const M_PER_FT = 0.3048; // international foot, exact (NIST SP 811)

function numberOrNull(...values: unknown[]): number | null {
  for (const v of values) {
    if (typeof v === 'number' && Number.isFinite(v)) return v;
    if (v && typeof v === 'object' && 'value' in v && typeof (v as { value: unknown }).value === 'number') {
      const n = (v as { value: number }).value;
      if (Number.isFinite(n)) return n;
    }
  }
  return null;
}

function str(v: unknown): string | null {
  return typeof v === 'string' ? v : null;
}

/** The summary of the formation: matched by formation id, else by zone/formation name. */
export function findZoneSummary(summaries: readonly Summary[], formation: { id: string; name: string }): Summary | undefined {
  const byId = summaries.find((s) => s.formationId === formation.id);
  if (byId) return byId;
  const name = formation.name.trim().toLowerCase();
  return summaries.find((s) => [s.formation, s.zone, s.name, s.formationName].some((v) => str(v)?.trim().toLowerCase() === name));
}

export function normaliseDepthUnit(unit: unknown): 'ft' | 'm' | null {
  const u = str(unit)?.trim().toLowerCase();
  if (!u) return null;
  if (u === 'm' || u === 'metre' || u === 'meter' || u === 'metres' || u === 'meters') return 'm';
  if (u === 'ft' || u === 'f' || u === 'feet' || u === 'foot') return 'ft';
  return null;
}

type Thick = { md?: unknown; tvd?: unknown; tvt?: unknown };

/** The thickness for volumetrics: true vertical thickness when a survey gave one, else TVD, else MD. */
function thicknessOf(t: unknown): { value: number | null; basis: 'TVT' | 'TVD' | 'MD' | null } {
  if (typeof t === 'number') return { value: Number.isFinite(t) ? t : null, basis: 'MD' };
  if (!t || typeof t !== 'object') return { value: null, basis: null };
  const th = t as Thick;
  const tvt = numberOrNull(th.tvt);
  if (tvt !== null) return { value: tvt, basis: 'TVT' };
  const tvd = numberOrNull(th.tvd);
  if (tvd !== null) return { value: tvd, basis: 'TVD' };
  const md = numberOrNull(th.md);
  return { value: md, basis: md === null ? null : 'MD' };
}

/**
 * Net pay, mean porosity and mean Sw of one zone summary, as core's ZoneSummary holds them:
 * `netPay: { thickness: { md, tvd, tvt }, meanPhi, meanSw }`, `gross: { thickness }`. The
 * thickness is the true vertical thickness when the interpretation had a survey (the thickness
 * a volumetric map area multiplies), else TVD, else MD. A flat form (netPay, phiMean, swMean)
 * is read too.
 */
export function valuesOfSummary(
  summary: Summary,
  fallbackDepthUnit: 'ft' | 'm',
): Pick<SourceSnapshot, 'depthUnit' | 'netPay' | 'netPayFt' | 'porosity' | 'sw' | 'gross' | 'thicknessBasis'> {
  const depthUnit = normaliseDepthUnit(summary.depthUnit) ?? fallbackDepthUnit;
  const pay = summary.netPay;
  let netPay: number | null;
  let basis: SourceSnapshot['thicknessBasis'];
  let porosity: number | null;
  let sw: number | null;
  if (pay && typeof pay === 'object') {
    const p = pay as Summary;
    ({ value: netPay, basis } = thicknessOf(p.thickness));
    porosity = numberOrNull(p.meanPhi);
    sw = numberOrNull(p.meanSw);
  } else {
    netPay = numberOrNull(pay);
    basis = netPay === null ? null : 'MD';
    porosity = numberOrNull(summary.phiMean, summary.meanPhi);
    sw = numberOrNull(summary.swMean, summary.meanSw);
  }
  const g = summary.gross;
  const gross = g && typeof g === 'object' ? thicknessOf((g as Summary).thickness).value : numberOrNull(g);
  const netPayFt = netPay === null ? null : depthUnit === 'm' ? netPay / M_PER_FT : netPay;
  return { depthUnit, netPay, netPayFt, porosity, sw, gross, thicknessBasis: basis };
}
