import type { ReviewStatus } from '@poreline/schema';
import type { InterpretationInputs } from '../interpretations/interpretation-inputs.js';

/** One zone of one well's interpretation, flat, in the interpretation's depth unit; averages and phi-h over net pay. */
export interface ZoneTableRow {
  wellId: string;
  wellName: string;
  interpretationId: string | null;
  version: number | null;
  status: ReviewStatus | null;
  formationId: string | null;
  formation: string;
  top: number | null;
  base: number | null;
  gross: number | null;
  netReservoir: number | null;
  netPay: number | null;
  /** Net reservoir / gross. */
  ntg: number | null;
  /** Thickness-weighted PHIE over net pay. */
  phiMean: number | null;
  /** Pore-volume-weighted Sw over net pay. */
  swMean: number | null;
  vshMean: number | null;
  /** sum(PHIE h) over net pay. */
  phiH: number | null;
  /** sum(PHIE (1 - Sw) h) over net pay. */
  hcpt: number | null;
  grossTvd: number | null;
  netReservoirTvd: number | null;
  netPayTvd: number | null;
  phiHTvd: number | null;
  hcptTvd: number | null;
  grossTvt: number | null;
  netReservoirTvt: number | null;
  netPayTvt: number | null;
  phiHTvt: number | null;
  hcptTvt: number | null;
  depthUnit: string | null;
}

/** Columns of the zone table in order, with the unit each is in ('depth' = the row's depth unit). */
export const ZONE_TABLE_COLUMNS: readonly { key: keyof ZoneTableRow; label: string; unit: 'depth' | 'v/v' | null }[] = [
  { key: 'wellName', label: 'Well', unit: null },
  { key: 'formation', label: 'Formation', unit: null },
  { key: 'version', label: 'Version', unit: null },
  { key: 'status', label: 'Status', unit: null },
  { key: 'top', label: 'Top MD', unit: 'depth' },
  { key: 'base', label: 'Base MD', unit: 'depth' },
  { key: 'gross', label: 'Gross MD', unit: 'depth' },
  { key: 'netReservoir', label: 'Net reservoir MD', unit: 'depth' },
  { key: 'netPay', label: 'Net pay MD', unit: 'depth' },
  { key: 'ntg', label: 'Net/gross', unit: 'v/v' },
  { key: 'phiMean', label: 'Porosity net pay', unit: 'v/v' },
  { key: 'swMean', label: 'Sw net pay', unit: 'v/v' },
  { key: 'vshMean', label: 'Vsh net pay', unit: 'v/v' },
  { key: 'phiH', label: 'Phi-h net pay MD', unit: 'depth' },
  { key: 'hcpt', label: 'HCPT net pay MD', unit: 'depth' },
  { key: 'grossTvd', label: 'Gross TVD', unit: 'depth' },
  { key: 'netReservoirTvd', label: 'Net reservoir TVD', unit: 'depth' },
  { key: 'netPayTvd', label: 'Net pay TVD', unit: 'depth' },
  { key: 'phiHTvd', label: 'Phi-h net pay TVD', unit: 'depth' },
  { key: 'hcptTvd', label: 'HCPT net pay TVD', unit: 'depth' },
  { key: 'grossTvt', label: 'Gross TVT', unit: 'depth' },
  { key: 'netReservoirTvt', label: 'Net reservoir TVT', unit: 'depth' },
  { key: 'netPayTvt', label: 'Net pay TVT', unit: 'depth' },
  { key: 'phiHTvt', label: 'Phi-h net pay TVT', unit: 'depth' },
  { key: 'hcptTvt', label: 'HCPT net pay TVT', unit: 'depth' },
];

type Thickness = { md: number; tvd: number | null; tvt: number | null };
interface StoredInterval {
  thickness: Thickness;
  meanPhi: number | null;
  meanSw: number | null;
  meanVsh: number | null;
  phiH: Thickness;
  hcpt: Thickness;
}
interface StoredSummary {
  zone: string;
  formation: string;
  top: number;
  base: number;
  gross: StoredInterval;
  netReservoir: StoredInterval;
  netPay: StoredInterval;
  netToGross: number;
}

const finiteOrNull = (x: number | null | undefined) => (typeof x === 'number' && Number.isFinite(x) ? x : null);

/** The rows of one interpretation version (one per zone summary). */
export function zoneTableRows(well: { id: string; name: string }, v: { id: string; version: number; status: ReviewStatus; inputs: Record<string, unknown>; summaries: Record<string, unknown>[] }): ZoneTableRow[] {
  const inputs = v.inputs as unknown as Partial<InterpretationInputs>;
  return (v.summaries as unknown as StoredSummary[]).map((s) => ({
    wellId: well.id,
    wellName: well.name,
    interpretationId: v.id,
    version: v.version,
    status: v.status,
    formationId: inputs.zones?.find((z) => z.name === s.zone)?.formationId ?? null,
    formation: s.formation,
    top: s.top,
    base: s.base,
    gross: s.gross.thickness.md,
    netReservoir: s.netReservoir.thickness.md,
    netPay: s.netPay.thickness.md,
    ntg: finiteOrNull(s.netToGross),
    phiMean: s.netPay.meanPhi,
    swMean: s.netPay.meanSw,
    vshMean: s.netPay.meanVsh,
    phiH: s.netPay.phiH.md,
    hcpt: s.netPay.hcpt.md,
    grossTvd: s.gross.thickness.tvd,
    netReservoirTvd: s.netReservoir.thickness.tvd,
    netPayTvd: s.netPay.thickness.tvd,
    phiHTvd: s.netPay.phiH.tvd,
    hcptTvd: s.netPay.hcpt.tvd,
    grossTvt: s.gross.thickness.tvt,
    netReservoirTvt: s.netReservoir.thickness.tvt,
    netPayTvt: s.netPay.thickness.tvt,
    phiHTvt: s.netPay.phiH.tvt,
    hcptTvt: s.netPay.hcpt.tvt,
    depthUnit: inputs.depthUnit ?? null,
  }));
}

/** A row for a well that has the formation but no interpretation version yet. */
export function emptyZoneTableRow(well: { id: string; name: string }, formation: { id: string; name: string }): ZoneTableRow {
  const row = Object.fromEntries(ZONE_TABLE_COLUMNS.map((c) => [c.key, null])) as unknown as ZoneTableRow;
  return { ...row, wellId: well.id, wellName: well.name, interpretationId: null, formationId: formation.id, formation: formation.name, depthUnit: null };
}
