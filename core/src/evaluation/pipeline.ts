/**
 * evaluateWell: the whole evaluation of one well in one call, the same in the service and
 * in the browser. Curves + zones (each with its parameters) + cutoffs per formation (+ an
 * optional deviation survey) -> computed curves, a QC mask, zone summaries and warnings.
 *
 * Per zone, plain loops over the zone's index range (small per-method stage loops, run chunk
 * by chunk: zone-kernels.ts) compute with the shared per-sample kernels: VSH (GR index clipped to [0, 1], then the method), PHIT (clamped to [0, phiMax]),
 * PHIE (= PHIT - VSH * phiShale, clamped to [0, PHIT]), SW (model, clamped to [0, 1], Rw
 * corrected by Arps to each sample's formation temperature), BVW = PHIE * SW, PERM (when the
 * zone has a transform), NET_RES and NET_PAY (1 / 0 / NaN). Samples outside every zone are
 * NaN. Clamps are recorded in the QC mask (see qc.ts) and counted in the summaries.
 * Conventions: EVALUATION_CONVENTIONS.
 */
import { type PickettFit, pickettFit } from '../petro/pickett.js';
import { gammaRayPercentiles, percentilesOf } from '../petro/shale-volume.js';
import { temperatureLine } from '../petro/temperature.js';
import { arpsOffset, rwFromSsp } from '../petro/water-resistivity.js';
import { positionsAtMd } from '../survey/minimum-curvature.js';
import { type ParameterIssue, throwIfIssues } from './errors.js';
import { type CutoffTable, type ZoneInterval, cutoffIssues, formationOf } from './cutoffs.js';
import { type SampleGeometry, type SurveyInput, geometryPositionAt, sampleGeometry } from './sample-geometry.js';
import { type ZoneRange, depthIssues, lowerBound, zoneBoundsIssues, zoneRangesUnchecked } from './sample-thickness.js';
import {
  type FlagInputs,
  type PorosityInputs,
  type SaturationInputs,
  flagStage,
  porosityStage,
  saturationStage,
  vshStage,
} from './zone-kernels.js';
import { type ZoneParameters, validateZoneParameters } from './zone-parameters.js';
import { type ZoneSummary, summariseUnchecked } from './zone-summary.js';

type Curve = Float64Array | readonly number[];

/** Input curves in canonical units: gAPI, g/cm3, v/v, us/ft, ohm.m, mV; NaN = missing. */
export interface WellCurves {
  gr?: Curve;
  rhob?: Curve;
  /** Neutron porosity, v/v, on the zone's matrix. */
  nphi?: Curve;
  dt?: Curve;
  /** Deep (true) resistivity. */
  rt?: Curve;
  /** Spontaneous potential, used only by an Rw source `{ kind: 'ssp', ssp: null }`. */
  sp?: Curve;
}

export interface EvaluationZone extends ZoneInterval {
  params: ZoneParameters;
}

export interface EvaluateWellInput {
  /** Measured depth of each sample, strictly increasing. */
  depth: Curve;
  depthUnit: 'ft' | 'm';
  curves: WellCurves;
  /** Zones (any order, not overlapping, inside the logged interval). */
  zones: readonly EvaluationZone[];
  /** Cutoffs per formation name (zone.formation, or zone.name when unset). */
  cutoffs: CutoffTable;
  /** Optional deviation survey (stations or a TVD table) for TVD/TVT and temperature. */
  survey?: SurveyInput;
  options?: {
    /** Compute zone summaries (default true). */
    summaries?: boolean;
    /**
     * Arrays to write the computed curves and qc mask into (each of the depth's length),
     * e.g. the previous result's, so a caller that re-evaluates often (a slider in the
     * browser) reuses its memory instead of allocating seven new arrays each time. An array
     * of the wrong length is replaced by a new one. Every sample of a reused array is
     * overwritten.
     */
    output?: Partial<EvaluatedCurves> & { qc?: Uint8Array };
  };
}

export interface EvaluationWarning {
  zone: string | null;
  field?: string;
  message: string;
}

