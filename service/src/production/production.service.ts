import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import {
  DAYS_PER_YEAR,
  PZ_METHOD,
  RESERVES_DISCLAIMER,
  WELL_COUNT_ASSUMPTIONS,
  arpsCumulative,
  arpsRates,
  arpsTimeToRate,
  fahrenheitToRankine,
  fitArpsDecline,
  fitPZ,
  joshiHorizontalRate,
  pseudoCriticalSutton,
  gasPvt,
  gasRadialInflowRate,
  radialInflowRate,
  scfToM3,
  wellsNeeded,
  zFactorDak,
  zFactorHallYarborough,
} from '@poreline/core';
import type { ProductionSeries, ReservesCase } from '@poreline/schema';
import { AuditService } from '../audit/audit.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import { CaseCrossChecks } from '../reserves-cases/case-cross-checks.js';
import type { CaseResults } from '../reserves-cases/case-engine.js';
import type { CrossCheckTables, DeclineTable, PzTable } from '../reserves-cases/case-export.js';
import { readInputs, type CaseInputs } from '../reserves-cases/case-inputs.js';
import { WellsRepository } from '../wells/wells.repository.js';
import { WellsService } from '../wells/wells.service.js';
import type {
  CreateSeriesDto,
  DeclineFitDto,
  DeclineFitQueryDto,
  GasInflowDto,
  GasInflowResultDto,
  InflowDto,
  InflowResultDto,
  PzFitDto,
  PzFitQueryDto,
  SeriesDto,
  UploadSeriesDto,
} from './dto/production.dto.js';
import { parsePressureCsv, parseRateCsv, type CsvProblem } from './production-csv.js';
import { ProductionRepository } from './production.repository.js';
import {
  CUM_GAS_UNITS,
  DAYS_PER,
  PRESSURE_UNITS,
  PSIA_PER,
  RATE_UNITS,
  SCF_PER,
  TIME_UNITS,
  VOLUME_OF_RATE,
  type CumGasUnit,
  type PressureUnit,
  type RateUnit,
  type TimeUnit,
} from './production-units.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const ENTITY = 'production-series';

export interface UploadedCsv {
  originalname: string;
  buffer: Buffer;
  size: number;
}

function toDto(row: ProductionSeries): SeriesDto {
  return {
    id: row.id,
    wellId: row.wellId,
    kind: row.kind,
    fluid: row.fluid,
    units: row.units,
    points: row.points,
    fileName: row.fileName,
    label: row.fileName ?? `${row.kind === 'pressure' ? 'Pressure' : 'Rate'} entered ${row.createdAt.toISOString().slice(0, 10)}`,
    createdAt: row.createdAt.toISOString(),
    uploadedBy: row.uploadedBy,
  };
}

function oneOf<T extends string>(list: readonly T[], value: unknown, field: string): T {
  if (typeof value === 'string' && (list as readonly string[]).includes(value)) return value as T;
  throw new BadRequestException(`${field} must be one of ${list.join(', ')} (got ${String(value)})`);
}

function csvError(fileName: string, problems: CsvProblem[]): BadRequestException {
  const shown = problems.slice(0, 50);
  return new BadRequestException({
    statusCode: 400,
    error: 'Bad Request',
    message: shown.map((p) => `${fileName}${p.line ? ` line ${p.line}` : ''}: ${p.message}`),
    errors: shown,
    stored: false,
  });
}

/** Production data of wells and the cross-checks computed from it (core does every formula). */
@Injectable()
export class ProductionService implements CaseCrossChecks {
  constructor(
    private readonly series: ProductionRepository,
    private readonly wells: WellsService,
    private readonly wellRows: WellsRepository,
    private readonly audit: AuditService,
  ) {}

  async list(assetId: string, wellId: string): Promise<SeriesDto[]> {
    await this.wells.require(assetId, wellId);
    return (await this.series.listByWell(wellId)).map(toDto);
  }

