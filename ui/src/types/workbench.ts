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
  /** Null when the well has the formation but no saved version yet. */
  interpretationId: string | null;
  version: number | null;
  status: ReviewStatus | null;
  netPayBefore: number | null;
  netPayAfter: number | null;
  changed: boolean;
  /** The version was recomputed with the new cutoffs (draft or returned). */
  recomputed?: boolean;
  /** Why it could not be recomputed. */
  error?: string;
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
  fileName?: string;
  mnemonic: string;
  unit: string;
  confirmed: boolean;
  proposed: boolean;
}

export interface CurveCheckRow {
  logRunId: string;
  fileName?: string;
  depthUnit?: string;
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
  fileName?: string;
  stations: { md: number; inclination: number; azimuth: number }[];
  depthUnit: string;
  tvdAtStations: number[];
  uploadedAt?: string;
}

/** One zone's evaluation parameters: the shape core validates (kept open: the server owns it). */
export type ZoneParams = Record<string, unknown>;

export interface ZoneParamsDto {
  params: ZoneParams;
  isDefault: boolean;
}

export interface WorkbenchZone {
  formationId: string;
  /** Zone name = formation name. */
  name: string;
  /** Formation whose cutoffs apply (the key into `cutoffs`). */
  formation: string;
  colour: string;
  isDefault?: boolean;
  top: number;
  base: number;
  params: ZoneParams;
}

export interface WorkbenchDto {
  well: { id: string; name: string; uwi: string | null; [key: string]: unknown };
  depthUnit: 'ft' | 'm' | null;
  /** Exactly the zones evaluateWell runs on (clipped to the merged index). */
  zones: WorkbenchZone[];
  /** Zones left out or clipped, and merge problems. */
  notes?: string[];
  cutoffs: Record<string, Cutoffs>;
  bindings: BindingDto[];
  /** Stations in core's SurveyStation shape (md, inc, azi), in the well's depth unit. */
  survey: { depthUnit: 'ft' | 'm'; stations: { md: number; inc: number; azi: number }[]; md: number[]; tvd: number[] } | null;
  merged?: { start: number; stop: number; step: number; samples: number } | null;
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
  createdBy: { id: string; name: string } | null;
  createdAt?: string;
  submittedBy?: { id: string; name: string } | null;
  submittedAt: string | null;
  reviewedAt: string | null;
  reviewedBy: { id: string; name: string } | null;
  reviewComment: string | null;
  updatedAt: string;
}

export interface AuditEntry {
  id: string | number;
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