/** What each zone actually used after picks and fits (for display and audit). */
export interface ResolvedZoneParameters {
  zone: string;
  grClean: number;
  grShale: number;
  /** Rw at the reference temperature, ohm.m, and that temperature (zone unit). */
  rwReference: number;
  rwReferenceTemperature: number;
  /** Cementation exponent used (the Pickett slope when fitM). */
  m: number;
  pickett: PickettFit | null;
  /** SSP used (mV), when the Rw source is SP. */
  ssp: number | null;
}

export interface EvaluatedCurves {
  VSH: Float64Array;
  PHIT: Float64Array;
  PHIE: Float64Array;
  SW: Float64Array;
  BVW: Float64Array;
  /** mD; null when no zone has a permeability transform. */
  PERM: Float64Array | null;
  /** 1 / 0 / NaN */
  NET_RES: Float64Array;
  NET_PAY: Float64Array;
}

export interface EvaluateWellResult {
  curves: EvaluatedCurves;
  /** Per-sample QC bits (QC_* constants). */
  qc: Uint8Array;
  zones: ZoneSummary[];
  resolved: ResolvedZoneParameters[];
  warnings: EvaluationWarning[];
  /** Sample geometry from the survey (null without one); pass it to summariseZones to reuse. */
  geometry: SampleGeometry | null;
}

const CURVE_KEYS = ['gr', 'rhob', 'nphi', 'dt', 'rt', 'sp'] as const;

function requiredCurves(p: ZoneParameters): (keyof WellCurves)[] {
  const need: (keyof WellCurves)[] = ['gr', 'rt'];
  if (p.porosityMethod === 'density') need.push('rhob');
  else if (p.porosityMethod === 'neutron_density' || p.porosityMethod === 'neutron_density_gas') need.push('rhob', 'nphi');
  else need.push('dt');
  if (p.rw?.kind === 'ssp' && p.rw.ssp === null) need.push('sp');
  return need;
}

function inputIssues(input: EvaluateWellInput): ParameterIssue[] {
  const { depth, curves, zones, cutoffs } = input;
  const issues: ParameterIssue[] = [...depthIssues(depth)];
  if (input.depthUnit !== 'ft' && input.depthUnit !== 'm') issues.push({ zone: null, field: 'depthUnit', message: "depthUnit must be 'ft' or 'm'" });
  for (const k of CURVE_KEYS) {
    const c = curves[k];
    if (c && c.length !== depth.length) issues.push({ zone: null, field: `curves.${k}`, message: `curves.${k} has ${c.length} samples, expected ${depth.length}` });
  }
  if (zones.length === 0) issues.push({ zone: null, field: 'zones', message: 'zones must not be empty' });
  if (issues.length === 0) issues.push(...zoneBoundsIssues(depth, zones));
  for (const z of zones) {
    const p = z.params;
    if (!p || typeof p !== 'object') {
      issues.push({ zone: z.name, field: 'params', message: 'params are missing' });
      continue;
    }
    issues.push(...validateZoneParameters(p, z.name));
    for (const k of requiredCurves(p)) {
      if (!curves[k]) issues.push({ zone: z.name, field: `curves.${k}`, message: `curves.${k} is required by this zone's methods` });
    }
    const c = cutoffs[formationOf(z)];
    issues.push(...cutoffIssues(c, z.name, formationOf(z)));
    if (c && c.permMin != null && p.permeability === null) {
      issues.push({ zone: z.name, field: 'permeability', message: `permeability must be set: formation '${formationOf(z)}' has a permMin cutoff` });
    }
    if (p.rw?.kind === 'pickett' && Number.isFinite(p.rw.top) && Number.isFinite(p.rw.base)) {
      if (p.rw.top < z.top || p.rw.top >= z.base) issues.push({ zone: z.name, field: 'rw.top', message: `rw.top (${p.rw.top}) must lie inside the zone [${z.top}, ${z.base}]` });
      if (p.rw.base > z.base || p.rw.base <= z.top) issues.push({ zone: z.name, field: 'rw.base', message: `rw.base (${p.rw.base}) must lie inside the zone [${z.top}, ${z.base}]` });
    }
    if ((z.dipDeg !== undefined && !(Math.abs(z.dipDeg) < 90)) || (z.dipAzimuthDeg !== undefined && !Number.isFinite(z.dipAzimuthDeg))) {
      issues.push({ zone: z.name, field: 'dipDeg', message: 'dipDeg must be in (-90, 90) and dipAzimuthDeg finite' });
    }
  }
  return issues;
}