  async create(assetId: string, wellId: string, body: CreateSeriesDto, user: AuthUser): Promise<SeriesDto> {
    await this.wells.require(assetId, wellId);
    const problems: string[] = [];
    let units: Record<string, string>;
    let points: Record<string, number>[];
    if (body.kind === 'pressure') {
      units = { cumGas: oneOf<CumGasUnit>(CUM_GAS_UNITS, body.units?.cumGas, 'units.cumGas'), pressure: oneOf<PressureUnit>(PRESSURE_UNITS, body.units?.pressure, 'units.pressure') };
      points = body.points.map((p, i) => {
        const cumGas = p?.cumGas;
        const pressure = p?.pressure;
        if (typeof cumGas !== 'number' || !Number.isFinite(cumGas) || cumGas < 0) problems.push(`points[${i}].cumGas must be a number >= 0`);
        if (typeof pressure !== 'number' || !Number.isFinite(pressure) || !(pressure > 0)) problems.push(`points[${i}].pressure must be a number > 0 (absolute)`);
        if (i > 0 && typeof cumGas === 'number' && typeof body.points[i - 1]?.cumGas === 'number' && cumGas < (body.points[i - 1].cumGas as number)) {
          problems.push(`points[${i}].cumGas must not decrease`);
        }
        return { cumGas: cumGas as number, pressure: pressure as number };
      });
    } else {
      units = { time: oneOf<TimeUnit>(TIME_UNITS, body.units?.time, 'units.time'), rate: oneOf<RateUnit>(RATE_UNITS, body.units?.rate, 'units.rate') };
      points = body.points.map((p, i) => {
        const t = p?.t;
        const rate = p?.rate;
        if (typeof t !== 'number' || !Number.isFinite(t) || t < 0) problems.push(`points[${i}].t must be a number >= 0`);
        if (typeof rate !== 'number' || !Number.isFinite(rate) || rate < 0) problems.push(`points[${i}].rate must be a number >= 0`);
        if (i > 0 && typeof t === 'number' && typeof body.points[i - 1]?.t === 'number' && !(t > (body.points[i - 1].t as number))) problems.push(`points[${i}].t must increase`);
        return { t: t as number, rate: rate as number };
      });
    }
    if (problems.length) throw new BadRequestException(problems.slice(0, 50));
    return this.store(assetId, wellId, { kind: body.kind, fluid: body.fluid, units, points, fileName: body.label?.trim() || null }, user);
  }

  async upload(assetId: string, wellId: string, file: UploadedCsv | undefined, body: UploadSeriesDto, user: AuthUser): Promise<SeriesDto> {
    await this.wells.require(assetId, wellId);
    if (!file) throw new BadRequestException('file: send the CSV in the form field "file"');
    const fileName = Buffer.from(file.originalname, 'latin1').toString('utf8');
    const text = new TextDecoder('utf-8', { fatal: false }).decode(file.buffer);
    if (body.kind === 'pressure') {
      const { points, problems } = parsePressureCsv(text);
      if (problems.length) throw csvError(fileName, problems);
      const units = { cumGas: (body.cumGasUnit ?? 'MMscf') as CumGasUnit, pressure: (body.pressureUnit ?? 'psia') as PressureUnit };
      return this.store(assetId, wellId, { kind: 'pressure', fluid: body.fluid, units, points, fileName: body.label?.trim() || fileName }, user);
    }
    const { points, problems, dated } = parseRateCsv(text, body.fluid);
    if (problems.length) throw csvError(fileName, problems);
    const units = { time: (dated ? 'day' : (body.timeUnit ?? 'day')) as TimeUnit, rate: (body.rateUnit ?? (body.fluid === 'gas' ? 'Mscf/d' : 'STB/d')) as RateUnit };
    return this.store(assetId, wellId, { kind: 'rate', fluid: body.fluid, units, points: points as unknown as Record<string, number>[], fileName: body.label?.trim() || fileName }, user);
  }

  async remove(assetId: string, wellId: string, seriesId: string, user: AuthUser): Promise<void> {
    const row = await this.require(assetId, wellId, seriesId);
    await this.series.transaction(async (tx) => {
      await this.series.remove(row.id, tx);
      await this.audit.record({ assetId, userId: user.id, action: 'delete', entity: ENTITY, entityId: row.id, before: toDto(row) }, tx);
    });
  }

