import {
  PRMS_CONVENTION,
  RESERVES_DISCLAIMER,
  WELL_WEIGHTING_NOTES,
  areaToAcres,
  combineWellInputs,
  evaluateReservesCase,
  lengthToFeet,
  lognormalFromMeanSd,
  lognormalFromP90P10,
  lognormalSummary,
  type Distribution,
  type GasPvtResult,
  type InputSummary,
  type LognormalSummary,
  type OutputDistribution,
  type PrmsSummary,
  type ReservesCaseResult,
  type WellPayInput,
} from '@poreline/core';
import { INPUT_NAMES, type CaseInputs, type InputName, type Overridable, type WellOverridable } from './case-inputs.js';
import type { SourceSnapshot } from './source-values.js';
import { INPUT_LABELS } from './input-labels.js';

/**
 * The computation of a reserves case, pure: per-well values (with overrides) combined by the
 * chosen weighting, deterministic in-place and recoverable volumes, Monte Carlo with the stored
 * seed, PRMS percentiles, histogram, exceedance curve and tornado (core's evaluateReservesCase).
 * Errors are CaseInputError with the field named; the service turns them into 400s.
 */

export class CaseInputError extends Error {
  constructor(readonly messages: string[]) {
    super(messages.join('; '));
    this.name = 'CaseInputError';
  }
}

const M_PER_FT = 0.3048; // NIST SP 811, exact
const KM2_TO_ACRE = areaToAcres(1, 'km2');

/** One well's values as the case uses them (netPay in the case's lengthUnit). */
export interface ResolvedWell {
  wellId: string;
  wellName: string;
  netPay: number | null;
  porosity: number | null;
  sw: number | null;
  drainageArea: number | null;
  overridden: WellOverridable[];
  /** False when a value is missing (e.g. no net pay, so no mean porosity): skipped and counted. */
  used: boolean;
}

export interface CombinedValues {
  weighting: CaseInputs['weighting'];
  notes: { netPay: string; porosity: string; sw: string };
  wells: ResolvedWell[];
  /** Combined from the wells (before case-level overrides). */
  computed: { netPay: number; porosity: number; sw: number; totalDrainageArea: number | null; wellsUsed: number; wellsSkipped: number };
  /** What the case uses: computed, or the override. */
  final: { netPay: number; porosity: number; sw: number };
  overridden: Overridable[];
}

function toFeet(value: number, unit: 'ft' | 'm'): number {
  return lengthToFeet(value, unit);
}

/** Per-well values with overrides applied, then combined by the case's weighting. */
export function combineCase(sources: readonly SourceSnapshot[], inputs: CaseInputs): CombinedValues {
  if (!sources.length) throw new CaseInputError(['sources: pick at least one well with an approved interpretation']);
  const unit = inputs.lengthUnit;
  const wells: ResolvedWell[] = sources.map((s) => {
    const o = inputs.wellOverrides[s.wellId] ?? {};
    const fromSource = s.netPayFt === null ? null : unit === 'ft' ? s.netPayFt : s.netPayFt * M_PER_FT;
    const netPay = o.netPay?.value ?? fromSource;
    const porosity = o.porosity?.value ?? s.porosity;
    const sw = o.sw?.value ?? s.sw;
    const drainageArea = inputs.drainageAreas[s.wellId] ?? null;
    const overridden = (['netPay', 'porosity', 'sw'] as const).filter((k) => o[k] !== undefined);
    const used = netPay !== null && porosity !== null && sw !== null && (inputs.weighting !== 'area' || drainageArea !== null);
    return { wellId: s.wellId, wellName: s.wellName, netPay, porosity, sw, drainageArea, overridden, used };
  });
  if (inputs.weighting === 'area') {
    const missing = wells.filter((w) => w.drainageArea === null).map((w) => w.wellName);
    if (missing.length) throw new CaseInputError([`inputs.drainageAreas: area weighting needs a drainage area for ${missing.join(', ')}`]);
  }
  const payInputs: WellPayInput[] = wells.map((w) => ({
    name: w.wellName,
    netPayFt: w.netPay === null ? NaN : toFeet(w.netPay, unit),
    porosity: w.porosity ?? NaN,
    sw: w.sw ?? NaN,
    drainageAreaAcres: w.drainageArea === null ? undefined : areaToAcres(w.drainageArea, inputs.areaUnit),
  }));
  let combined;
  try {
    combined = combineWellInputs(payInputs, inputs.weighting);
  } catch (error) {
    throw new CaseInputError([`sources: ${(error as Error).message}`]);
  }
  const netPayComputed = unit === 'ft' ? combined.netPayFt : combined.netPayFt * M_PER_FT;
  const overridden = (['netPay', 'porosity', 'sw'] as const).filter((k) => inputs.overrides[k] !== undefined);
  return {
    weighting: inputs.weighting,
    notes: { ...WELL_WEIGHTING_NOTES[inputs.weighting] },
    wells,
    computed: {
      netPay: netPayComputed,
      porosity: combined.porosity,
      sw: combined.sw,
      totalDrainageArea: Number.isNaN(combined.totalAreaAcres) ? null : inputs.areaUnit === 'acre' ? combined.totalAreaAcres : combined.totalAreaAcres / KM2_TO_ACRE,
      wellsUsed: combined.wellsUsed,
      wellsSkipped: combined.wellsSkipped,
    },
    final: {
      netPay: inputs.overrides.netPay?.value ?? netPayComputed,
      porosity: inputs.overrides.porosity?.value ?? combined.porosity,
      sw: inputs.overrides.sw?.value ?? combined.sw,
    },
    overridden,
  };
}