const VSH_CODE = { linear: 0, larionov_tertiary: 1, larionov_older: 2, steiber: 3, clavier: 4 } as const;
const POR_CODE = { density: 0, neutron_density: 1, neutron_density_gas: 2, sonic_wyllie: 3, sonic_rhg: 4 } as const;
const SW_CODE = { archie: 0, simandoux: 1, indonesia: 2 } as const;
const NO_CURVE = new Float64Array(0);

const CHUNK = 4096;

function toF64(c: Curve | undefined): Float64Array {
  return c === undefined ? NO_CURVE : c instanceof Float64Array ? c : Float64Array.from(c);
}

/** The curves as Float64Array (copied only when given as plain arrays), so the loops stay monomorphic. */
interface F64Curves {
  depth: Float64Array;
  gr: Float64Array;
  rhob: Float64Array;
  nphi: Float64Array;
  dt: Float64Array;
  rt: Float64Array;
  sp: Float64Array;
}

/**
 * Evaluates a well: see the file comment and EVALUATION_CONVENTIONS.
 * Throws EvaluationInputError (a RangeError) listing every problem, each naming the zone and
 * field: bad depth, curves of the wrong length or missing for a zone's method, zones outside
 * the logged interval or overlapping, invalid parameters (rhoMatrix = rhoFluid, m <= 0,
 * rw <= 0, ...), missing or invalid cutoffs, a Pickett interval outside its zone; and, after
 * the checks, a Pickett fit or SP pick that cannot be made (RangeError naming the zone).
 * @example
 * const r = evaluateWell({ depth, depthUnit: 'ft', curves: { gr, rhob, rt }, zones: [{ name: 'A Sand', top: 5000, base: 5100,
 *   params: defaultZoneParameters('sandstone') }], cutoffs: { 'A Sand': { vshMax: 0.4, phiMin: 0.08, swMax: 0.6 } } });
 * r.zones[0].netPay.thickness.md
 */
export function evaluateWell(input: EvaluateWellInput): EvaluateWellResult {
  const fn = 'evaluateWell';
  throwIfIssues(fn, inputIssues(input));
  const { depth, curves, zones, cutoffs } = input;
  const n = depth.length;
  const warnings: EvaluationWarning[] = [];
  const geometry = input.survey ? sampleGeometry(depth, input.survey) : null;
  // TVD at each sample (for temperature): from the survey, else measured depth.
  const c64: F64Curves = {
    depth: toF64(depth), gr: toF64(curves.gr), rhob: toF64(curves.rhob), nphi: toF64(curves.nphi),
    dt: toF64(curves.dt), rt: toF64(curves.rt), sp: toF64(curves.sp),
  };
  const tvdCentre = geometry ? positionsAtMd(geometry.path, c64.depth).tvd : c64.depth;
  const tvdAt = (md: number): number => (geometry ? geometryPositionAt(geometry, md).tvd : md);
  const ranges = zoneRangesUnchecked(depth, zones);
  const anyPerm = zones.some((z) => z.params.permeability !== null);

  const reuse = input.options?.output ?? {};
  const f64 = (a: Float64Array | null | undefined) => (a && a.length === n ? a : new Float64Array(n));
  const VSH = f64(reuse.VSH), PHIT = f64(reuse.PHIT), PHIE = f64(reuse.PHIE), SW = f64(reuse.SW);
  const BVW = f64(reuse.BVW), NET_RES = f64(reuse.NET_RES), NET_PAY = f64(reuse.NET_PAY);
  const PERM = anyPerm ? f64(reuse.PERM) : null;
  const qc = reuse.qc && reuse.qc.length === n ? reuse.qc.fill(0) : new Uint8Array(n);
  const out: EvaluatedCurves = { VSH, PHIT, PHIE, SW, BVW, PERM, NET_RES, NET_PAY };
  const resolved: ResolvedZoneParameters[] = [];

  zones.forEach((z, k) => {
    const r = ranges[k];
    resolved.push(evaluateZone(z, r, c64, tvdCentre, tvdAt, out, qc, cutoffs, warnings));
  });
  fillOutside(out, ranges, n);

  const summaries =
    input.options?.summaries === false
      ? []
      : summariseUnchecked(depth, { VSH, PHIE, SW, PERM: PERM ?? undefined }, qc, zones, cutoffs, ranges, geometry ?? undefined);
  for (const s of summaries) zoneWarnings(s, input.depthUnit, warnings);
  for (const z of zones) {
    if ((z.dipDeg ?? 0) !== 0 && (!geometry || !geometry.hasHorizontal)) {
      warnings.push({ zone: z.name, field: 'dipDeg', message: 'formation dip is ignored: TVT needs a survey with north/east positions' });
    }
  }
  return { curves: out, qc, zones: summaries, resolved, warnings, geometry };
}

