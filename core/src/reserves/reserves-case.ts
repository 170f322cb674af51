import { type Distribution, checkDistribution, distributionQuantile } from './distributions.js';
import { type GasPvtResult, type ZFactorMethod, gasPvt } from './gas-fvf.js';
import { type Histogram, histogram } from './histogram.js';
import { sampleInputs } from './monte-carlo.js';
import { type InputCorrelation, sampleRankCorrelation } from './rank-correlation.js';
import {
  type ExceedanceCurve,
  type PrmsSummary,
  PRMS_CONVENTION,
  exceedanceFromQuantiles,
  exceedanceProbabilities,
  finiteCopy,
  quantilesOf,
  summaryFrom,
} from './percentiles.js';
import type { StandardConditions } from './standard-conditions.js';
import { type TornadoBase, type TornadoResult, tornado } from './tornado.js';
import { BBL_PER_ACRE_FT, FT3_PER_ACRE_FT, M3_PER_BBL, M3_PER_FT3 } from './units-constants.js';
import { type AreaUnit, type LengthUnit, areaToAcres, gasInPlace, lengthToFeet, oilInPlace } from './volumetrics.js';

/** Inputs of a reserves case that may carry a distribution. */
export type ReservesInputName = 'area' | 'netPay' | 'porosity' | 'sw' | 'bo' | 'recoveryFactor';

/** Gas PVT inputs of a gas case (Bg is computed, not sampled). */
export interface ReservesGasInput {
  pressurePsia: number;
  temperatureF: number;
  gasGravity: number;
  /** Default 'dak'. */
  zMethod?: ZFactorMethod;
  /** Default 14.696 psia, 60 F. */
  standard?: StandardConditions;
}

/**
 * A whole reserves case as stored by the service and edited in the UI. Deterministic values are
 * the base case; `distributions` (same units as the base values: area in `areaUnit`, net pay in
 * `netPayUnit`, fractions for porosity, Sw and RF, rb/STB for Bo) make an input uncertain; an
 * input without a distribution is held fixed at its base value in the Monte Carlo run.
 */
export interface ReservesCaseInput {
  fluid: 'oil' | 'gas';
  area: number;
  areaUnit: AreaUnit;
  netPay: number;
  /** Default 'ft'. */
  netPayUnit?: LengthUnit;
  porosity: number;
  sw: number;
  recoveryFactor: number;
  /** Oil formation volume factor, rb/STB (oil cases). */
  bo?: number;
  /** Gas PVT (gas cases). */
  gas?: ReservesGasInput;
  distributions?: Partial<Record<ReservesInputName, Distribution>>;
  /**
   * Rank (Spearman) correlations between uncertain inputs, e.g. porosity and Sw (default none:
   * inputs drawn independently). See rank-correlation.ts.
   */
  correlations?: InputCorrelation<ReservesInputName>[];
  /** Monte Carlo settings; omit for a deterministic-only case. */
  monteCarlo?: { trials: number; seed: number; bins?: number; exceedancePoints?: number };
  /** What the other inputs hold in the tornado: their P50 (default) or the base values. */
  tornadoBase?: TornadoBase;
}

/** A volume in field and metric units. */
export interface VolumePair {
  field: number;
  fieldUnit: 'STB' | 'scf';
  metric: number;
  /** Stock-tank m3 (oil) or m3 of gas at the scf's standard conditions. */
  metricUnit: 'm3';
}

/** Probabilistic summary of one output in both unit systems. */
export interface OutputDistribution {
  field: PrmsSummary;
  metric: PrmsSummary;
  fieldUnit: 'STB' | 'scf';
  /** Histogram in field units. */
  histogram: Histogram;
  /** Exceedance curve in field units. */
  exceedance: ExceedanceCurve;
  tornado: TornadoResult<ReservesInputName>;
}

/** An input's PRMS percentiles (exact, from the distribution) and the mean of its samples. */
export interface InputSummary {
  p90: number;
  p50: number;
  p10: number;
  sampleMean: number;
}