/** A volume in field units with its metric equivalent. */
export interface Volume {
  field: number;
  fieldUnit: 'STB' | 'scf';
  m3: number;
}

export interface DeterministicResult {
  /** Base values in the case's units (area in areaUnit, net pay in lengthUnit, Bo rb/STB or Bg rcf/scf). */
  values: Record<InputName, number>;
  areaAcres: number;
  netPayFt: number;
  fvf: number;
  fvfUnit: 'rb/STB' | 'rcf/scf';
  pvt: GasPvtResult | null;
  inPlace: Volume;
  recoverable: Volume;
  formula: string;
}

export interface TornadoDto {
  baseOutput: number;
  method: string;
  rows: { input: InputName; inputP90: number; inputP10: number; outputAtInputP90: number; outputAtInputP10: number; low: number; high: number; swing: number }[];
}

/** One output (in place or recoverable) of the Monte Carlo run, as stored (plain arrays). */
export interface OutputStats extends PrmsSummary {
  fieldUnit: 'STB' | 'scf';
  m3: { p90: number; p50: number; p10: number; mean: number };
  histogram: { edges: number[]; counts: number[] };
  exceedance: { value: number[]; exceedance: number[] };
  tornado: TornadoDto;
}

export interface ProbabilisticResult {
  trials: number;
  seed: number;
  /** Each input's distribution as used (absent ones fixed at the deterministic value). */
  distributions: Record<InputName, Distribution>;
  inputSummaries: Record<InputName, InputSummary>;
  /** Rank correlations asked for, each with the rank correlation of the drawn samples (older runs: absent). */
  correlations?: { a: InputName; b: InputName; rank: number; sampled: number }[];
  /** Lognormal inputs in both forms (mean/sd and P90/P10), converted. */
  lognormals: Partial<Record<InputName, LognormalSummary>>;
  inPlace: OutputStats;
  recoverable: OutputStats;
  elapsedMs: number;
}

export interface CaseResults {
  revision: number;
  ranAt: string;
  fluid: 'oil' | 'gas';
  combined: CombinedValues;
  deterministic: DeterministicResult;
  probabilistic: ProbabilisticResult;
  notes: string[];
  conventions: string[];
}

/** Conventions the case follows, shown on screen and written to the export. */
export function caseConventions(inputs: CaseInputs): string[] {
  return [
    `Standard conditions: ${inputs.standard.pressurePsia} psia and ${inputs.standard.temperatureF} F (scf are stated at these).`,
    'Temperatures in Rankine are F + 459.67.',
    PRMS_CONVENTION,
    'Lognormal inputs may be given by mean and standard deviation or by P90 and P10; both forms are shown.',
    'Metric volumes: 1 bbl = 0.158987294928 m3, 1 ft3 = 0.028316846592 m3 (NIST SP 811); gas m3 stay at the scf standard conditions.',
    'Tornado: each input at its P90 and its P10 in turn, the other inputs at the deterministic values.',
    inputs.correlations.length
      ? `Inputs are sampled independently except the rank correlations given (${inputs.correlations.map((c) => `${INPUT_LABELS[c.a]} with ${INPUT_LABELS[c.b]}: ${c.rank}`).join('; ')}), drawn through a Gaussian copula (rho = 2 sin(pi rho_s / 6), Kruskal 1958); a gas case holds Bg fixed at its PVT value.`
      : 'Inputs are sampled independently (no correlation given); a gas case holds Bg fixed at its PVT value.',
  ];
}

function requireValue(messages: string[], field: string, value: number | null | undefined): number {
  if (value === null || value === undefined) {
    messages.push(`${field} is required to run the case`);
    return NaN;
  }
  return value;
}

function lognormalOf(d: Distribution): LognormalSummary | null {
  if (d.kind !== 'lognormal') return null;
  return lognormalSummary('p90' in d ? lognormalFromP90P10(d.p90, d.p10) : lognormalFromMeanSd(d.mean, d.sd));
}