  async pzFit(assetId: string, wellId: string, seriesId: string, query: PzFitQueryDto): Promise<PzFitDto> {
    const row = await this.require(assetId, wellId, seriesId);
    let caseRow: ReservesCase | undefined;
    let temperatureF = query.temperatureF;
    let gasGravity = query.gasGravity;
    let zMethod = query.zMethod;
    if (query.caseId) {
      caseRow = await this.series.caseInAsset(assetId, query.caseId);
      if (!caseRow) throw new BadRequestException('caseId: no such reserves case in this asset');
      const gas = readInputs(caseRow.inputs).gas;
      if (!gas) throw new BadRequestException('caseId: the case has no gas PVT inputs (reservoir temperature and gas gravity); set them or pass temperatureF and gasGravity');
      temperatureF ??= gas.temperatureF;
      gasGravity ??= gas.gasGravity;
      zMethod ??= gas.zMethod;
    }
    if (temperatureF === undefined) throw new BadRequestException('temperatureF is required (reservoir temperature, F), or pass caseId');
    if (gasGravity === undefined) throw new BadRequestException('gasGravity is required (air = 1), or pass caseId');
    const results = caseRow ? (caseRow.results as CaseResults | null) : null;
    const current = caseRow && results && results.revision === caseRow.revision ? results : null;
    try {
      return this.computePz(row, temperatureF, gasGravity, zMethod ?? 'dak', caseRow && current ? { caseRow, results: current } : null);
    } catch (error) {
      if (error instanceof RangeError) throw new BadRequestException(error.message);
      throw error;
    }
  }

  async declineFit(assetId: string, wellId: string, seriesId: string, query: DeclineFitQueryDto): Promise<DeclineFitDto> {
    const row = await this.require(assetId, wellId, seriesId);
    if (row.kind !== 'rate') throw new BadRequestException('seriesId: a decline is fitted to a rate series; this one holds pressures');
    try {
      return this.computeDecline(row, query.kind, query.economicLimit);
    } catch (error) {
      if (error instanceof RangeError) throw new BadRequestException(error.message);
      throw error;
    }
  }

  /** Gas well inflow, pressure-squared form; z at the average pressure from the gas gravity (Sutton, DAK or Hall-Yarborough). */
  gasInflow(body: GasInflowDto): GasInflowResultDto {
    try {
      const averagePressurePsia = (body.reservoirPressurePsia + body.bottomholePressurePsia) / 2;
      const zMethod = body.zMethod ?? 'dak';
      const pvt = gasPvt({ pressurePsia: averagePressurePsia, temperatureF: body.temperatureF, gasGravity: body.gasGravity, zMethod });
      const r = gasRadialInflowRate({
        kMd: body.permeabilityMd,
        netPayFt: body.netPayFt,
        reservoirPressurePsia: body.reservoirPressurePsia,
        bottomholePressurePsia: body.bottomholePressurePsia,
        temperatureF: body.temperatureF,
        muCp: body.viscosityCp,
        z: pvt.z,
        reFt: body.drainageRadiusFt,
        rwFt: body.wellboreRadiusFt,
        skin: body.skin ?? 0,
      });
      return {
        ...r,
        averagePressurePsia,
        pvt: { z: pvt.z, zMethod, tpr: pvt.tpr, ppr: pvt.ppr },
        equation: 'q [Mscf/d] = k h (pr^2 - pwf^2) / (1422 T mu z (ln(re/rw) - 0.75 + s)), T in R, pseudo-steady state (Lee & Wattenbarger 1996; Ahmed 2006)',
        assumptions: [
          'Single-phase gas, Darcy flow (no non-Darcy / turbulence term), homogeneous layer of uniform thickness, circular drainage area at pseudo-steady state.',
          'Pressure-squared form: gas viscosity and z taken at the average of the reservoir and bottom-hole pressures; fit below about 2,000 psia, where mu z hardly changes. At higher pressures use the pseudo-pressure form.',
          'Rate at standard conditions of 14.7 psia and 60 F, the basis of the printed constant 1422.',
          'Absolute open flow: the rate at zero bottom-hole pressure with the same mu and z (an index of the well, not a rate to produce at).',
        ],
      };
    } catch (error) {
      if (error instanceof RangeError) throw new BadRequestException(error.message);
      throw error;
    }
  }