function evaluateZone(
  z: EvaluationZone,
  r: ZoneRange,
  curves: F64Curves,
  tvdC: Float64Array,
  tvdAt: (md: number) => number,
  out: EvaluatedCurves,
  qc: Uint8Array,
  cutoffs: CutoffTable,
  warnings: EvaluationWarning[],
): ResolvedZoneParameters {
  const p = z.params;
  const { depth, gr, rt } = curves;
  const s = r.computeStart, e = r.computeEnd;
  const where = (field: string, msg: string) => new RangeError(`evaluateWell: zone '${z.name}': ${field} ${msg}`);

  // GR picks.
  let grClean: number, grShale: number;
  if (p.grClean !== null && p.grShale !== null) {
    grClean = p.grClean;
    grShale = p.grShale;
  } else {
    try {
      ({ grClean, grShale } = gammaRayPercentiles(gr, s, e, p.grCleanPercentile, p.grShalePercentile));
    } catch (err) {
      throw where('grClean', `cannot be picked from GR percentiles: ${(err as Error).message}`);
    }
  }

  // Temperature line and Rw at a reference temperature.
  const { t0, slope } = temperatureLine(p.temperature);
  const unit = p.temperatureUnit;
  const kArps = arpsOffset(unit);
  const porIn: PorosityInputs = {
    code: POR_CODE[p.porosityMethod], rhob: curves.rhob, nphi: curves.nphi, dt: curves.dt,
    rhoMatrix: p.rhoMatrix, rhoFluid: p.rhoFluid, dtMatrix: p.dtMatrix, dtFluid: p.dtFluid, cp: p.sonicCompaction,
    phiMax: p.phiMax, phiShale: p.phiShale,
  };
  let m = p.m;
  let rwRef: number, tRef: number, pickett: PickettFit | null = null, ssp: number | null = null;
  if (p.rw.kind === 'at_temperature') {
    rwRef = p.rw.rw;
    tRef = p.rw.temperature;
  } else if (p.rw.kind === 'ssp') {
    tRef = t0 + slope * tvdAt(0.5 * (z.top + z.base));
    ssp = p.rw.ssp;
    if (ssp === null) {
      try {
        const [p5, p95] = percentilesOf(curves.sp, s, e, [5, 95], 'SP');
        ssp = p5 - p95;
      } catch (err) {
        throw where('rw.ssp', `cannot be picked from the SP curve: ${(err as Error).message}`);
      }
    }
    rwRef = rwFromSsp({ ssp, rmf: p.rw.rmf, rmfTemperature: p.rw.rmfTemperature, formationTemperature: tRef, temperatureUnit: unit });
    if (rwRef < 0.1) warnings.push({ zone: z.name, field: 'rw.ssp', message: `Rw from SP is ${rwRef.toPrecision(3)} ohm.m: below about 0.1 ohm.m Rwe differs from Rw (no chart correction applied)` });
  } else {
    // Shale volume and porosity of the water interval first (the main pass rewrites the same values).
    const a0 = lowerBound(depth, p.rw.top), a1 = lowerBound(depth, p.rw.base);
    vshStage(VSH_CODE[p.vshMethod], gr, a0, a1, grClean, 1 / (grShale - grClean), out.VSH, qc);
    porosityStage(porIn, a0, a1, out.VSH, out.PHIT, out.PHIE, qc);
    const phi = out.PHIE.subarray(a0, a1), rtw = rt.subarray(a0, a1);
    try {
      pickett = pickettFit(phi, rtw);
    } catch (err) {
      throw where('rw', `Pickett fit failed on [${p.rw.top}, ${p.rw.base}]: ${(err as Error).message}`);
    }
    if (p.rw.fitM) m = pickett.m;
    rwRef = pickett.aRw / p.a;
    tRef = t0 + slope * tvdAt(0.5 * (p.rw.top + p.rw.base));
    if (pickett.r2 < 0.9) warnings.push({ zone: z.name, field: 'rw', message: `Pickett fit is poor (r2 = ${pickett.r2.toFixed(3)} over ${pickett.count} samples)` });
    if (!(m > 0)) throw where('m', `from the Pickett fit must be > 0 (got ${m})`);
  }
  // Rw at sample i: rwRef (tRef + k) / (T_i + k), T_i = t0 + slope * tvd_i.
  const c = cutoffs[formationOf(z)];
  const satIn: SaturationInputs = {
    code: SW_CODE[p.swModel], rt, tvd: tvdC, rwNum: rwRef * (tRef + kArps), tk: t0 + kArps, slope, a: p.a, m, n: p.n, rsh: p.rsh ?? NaN,
  };
  const perm = p.permeability;
  const flagIn: FlagInputs = {
    vshMax: c.vshMax, phiMin: c.phiMin, swMax: c.swMax, permMin: c.permMin ?? -Infinity,
    permCode: perm === null ? 0 : perm.method === 'timur' ? 1 : 2, swIrr: perm?.swIrr ?? NaN,
  };
  const { VSH, PHIT, PHIE, SW, BVW, PERM, NET_RES, NET_PAY } = out;
  const vshCode = VSH_CODE[p.vshMethod], invGr = 1 / (grShale - grClean);
  let noRoot = 0;
  for (let c0 = s; c0 < e; c0 += CHUNK) {
    const c1 = Math.min(e, c0 + CHUNK);
    vshStage(vshCode, gr, c0, c1, grClean, invGr, VSH, qc);
    porosityStage(porIn, c0, c1, VSH, PHIT, PHIE, qc);
    noRoot += saturationStage(satIn, c0, c1, VSH, PHIE, SW, qc);
    flagStage(flagIn, c0, c1, VSH, PHIE, SW, BVW, PERM, NET_RES, NET_PAY);
  }
  if (noRoot > 0) warnings.push({ zone: z.name, field: 'n', message: `Simandoux did not converge on ${noRoot} samples (SW left empty)` });
  return { zone: z.name, grClean, grShale, rwReference: rwRef, rwReferenceTemperature: tRef, m, pickett, ssp };
}

