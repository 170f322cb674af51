/**
 * Response shapes of the workbench part of the API (formations, tops, zones, bindings, curve
 * check, survey, zone parameters, interpretations, review, audit, zone tables), as the UI reads
 * them. Depths are in the well's `depthUnit`; fractions (Vsh, porosity, Sw, N/G) are v/v.
 */
import type { ZoneSummary } from '@poreline/core';

export interface Cutoffs {
  /** Net reservoir passes when Vsh <= vshMax (v/v). */
  vshMax: number;
  /** Net reservoir passes when porosity >= phiMin (v/v). */
  phiMin: number;
  /** Net pay passes when Sw <= swMax (v/v). */
  swMax: number;
  /** Optional permeability floor, mD; null when not used. */
  permMin: number | null;
}

export interface FormationDto {
  id: string;
  name: string;
  ordinal: number;
  colour: string;
  lithology: string;
  cutoffs: Cutoffs;
}

export interface RecomputedWell {
  wellId: string;
  wellName: string;
  interpretationId: string;
  version: number;
  status: ReviewStatus;
  netPayBefore: number | null;
  netPayAfter: number | null;
  changed: boolean;
}

export interface CutoffsUpdateResult {
  formation: FormationDto;
  recomputed: RecomputedWell[];
}

export type TopSource = 'table' | 'depth-view';

export interface TopDto {
  formationId: string;
  formationName: string;
  colour: string;
  md: number;
  source: TopSource | string;
}

export interface ZoneDto {
  formationId: string;
  name: string;
  colour: string;
  top: number;
  base: number;
}

/** Binding keys of the merged sample bundle (upper-cased there: GR, RHOB, ...). */
export type BindingKey = 'gr' | 'sp' | 'cali' | 'rhob' | 'nphi' | 'dt' | 'pe' | 'rt' | 'rm' | 'rxo';

export interface BindingDto {
  binding: BindingKey | string;
  logRunId: string;
  mnemonic: string;
  unit: string;
  confirmed: boolean;
  proposed: boolean;
}

export interface CurveCheckRow {
  logRunId: string;
  mnemonic: string;
  unit: string;
  curveClass: string | null;
  coverage: { first: number | null; last: number | null; fraction: number };
  nullRuns: { from: number; to: number; samples: number }[];
  rangeViolations: {
    below: number;
    above: number;
    min: number | null;
    max: number | null;
    expectedMin: number | null;
    expectedMax: number | null;
  };
}

export interface SurveyDto {
  stations: { md: number; inclination: number; azimuth: number; tvd?: number }[] | number;
  depthUnit: string;
  tvdAtStations: number[];
}

/** One zone's evaluation parameters: the shape core validates (kept open: the server owns it). */
export type ZoneParams = Record<string, unknown>;

export interface ZoneParamsDto {
  params: ZoneParams;
  isDefault: boolean;
}

export interface WorkbenchZone {
  formationId: string;
  name: string;
  colour: string;
  top: number;
  base: number;
  params: ZoneParams;
}

export interface WorkbenchDto {
  well: { id: string; name: string; uwi: string | null; [key: string]: unknown };
  depthUnit: string;
  zones: WorkbenchZone[];
  cutoffs: Record<string, Cutoffs>;
  bindings: BindingDto[];
  survey: { md: number[]; tvd: number[] } | null;
  conventions: unknown;
  latest: InterpretationDto | null;
}

export type ReviewStatus = 'draft' | 'submitted' | 'approved' | 'returned';

/** A zone's summary as the server stores it: core's ZoneSummary (evaluateWell on the server). */
export type ZoneSummaryDto = ZoneSummary;

export interface InterpretationDto {
  id: string;
  wellId: string;
  version: number;
  status: ReviewStatus;
  inputs: Record<string, unknown>;
  summaries: ZoneSummaryDto[];
  warnings: unknown[];
  createdBy: string | { id: string; name: string } | null;
  submittedAt: string | null;
  reviewedAt: string | null;
  reviewedBy: string | { id: string; name: string } | null;
  reviewComment: string | null;
  updatedAt: string;
}

export interface AuditEntry {
  id: string;
  at: string;
  user: { id: string; name: string; email: string } | null;
  action: string;
  entity: string;
  entityId: string | null;
  before: unknown;
  after: unknown;
}

export interface ZoneTableRow {
  wellId: string;
  wellName: string;
  formation: string;
  version: number | null;
  status: ReviewStatus | null;
  gross: number | null;
  netReservoir: number | null;
  netPay: number | null;
  ntg: number | null;
  phiMean: number | null;
  swMean: number | null;
  vshMean: number | null;
  phiH: number | null;
  hcpt: number | null;
  depthUnit: string;
  [key: string]: unknown;
}