  inflow(body: InflowDto): InflowResultDto {
    try {
      const v = radialInflowRate({
        kMd: body.permeabilityMd,
        netPayFt: body.netPayFt,
        drawdownPsi: body.drawdownPsi,
        muCp: body.viscosityCp,
        bo: body.fvf,
        reFt: body.drainageRadiusFt,
        rwFt: body.wellboreRadiusFt,
        skin: body.skin ?? 0,
      });
      const h = body.horizontal
        ? joshiHorizontalRate({
            khMd: body.permeabilityMd,
            kvMd: body.horizontal.kvMd,
            netPayFt: body.netPayFt,
            drawdownPsi: body.drawdownPsi,
            muCp: body.viscosityCp,
            bo: body.fvf,
            lengthFt: body.horizontal.lengthFt,
            rehFt: body.horizontal.rehFt ?? body.drainageRadiusFt,
            rwFt: body.wellboreRadiusFt,
          })
        : null;
      return {
        vertical: {
          rateStbPerDay: v.rateStbPerDay,
          productivityIndex: v.productivityIndex,
          equation: 'q = 0.00708 k h (pr - pwf) / (mu Bo (ln(re/rw) - 0.75 + s)), pseudo-steady state (Craft & Hawkins 1991; Dake 1978)',
        },
        horizontal: h
          ? {
              rateStbPerDay: h.rateStbPerDay,
              productivityIndex: h.productivityIndex,
              aFt: h.aFt,
              beta: h.beta,
              verticalSteadyStateRateStbPerDay: h.verticalRateStbPerDay,
              productivityRatio: h.productivityRatio,
              equation:
                'Joshi (1988), JPT 40(6): q = 0.00708 kh h dp / (mu Bo [ln((a + sqrt(a^2 - (L/2)^2)) / (L/2)) + (beta h / L) ln(beta h / (2 rw))]), a = (L/2)[0.5 + sqrt(0.25 + (2 reh/L)^4)]^0.5, steady state',
            }
          : null,
        assumptions: [
          'Single-phase oil (liquid) flow, Darcy, homogeneous layer of uniform thickness; rate in stock-tank barrels per day.',
          'Vertical well: circular drainage area at pseudo-steady state, drawdown = average reservoir pressure - flowing bottom-hole pressure.',
          'Horizontal well: Joshi (1988) steady-state ellipsoidal drainage; the productivity ratio compares it with a vertical well at steady state in the same drainage radius (no skin on either).',
          'The anisotropy scaling beta = sqrt(kh/kv) follows one printed variant of Joshi\u2019s equation.',
        ],
      };
    } catch (error) {
      if (error instanceof RangeError) throw new BadRequestException(error.message);
      throw error;
    }
  }

  /** Cross-check tables for a case's export: p/z of every pressure series (gas case) and the decline fits kept with the case. */
  async tablesFor(assetId: string, caseRow: ReservesCase, inputs: CaseInputs, results: CaseResults | null): Promise<CrossCheckTables> {
    const wellIds = ((caseRow.sources ?? []) as { wellId: string }[]).map((s) => s.wellId);
    const all = await this.series.listByWells(wellIds);
    const names = new Map((await this.wellRows.listByAsset(assetId)).map((w) => [w.id, w.name]));
    const pz: PzTable[] = [];
    const decline: DeclineTable[] = [];
    for (const row of all) {
      const wellName = names.get(row.wellId) ?? row.wellId;
      const label = toDto(row).label;
      if (row.kind === 'pressure') {
        const base = { seriesId: row.id, wellName, label, points: [], fit: null, drainedGipScf: null, volumetricGipScf: null, wellsNeeded: null, assumptions: [] };
        if (inputs.fluid !== 'gas' || !inputs.gas) {
          pz.push({ ...base, error: 'p/z applies to a gas case with gas PVT inputs' });
          continue;
        }
        try {
          const r = this.computePz(row, inputs.gas.temperatureF, inputs.gas.gasGravity, inputs.gas.zMethod, results ? { caseRow, results } : null);
          const det = r.volumetric.find((v) => v.basis === 'deterministic');
          pz.push({ ...base, points: r.points, fit: r.fit, drainedGipScf: r.drainedGipScf, volumetricGipScf: det?.gipScf ?? null, wellsNeeded: r.wellsNeeded, assumptions: [r.method, ...r.assumptions], error: null });
        } catch (error) {
          pz.push({ ...base, error: (error as Error).message });
        }
      } else {
        const check = inputs.declineChecks[row.id];
        const units = row.units as { rate?: string };
        const base = { seriesId: row.id, wellName, label, kind: check?.kind ?? '', economicLimit: check?.economicLimit ?? NaN, rateUnit: units.rate ?? '', qi: null, b: null, diNominalPerYear: null, diEffectivePerYear: null, eur: null, eurUnit: VOLUME_OF_RATE[units.rate as RateUnit] ?? '', points: [] };
        if (!check) {
          decline.push({ ...base, error: 'no decline fit kept with the case for this series' });
          continue;
        }
        try {
          const r = this.computeDecline(row, check.kind, check.economicLimit);
          decline.push({
            ...base,
            qi: r.qi,
            b: r.b,
            diNominalPerYear: r.diNominalPerYear,
            diEffectivePerYear: r.diEffectivePerYear,
            eur: r.eur,
            points: r.points.map((p) => ({ t: p.tDays, rate: p.rate, fitted: p.fitted })),
            error: null,
          });
        } catch (error) {
          decline.push({ ...base, error: (error as Error).message });
        }
      }
    }
    return { pz, decline };
  }