function outputStats(o: OutputDistribution): OutputStats {
  const t = o.tornado;
  return {
    ...o.field,
    fieldUnit: o.fieldUnit,
    m3: { p90: o.metric.p90, p50: o.metric.p50, p10: o.metric.p10, mean: o.metric.mean },
    histogram: { edges: Array.from(o.histogram.edges), counts: Array.from(o.histogram.counts) },
    exceedance: { value: Array.from(o.exceedance.value), exceedance: Array.from(o.exceedance.exceedance) },
    tornado: { baseOutput: t.baseOutput, method: t.method, rows: t.rows.map((r) => ({ ...r })) },
  };
}

/** core's messages start with the function name; the user sees the field under `inputs.`. */
function inputsMessage(error: Error): string {
  return `inputs: ${error.message.replace(/^evaluateReservesCase: /, '')}`;
}

/**
 * Runs the whole case through core's evaluateReservesCase: combined values (with overrides),
 * deterministic and Monte Carlo volumes, tornado with the other inputs at the deterministic
 * values. Throws CaseInputError naming the fields at fault.
 */
export function runCase(sources: readonly SourceSnapshot[], inputs: CaseInputs, seed: number, revision: number): CaseResults {
  const started = performance.now();
  const combined = combineCase(sources, inputs);
  const messages: string[] = [];
  const area = requireValue(messages, 'inputs.area', inputs.area);
  const recoveryFactor = requireValue(messages, 'inputs.recoveryFactor', inputs.recoveryFactor);
  if (inputs.fluid === 'oil') requireValue(messages, 'inputs.bo', inputs.bo);
  if (inputs.fluid === 'gas' && !inputs.gas) messages.push('inputs.gas (reservoir pressure, temperature, gas gravity, z method) is required for a gas case');
  if (inputs.fluid === 'gas' && inputs.distributions.bo) messages.push('inputs.distributions.bo: a gas case has no Bo; its Bg comes from the gas PVT');
  if (messages.length) throw new CaseInputError(messages);
  const distributions: CaseInputs['distributions'] = { ...inputs.distributions };
  let r: ReservesCaseResult;
  try {
    r = evaluateReservesCase({
      fluid: inputs.fluid,
      area,
      areaUnit: inputs.areaUnit,
      netPay: combined.final.netPay,
      netPayUnit: inputs.lengthUnit,
      porosity: combined.final.porosity,
      sw: combined.final.sw,
      recoveryFactor,
      bo: inputs.fluid === 'oil' ? inputs.bo! : undefined,
      gas: inputs.fluid === 'gas' ? { ...inputs.gas!, standard: inputs.standard } : undefined,
      distributions,
      correlations: inputs.correlations,
      monteCarlo: { trials: inputs.trials, seed },
      tornadoBase: 'base',
    });
  } catch (error) {
    if (error instanceof RangeError) throw new CaseInputError([inputsMessage(error)]);
    throw error;
  }
  const p = r.probabilistic!;
  const d = r.deterministic;
  const lognormals: ProbabilisticResult['lognormals'] = {};
  for (const name of INPUT_NAMES) {
    const l = lognormalOf(p.inputs[name]);
    if (l) lognormals[name] = l;
  }
  return {
    revision,
    ranAt: new Date().toISOString(),
    fluid: inputs.fluid,
    combined,
    deterministic: {
      values: { area, netPay: combined.final.netPay, porosity: combined.final.porosity, sw: combined.final.sw, bo: d.fvf, recoveryFactor },
      areaAcres: d.areaAcres,
      netPayFt: d.netPayFt,
      fvf: d.fvf,
      fvfUnit: d.fvfUnit,
      pvt: d.gasPvt,
      inPlace: { field: d.inPlace.field, fieldUnit: d.inPlace.fieldUnit, m3: d.inPlace.metric },
      recoverable: { field: d.recoverable.field, fieldUnit: d.recoverable.fieldUnit, m3: d.recoverable.metric },
      formula:
        inputs.fluid === 'oil'
          ? 'N [STB] = 7758.37 A[acre] h[ft] phi (1 - Sw) / Bo (Craft & Hawkins 1991); recoverable = N x RF'
          : 'G [scf] = 43,560 A[acre] h[ft] phi (1 - Sw) / Bg[rcf/scf] (Craft & Hawkins 1991); Bg = (psc/Tsc) z T / p; recoverable = G x RF',
    },
    probabilistic: {
      trials: p.trials,
      seed: p.seed,
      distributions: p.inputs,
      inputSummaries: p.inputSummaries,
      correlations: p.correlations,
      lognormals,
      inPlace: outputStats(p.inPlace),
      recoverable: outputStats(p.recoverable),
      elapsedMs: Math.round(performance.now() - started),
    },
    notes: r.notes,
    conventions: caseConventions(inputs),
  };
}

/** The caution carried by every response and screen that shows volumes (core's wording). */
export const RESERVES_CAUTION = RESERVES_DISCLAIMER;
