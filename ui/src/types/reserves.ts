/**
 * Response shapes of the reserves-case and production part of the API (see RESERVES.md), as the
 * UI reads them. Volumes in field units (STB, scf) with metric m3; fractions are v/v.
 */
import type { Distribution, GasPvtResult, InputSummary, LognormalSummary, PrmsSummary } from '@poreline/core';
import type { ReviewStatus } from './workbench';

export type { ReviewStatus };

export type InputName = 'area' | 'netPay' | 'porosity' | 'sw' | 'bo' | 'recoveryFactor';
export type Weighting = 'arithmetic' | 'thickness' | 'area';
export type WellValue = 'netPay' | 'porosity' | 'sw';

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
  kind: DeclineKind;
  economicLimit: number;
}

export interface CaseInputs {
  weighting: Weighting;
  drainageAreas: Record<string, number>;
  wellOverrides: Record<string, Partial<Record<WellValue, Override>>>;
  overrides: Partial<Record<WellValue, Override>>;
  areaUnit: 'acre' | 'km2';
  lengthUnit: 'ft' | 'm';
  area: number | null;
  fluid: 'oil' | 'gas';
  bo: number | null;
  gas: GasInputs | null;
  recoveryFactor: number | null;
  standard: { pressurePsia: number; temperatureF: number };
  distributions: Partial<Record<InputName, Distribution>>;
  /** Rank (Spearman) correlations between inputs with distributions; none = independent. */
  correlations: InputCorrelation[];
  trials: number;
  declineChecks: Record<string, DeclineCheck>;
}

export interface InputCorrelation {
  a: InputName;
  b: InputName;
  rank: number;
}

/** A partial update of the inputs: each key given replaces that key. Overrides are sent without by/at. */
export type CaseInputsPatch = Partial<Omit<CaseInputs, 'overrides' | 'wellOverrides'>> & {
  overrides?: Partial<Record<WellValue, { value: number; reason: string }>>;
  wellOverrides?: Record<string, Partial<Record<WellValue, { value: number; reason: string }>>>;
};

export interface SourceDto {
  wellId: string;
  wellName: string;
  interpretationId: string;
  version: number;
  approvedAt: string | null;
  formationName: string;
  depthUnit: 'ft' | 'm';
  netPay: number | null;
  netPayFt: number | null;
  porosity: number | null;
  sw: number | null;
  gross: number | null;
  thicknessBasis: 'TVT' | 'TVD' | 'MD' | null;
  latestApprovedVersion: number | null;
  latestInterpretationId: string | null;
  stale: boolean;
}

export type CandidateDto = Omit<SourceDto, 'latestApprovedVersion' | 'latestInterpretationId' | 'stale'>;

export interface ResolvedWell {
  wellId: string;
  wellName: string;
  netPay: number | null;
  porosity: number | null;
  sw: number | null;
  drainageArea: number | null;
  overridden: WellValue[];
  used: boolean;
}

export interface CombinedValues {
  weighting: Weighting;
  notes: { netPay: string; porosity: string; sw: string };
  wells: ResolvedWell[];
  computed: { netPay: number; porosity: number; sw: number; totalDrainageArea: number | null; wellsUsed: number; wellsSkipped: number };
  final: { netPay: number; porosity: number; sw: number };
  overridden: WellValue[];
}

export interface Volume {
  field: number;
  fieldUnit: 'STB' | 'scf';
  m3: number;
}

export interface TornadoRowDto {
  input: InputName;
  inputP90: number;
  inputP10: number;
  outputAtInputP90: number;
  outputAtInputP10: number;
  low: number;
  high: number;
  swing: number;
}

export interface TornadoDto {
  baseOutput: number;
  method: string;
  rows: TornadoRowDto[];
}

export interface OutputStats extends PrmsSummary {
  fieldUnit: 'STB' | 'scf';
  m3: { p90: number; p50: number; p10: number; mean: number };
  histogram: { edges: number[]; counts: number[] };
  exceedance: { value: number[]; exceedance: number[] };
  tornado: TornadoDto;
}

export interface CaseResults {
  revision: number;
  ranAt: string;
  fluid: 'oil' | 'gas';
  combined: CombinedValues;
  deterministic: {
    values: Record<InputName, number>;
    areaAcres: number;
    netPayFt: number;
    fvf: number;
    fvfUnit: 'rb/STB' | 'rcf/scf';
    pvt: GasPvtResult | null;
    inPlace: Volume;
    recoverable: Volume;
    formula: string;
  };
  probabilistic: {
    trials: number;
    seed: number;
    distributions: Record<InputName, Distribution>;
    inputSummaries: Record<InputName, InputSummary>;
    /** The rank correlations asked for, with the rank correlation of the drawn samples (runs before correlations existed: absent). */
    correlations?: (InputCorrelation & { sampled: number })[];
    lognormals: Partial<Record<InputName, LognormalSummary>>;
    inPlace: OutputStats;
    recoverable: OutputStats;
    elapsedMs: number;
  };
  notes: string[];
  conventions: string[];
}