  // --- computations (core) ---

  private computePz(
    row: ProductionSeries,
    temperatureF: number,
    gasGravity: number,
    zMethod: 'dak' | 'hall-yarborough',
    volumetric: { caseRow: ReservesCase; results: CaseResults } | null,
  ): PzFitDto {
    if (row.kind !== 'pressure') throw new RangeError('seriesId: p/z is fitted to a pressure series; this one holds rates');
    const units = row.units as { cumGas: CumGasUnit; pressure: PressureUnit };
    const { tpcR, ppcPsia } = pseudoCriticalSutton(gasGravity);
    const tpr = fahrenheitToRankine(temperatureF) / tpcR;
    const zOf = zMethod === 'dak' ? zFactorDak : zFactorHallYarborough;
    const points = (row.points as { cumGas: number; pressure: number }[]).map((p, i) => {
      const cumGasScf = p.cumGas * SCF_PER[units.cumGas];
      const pressurePsia = p.pressure * PSIA_PER[units.pressure];
      let z: number;
      try {
        z = zOf(tpr, pressurePsia / ppcPsia);
      } catch (error) {
        throw new RangeError(`points[${i}] (pressure ${p.pressure} ${units.pressure}): ${(error as Error).message}`);
      }
      return { cumGasScf, pressurePsia, z, pOverZ: pressurePsia / z };
    });
    const fit = fitPZ({ gp: points.map((p) => p.cumGasScf), pz: points.map((p) => p.pOverZ) });
    const rows: PzFitDto['volumetric'] = [];
    if (volumetric && volumetric.results.fluid === 'gas') {
      const r = volumetric.results;
      const bases: [string, number][] = [
        ['deterministic', r.deterministic.inPlace.field],
        ['P90', r.probabilistic.inPlace.p90],
        ['P50', r.probabilistic.inPlace.p50],
        ['P10', r.probabilistic.inPlace.p10],
      ];
      for (const [basis, gipScf] of bases) {
        const count = wellsNeeded(gipScf, fit.gasInPlace);
        rows.push({ caseId: volumetric.caseRow.id, caseName: volumetric.caseRow.name, basis, gipScf, wells: count.wells, ratio: count.ratio });
      }
    }
    return {
      seriesId: row.id,
      temperatureF,
      gasGravity,
      zMethod,
      points,
      fit: { intercept: fit.intercept, slope: fit.slope, r2: fit.rSquared, n: fit.n },
      drainedGipScf: fit.gasInPlace,
      drainedGipM3: scfToM3(fit.gasInPlace),
      volumetric: rows,
      wellsNeeded: rows.find((v) => v.basis === 'deterministic')?.wells ?? null,
      method: fit.method,
      assumptions: [
        ...WELL_COUNT_ASSUMPTIONS,
        `z by ${zMethod === 'dak' ? 'Dranchuk & Abou-Kassem (1975)' : 'Hall & Yarborough (1973)'} from Sutton (1985) pseudo-criticals at ${temperatureF} F and gas gravity ${gasGravity}.`,
        volumetric ? 'Volumetric gas in place from the case\u2019s current run (deterministic and P90/P50/P10).' : 'No current run of a gas case was given, so no well count is made.',
      ],
      caution: RESERVES_DISCLAIMER,
    };
  }