/** Result of {@link evaluateReservesCase}. */
export interface ReservesCaseResult {
  fluid: 'oil' | 'gas';
  deterministic: {
    areaAcres: number;
    netPayFt: number;
    /** Bo in rb/STB or Bg in rcf/scf. */
    fvf: number;
    fvfUnit: 'rb/STB' | 'rcf/scf';
    gasPvt: GasPvtResult | null;
    inPlace: VolumePair;
    recoverable: VolumePair;
  };
  probabilistic: null | {
    trials: number;
    seed: number;
    /** Distributions actually used (fixed at base where none was given). */
    inputs: Record<ReservesInputName, Distribution>;
    /** Each input's P90/P50/P10 (from its distribution, exact) and sample mean, in its own units. */
    inputSummaries: Record<ReservesInputName, InputSummary>;
    /** The rank correlations asked for, each with the rank correlation of the drawn samples. */
    correlations: (InputCorrelation<ReservesInputName> & { sampled: number })[];
    inPlace: OutputDistribution;
    recoverable: OutputDistribution;
  };
  /** Conventions and the reporting caveat, for display beside the numbers. */
  notes: string[];
}

/** Caveat shown wherever volumes appear (DESIGN.md). */
export const RESERVES_DISCLAIMER =
  'Estimates only. Classification and reporting of reserves and resources follow the applicable rules ' +
  '(for example SPE-PRMS 2018 or the local regulator) and need sign-off by a qualified evaluator; ' +
  'defer to local codes and licensed practice.';

/** Shown when inputs are correlated: the tornado moves one input at a time. */
export const TORNADO_CORRELATION_NOTE =
  'Correlated inputs: the Monte Carlo draws honour the rank correlations; the tornado still moves one input at a time with the others held, so it shows each input alone.';

const FN = 'evaluateReservesCase';
const NAMES: readonly ReservesInputName[] = ['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'];
// Physical range of each input (in case units), checked against each distribution's support.
const RANGE: Record<ReservesInputName, readonly [number, number, boolean]> = {
  area: [0, Infinity, true],
  netPay: [0, Infinity, false],
  porosity: [0, 1, false],
  sw: [0, 1, false],
  bo: [0, Infinity, true],
  recoveryFactor: [0, 1, false],
};

function checkSupport(name: ReservesInputName, d: Distribution): void {
  checkDistribution(d, FN, `distributions.${name}`);
  const [lo, hi, open] = RANGE[name];
  const a = distributionQuantile(d, 0);
  const b = distributionQuantile(d, 1);
  if (a < lo || (open && a === lo) || b > hi) {
    const range = `${open ? '(' : '['}${lo}, ${hi === Infinity ? 'inf' : hi}]`;
    throw new RangeError(
      `${FN}: distributions.${name} reaches [${a}, ${b}], outside ${range}; truncate it (truncate.min / truncate.max)`,
    );
  }
}

function scaleSummary(s: PrmsSummary, k: number): PrmsSummary {
  return { ...s, p90: s.p90 * k, p50: s.p50 * k, p10: s.p10 * k, mean: s.mean * k, sd: s.sd * k, min: s.min * k, max: s.max * k };
}

/**
 * Evaluates a whole reserves case: deterministic in-place and recoverable volumes (field and
 * metric units), and, when `monteCarlo` is given, a seeded Monte Carlo run over the inputs'
 * distributions with PRMS percentiles, histogram and exceedance data and a tornado for both
 * in-place and recoverable volumes.
 *
 *   oil: N = 7758.37 A h phi (1 - Sw) / Bo [STB];  gas: G = 43,560 A h phi (1 - Sw) / Bg [scf]
 *   recoverable = in place x RF;  m3 = STB x 0.158987294928 or scf x 0.028316846592
 * Gas: Bg from pressure, temperature and gravity (Sutton 1985; DAK 1975 or Hall-Yarborough 1973)
 * is held fixed in the simulation. Inputs are sampled independently.
 *
 * @throws RangeError('evaluateReservesCase: ...') naming the field: wrong fluid, missing bo or
 *   gas inputs, values out of range, a distribution for bo in a gas case, or a distribution
 *   whose support leaves the physical range (e.g. an untruncated normal porosity)
 */