/** NaN in every output outside the zones' compute ranges. */
function fillOutside(out: EvaluatedCurves, ranges: readonly ZoneRange[], n: number): void {
  const sorted = [...ranges].sort((a, b) => a.computeStart - b.computeStart);
  const arrays = [out.VSH, out.PHIT, out.PHIE, out.SW, out.BVW, out.NET_RES, out.NET_PAY, ...(out.PERM ? [out.PERM] : [])];
  let from = 0;
  for (const r of [...sorted, { computeStart: n, computeEnd: n }]) {
    if (r.computeStart > from) for (const a of arrays) a.fill(NaN, from, r.computeStart);
    from = Math.max(from, r.computeEnd);
  }
}

function zoneWarnings(s: ZoneSummary, unit: string, warnings: EvaluationWarning[]): void {
  if (s.nullCount > 0) {
    warnings.push({ zone: s.zone, message: `${s.nullCount} samples (${s.nullThickness.toFixed(2)} ${unit}) have no net pay flag: a needed value (VSH, PHIE, SW or PERM) is missing` });
  }
  const share = (k: number) => (s.sampleCount > 0 ? k / s.sampleCount : 0);
  const named: [keyof ZoneSummary['clamped'], string, string][] = [
    ['phit', 'phiMax', 'PHIT clamped to [0, phiMax]'],
    ['phie', 'phiShale', 'PHIE clamped to [0, PHIT]'],
    ['sw', 'rw', 'SW clamped to [0, 1]'],
  ];
  for (const [key, field, what] of named) {
    if (share(s.clamped[key]) > 0.05) {
      warnings.push({ zone: s.zone, field, message: `${s.clamped[key]} of ${s.sampleCount} samples (${(100 * share(s.clamped[key])).toFixed(1)}%) had ${what}` });
    }
  }
}