  private computeDecline(row: ProductionSeries, kind: 'exponential' | 'hyperbolic' | 'harmonic', economicLimit: number): DeclineFitDto {
    const units = row.units as { time: TimeUnit; rate: RateUnit };
    const pts = row.points as { t: number; rate: number }[];
    const t0 = pts[0]?.t ?? 0;
    const tDays = pts.map((p) => (p.t - t0) * DAYS_PER[units.time]);
    const rates = pts.map((p) => p.rate);
    const fit = fitArpsDecline(tDays, rates, { kind });
    const fitted = arpsRates(fit.params, tDays);
    // Produced to date: trapezoidal integral of the measured rates over the data period. // common practice
    let cumulativeToDate = 0;
    for (let i = 1; i < tDays.length; i++) cumulativeToDate += 0.5 * (rates[i] + rates[i - 1]) * (tDays[i] - tDays[i - 1]);
    const tLast = tDays[tDays.length - 1];
    const tLimit = arpsTimeToRate(fit.params, economicLimit);
    const remaining = tLimit > tLast ? arpsCumulative(fit.params, tLimit) - arpsCumulative(fit.params, tLast) : 0;
    const tEnd = Math.max(tLast, Math.min(tLimit, tLast + 100 * DAYS_PER_YEAR));
    const forecastT = Array.from({ length: 121 }, (_, i) => (tEnd * i) / 120);
    const forecastQ = arpsRates(fit.params, forecastT);
    const name = kind === 'exponential' ? 'exponential (b = 0)' : kind === 'harmonic' ? 'harmonic (b = 1)' : `hyperbolic (b = ${fit.params.b.toFixed(3)})`;
    return {
      seriesId: row.id,
      kind,
      rateUnit: units.rate,
      volumeUnit: VOLUME_OF_RATE[units.rate],
      timeUnit: units.time,
      qi: fit.params.qi,
      b: fit.params.b,
      diNominalPerYear: fit.params.diNominalPerYear,
      diEffectivePerYear: fit.diEffectivePerYear,
      r2: fit.rSquared,
      rmse: fit.rmse,
      atBound: fit.atBound,
      points: tDays.map((t, i) => ({ tDays: t, rate: rates[i], fitted: fitted[i] })),
      forecast: forecastT.map((t, i) => ({ tDays: t, rate: forecastQ[i] })),
      economicLimit,
      cumulativeToDate,
      eur: cumulativeToDate + remaining,
      remaining,
      timeToLimitDays: tLimit,
      notes: [
        `Arps (1945) ${name}, fitted by least squares on rate (not log-rate); t = 0 at the first point, where q = qi.`,
        'Di is the nominal (instantaneous) decline per year of 365.25 days; the effective (secant) decline is 1 - q(1 yr)/qi.',
        `EUR = produced to date (trapezoidal integral of the measured rates) + the fitted volume from the last point to the economic limit of ${economicLimit} ${units.rate}.`,
        ...(fit.atBound ? ['The fit ended at a search bound (Di or b): check the data before using it.'] : []),
      ],
      caution: RESERVES_DISCLAIMER,
    };
  }

  private async store(assetId: string, wellId: string, values: { kind: 'pressure' | 'rate'; fluid: string; units: Record<string, string>; points: Record<string, number>[]; fileName: string | null }, user: AuthUser): Promise<SeriesDto> {
    const row = await this.series.transaction(async (tx) => {
      const created = await this.series.insert({ wellId, ...values, uploadedBy: user.id }, tx);
      await this.audit.record(
        { assetId, userId: user.id, action: 'create', entity: ENTITY, entityId: created.id, after: { wellId, kind: created.kind, fluid: created.fluid, units: created.units, points: created.points.length, fileName: created.fileName } },
        tx,
      );
      return created;
    });
    return toDto(row);
  }

  private async require(assetId: string, wellId: string, seriesId: string): Promise<ProductionSeries> {
    await this.wells.require(assetId, wellId);
    const row = UUID.test(seriesId) ? await this.series.find(wellId, seriesId) : undefined;
    if (!row) throw new NotFoundException('No such production series for this well.');
    return row;
  }
}