export interface UserRef {
  id: string;
  name: string;
}

export interface ReservesCase {
  id: string;
  assetId: string;
  formationId: string;
  formationName: string;
  name: string;
  status: ReviewStatus;
  revision: number;
  seed: number;
  sources: SourceDto[];
  inputs: CaseInputs;
  combined: CombinedValues | null;
  combinedError: string | null;
  results: CaseResults | null;
  resultsCurrent: boolean;
  staleSources: number;
  conventions: string[];
  caution: string;
  createdBy: UserRef | null;
  submittedBy: UserRef | null;
  submittedAt: string | null;
  reviewedBy: UserRef | null;
  reviewedAt: string | null;
  reviewComment: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface ReservesCaseSummary {
  id: string;
  name: string;
  formationId: string;
  formationName: string;
  status: ReviewStatus;
  revision: number;
  fluid: 'oil' | 'gas';
  wellCount: number;
  staleSources: number;
  recoverable: { deterministic: number; p90: number; p50: number; p10: number; unit: 'STB' | 'scf' } | null;
  resultsCurrent: boolean;
  updatedAt: string;
  createdBy: UserRef | null;
}

// --- production data and cross-checks ---

export type SeriesKind = 'pressure' | 'rate';
export type DeclineKind = 'exponential' | 'hyperbolic' | 'harmonic';

export interface SeriesDto {
  id: string;
  wellId: string;
  kind: SeriesKind;
  fluid: string;
  units: Record<string, string>;
  points: Record<string, number | string>[];
  fileName: string | null;
  label: string;
  createdAt: string;
  uploadedBy: string | null;
}

export interface PzFitDto {
  seriesId: string;
  temperatureF: number;
  gasGravity: number;
  zMethod: 'dak' | 'hall-yarborough';
  points: { cumGasScf: number; pressurePsia: number; z: number; pOverZ: number }[];
  fit: { intercept: number; slope: number; r2: number; n: number };
  drainedGipScf: number;
  drainedGipM3: number;
  volumetric: { caseId: string; caseName: string; basis: string; gipScf: number; wells: number; ratio: number }[];
  wellsNeeded: number | null;
  method: string;
  assumptions: string[];
  caution: string;
}

export interface DeclineFitDto {
  seriesId: string;
  kind: DeclineKind;
  rateUnit: string;
  volumeUnit: string;
  timeUnit: string;
  qi: number;
  b: number;
  diNominalPerYear: number;
  diEffectivePerYear: number;
  r2: number;
  rmse: number;
  atBound: boolean;
  points: { tDays: number; rate: number; fitted: number }[];
  forecast: { tDays: number; rate: number }[];
  economicLimit: number;
  cumulativeToDate: number;
  eur: number;
  remaining: number;
  timeToLimitDays: number;
  notes: string[];
  caution: string;
}

export interface InflowInput {
  permeabilityMd: number;
  netPayFt: number;
  viscosityCp: number;
  fvf: number;
  drawdownPsi: number;
  drainageRadiusFt: number;
  wellboreRadiusFt: number;
  skin?: number;
  horizontal?: { lengthFt: number; kvMd?: number; rehFt?: number };
}

export interface InflowResultDto {
  vertical: { rateStbPerDay: number; productivityIndex: number; equation: string };
  horizontal: null | {
    rateStbPerDay: number;
    productivityIndex: number;
    aFt: number;
    beta: number;
    verticalSteadyStateRateStbPerDay: number;
    productivityRatio: number;
    equation: string;
  };
  assumptions: string[];
}

/** POST /assets/:assetId/inflow/gas (service: production/dto/production.dto.ts GasInflowDto). */
export interface GasInflowInput {
  permeabilityMd: number;
  netPayFt: number;
  viscosityCp: number;
  reservoirPressurePsia: number;
  bottomholePressurePsia: number;
  temperatureF: number;
  gasGravity: number;
  zMethod?: 'dak' | 'hall-yarborough';
  drainageRadiusFt: number;
  wellboreRadiusFt: number;
  skin?: number;
}

export interface GasInflowResultDto {
  rateMscfPerDay: number;
  absoluteOpenFlowMscfPerDay: number;
  coefficient: number;
  averagePressurePsia: number;
  pvt: { z: number; zMethod: 'dak' | 'hall-yarborough'; tpr: number; ppr: number };
  equation: string;
  assumptions: string[];
}