export function evaluateReservesCase(input: ReservesCaseInput): ReservesCaseResult {
  if (input === null || typeof input !== 'object') throw new RangeError(`${FN}: input must be an object`);
  const { fluid } = input;
  if (fluid !== 'oil' && fluid !== 'gas') throw new RangeError(`${FN}: fluid must be 'oil' or 'gas' (got ${String(fluid)})`);
  const areaAcresPerUnit = areaToAcres(1, input.areaUnit);
  const ftPerUnit = lengthToFeet(1, input.netPayUnit ?? 'ft');
  for (const [k, v] of [
    ['area', input.area],
    ['netPay', input.netPay],
    ['porosity', input.porosity],
    ['sw', input.sw],
    ['recoveryFactor', input.recoveryFactor],
  ] as const) {
    const [lo, hi, open] = RANGE[k];
    if (typeof v !== 'number' || !Number.isFinite(v) || v < lo || (open && v === lo) || v > hi) {
      throw new RangeError(`${FN}: ${k} must be in ${open ? '(' : '['}${lo}, ${hi === Infinity ? 'inf' : hi}] (got ${String(v)})`);
    }
  }

  let fvf: number;
  let pvt: GasPvtResult | null = null;
  if (fluid === 'oil') {
    if (typeof input.bo !== 'number' || !Number.isFinite(input.bo) || !(input.bo > 0)) {
      throw new RangeError(`${FN}: bo must be > 0 rb/STB for an oil case (got ${String(input.bo)})`);
    }
    fvf = input.bo;
  } else {
    if (!input.gas) throw new RangeError(`${FN}: gas (pressurePsia, temperatureF, gasGravity) is required for a gas case`);
    if (input.distributions?.bo) throw new RangeError(`${FN}: distributions.bo applies to oil cases only (Bg comes from gas PVT)`);
    pvt = gasPvt(input.gas);
    fvf = pvt.bgRcfPerScf;
  }
  const constant = fluid === 'oil' ? BBL_PER_ACRE_FT : FT3_PER_ACRE_FT;
  const toMetric = fluid === 'oil' ? M3_PER_BBL : M3_PER_FT3;
  const fieldUnit = fluid === 'oil' ? 'STB' : 'scf';
  const areaAcres = input.area * areaAcresPerUnit;
  const netPayFt = input.netPay * ftPerUnit;
  const rock = { areaAcres, netPayFt, porosity: input.porosity, sw: input.sw };
  const inPlace = fluid === 'oil' ? oilInPlace({ ...rock, bo: fvf }) : gasInPlace({ ...rock, bg: fvf });
  const rec = inPlace * input.recoveryFactor;
  const pair = (v: number): VolumePair => ({ field: v, fieldUnit, metric: v * toMetric, metricUnit: 'm3' });

  const notes = [
    fluid === 'oil'
      ? 'OOIP = 7758.37 A h phi (1 - Sw) / Bo, with 7758.37 = 43,560 ft3/acre-ft / 5.614583 ft3/bbl (NIST SP 811).'
      : 'OGIP = 43,560 A h phi (1 - Sw) / Bg, Bg in rcf/scf at the stated standard conditions.',
    'Metric volumes: 1 bbl = 0.158987294928 m3, 1 ft3 = 0.028316846592 m3 (NIST SP 811); gas m3 stay at the scf standard conditions.',
    PRMS_CONVENTION,
    RESERVES_DISCLAIMER,
  ];
  const result: ReservesCaseResult = {
    fluid,
    deterministic: {
      areaAcres,
      netPayFt,
      fvf,
      fvfUnit: fluid === 'oil' ? 'rb/STB' : 'rcf/scf',
      gasPvt: pvt,
      inPlace: pair(inPlace),
      recoverable: pair(rec),
    },
    probabilistic: null,
    notes,
  };
  if (!input.monteCarlo) return result;

  // --- Monte Carlo ---
  const base: Record<ReservesInputName, number> = {
    area: input.area,
    netPay: input.netPay,
    porosity: input.porosity,
    sw: input.sw,
    bo: fvf,
    recoveryFactor: input.recoveryFactor,
  };
  const dists = {} as Record<ReservesInputName, Distribution>;
  for (const k of NAMES) {
    const d = input.distributions?.[k];
    if (d) checkSupport(k, d);
    dists[k] = d ?? { kind: 'fixed', value: base[k] };
  }
  for (const k of Object.keys(input.distributions ?? {})) {
    if (!NAMES.includes(k as ReservesInputName)) throw new RangeError(`${FN}: distributions.${k} is not a case input`);
  }
  const { trials, seed } = input.monteCarlo;
  const correlations = input.correlations ?? [];
  const s = sampleInputs(dists, trials, seed, FN, correlations);
  const outIn = new Float64Array(trials);
  const outRec = new Float64Array(trials);
  const k0 = constant * areaAcresPerUnit * ftPerUnit;
  const { area, netPay, porosity, sw, bo, recoveryFactor } = s;
  for (let i = 0; i < trials; i++) {
    const v = (k0 * area[i] * netPay[i] * porosity[i] * (1 - sw[i])) / bo[i];
    outIn[i] = v;
    outRec[i] = v * recoveryFactor[i];
  }
  const scalarIn = (v: Readonly<Record<ReservesInputName, number>>): number =>
    (k0 * v.area * v.netPay * v.porosity * (1 - v.sw)) / v.bo;
  const scalarRec = (v: Readonly<Record<ReservesInputName, number>>): number => scalarIn(v) * v.recoveryFactor;
  const tornadoBase = input.tornadoBase ?? 'p50';
  const points = input.monteCarlo.exceedancePoints ?? 101;
  if (!Number.isInteger(points) || points < 2) {
    throw new RangeError(`${FN}: monteCarlo.exceedancePoints must be an integer >= 2 (got ${points})`);
  }
  const summarize = (out: Float64Array, model: typeof scalarIn): OutputDistribution => {
    const { finite, missing } = finiteCopy(out);
    const probs = exceedanceProbabilities(points);
    const q = quantilesOf(finite, [0.1, 0.5, 0.9, ...probs]);
    const field = summaryFrom(finite, missing, q[0], q[1], q[2]);
    return {
      field,
      metric: scaleSummary(field, toMetric),
      fieldUnit,
      histogram: histogram(finite, { bins: input.monteCarlo?.bins ?? 40 }),
      exceedance: exceedanceFromQuantiles(q.slice(3)),
      tornado: tornado({ inputs: dists, model, base: tornadoBase, baseValues: base }),
    };
  };
  const inputSummaries = {} as Record<ReservesInputName, InputSummary>;
  for (const k of NAMES) {
    let sum = 0;
    const x = s[k];
    for (let i = 0; i < trials; i++) sum += x[i];
    inputSummaries[k] = {
      p90: distributionQuantile(dists[k], 0.1),
      p50: distributionQuantile(dists[k], 0.5),
      p10: distributionQuantile(dists[k], 0.9),
      sampleMean: sum / trials,
    };
  }
  if (correlations.length) notes.push(TORNADO_CORRELATION_NOTE);
  result.probabilistic = {
    trials,
    seed,
    inputs: dists,
    inputSummaries,
    correlations: correlations.map((c) => ({ a: c.a, b: c.b, rank: c.rank, sampled: trials > 1 ? sampleRankCorrelation(s[c.a], s[c.b]) : Number.NaN })),
    inPlace: summarize(outIn, scalarIn),
    recoverable: summarize(outRec, scalarRec),
  };
  return result;
}
