/**
 * The whole model's answer, computed once: per well its column, zone truths, fluid-zone
 * truths and zone parameters; per accumulation its in-place volume; and the production of
 * the demo gas and oil wells. This is what data/model.json records.
 */
import { FIELD_NAME, FIELD_SEED, OIL_BO, OIL_RS_SCF_PER_STB, OPERATOR_NAME } from './constants.js';
import { type WellColumn, wellColumn } from './column.js';
import { ACCUMULATIONS, contactPressurePsia, contactTemperatureF, lowerContactTvdss } from './accumulations.js';
import { COMPARTMENTS, FORMATIONS, compartmentByName } from './formations.js';
import { MODEL_CUTOFFS, type ModelCutoffs, type ModelZoneParameters, wellZoneParameters } from './parameters.js';
import { type FluidZoneTruth, type ZoneTruth, fluidZoneTruths, zoneTruths } from './truth.js';
import { type AccumulationVolume, accumulationVolume, cachedAreaAcres } from './volumes.js';
import { WELLS } from './wells.js';
import { type GasWellProduction, gasWellProduction } from '../production/gas-well.js';
import { type OilWellProduction, oilWellProduction } from '../production/oil-well.js';
import { oilInPlace } from '@poreline/core';

export interface WellTruth {
  name: string;
  column: WellColumn;
  zones: ZoneTruth[];
  fluidZones: FluidZoneTruth[];
  zoneParameters: { formation: string; params: ModelZoneParameters }[];
}

export interface ModelTruth {
  field: string;
  operator: string;
  seed: number;
  cutoffs: Readonly<Record<string, ModelCutoffs>>;
  wells: WellTruth[];
  volumes: AccumulationVolume[];
  gasWell: GasWellProduction;
  oilWell: OilWellProduction;
}

/** Drainage area (acres) and recovery factor of the demo oil well (model choices). */
export const OIL_WELL_DRAINAGE_ACRES = 160;
export const OIL_WELL_RECOVERY_FACTOR = 0.25;

/** The model's per-well inputs to an accumulation's volume: wells with net pay in it. */
export function modelAccumulationInputs(wells: readonly WellTruth[], accumulation: string) {
  return wells
    .flatMap((w) => w.fluidZones)
    .filter((z) => z.accumulation === accumulation && z.netPay.md > 0)
    .map((z) => ({ well: z.well, netPayTvdFt: z.netPay.tvd, meanPhi: z.netPay.meanPhi!, meanSw: z.netPay.meanSw! }));
}

let cached: ModelTruth | null = null;

/** The model's truth (computed on first call, then cached). */
export function modelTruth(): ModelTruth {
  if (cached) return cached;
  const wells: WellTruth[] = WELLS.map((w) => {
    const column = wellColumn(w);
    return { name: w.name, column, zones: zoneTruths(column), fluidZones: fluidZoneTruths(column), zoneParameters: wellZoneParameters(column) };
  });
  const volumes = ACCUMULATIONS.map((a) => accumulationVolume(a, modelAccumulationInputs(wells, a.name)));

  const fenna = ACCUMULATIONS.find((a) => a.name === 'Fenna gas')!;
  const fennaVolume = volumes.find((v) => v.accumulation === fenna.name)!;
  const gasWell = gasWellProduction({
    well: 'WM-1',
    gasInPlaceScf: fennaVolume.inPlace,
    initialPressurePsia: contactPressurePsia(fenna),
    temperatureF: contactTemperatureF(fenna),
    gasGravity: compartmentByName(fenna.compartment).gasGravity,
    datumTvdss: lowerContactTvdss(fenna),
    startYear: 2019,
    startMonth: 7,
    months: 72,
    seed: FIELD_SEED,
  });

  const wm4 = wells.find((w) => w.name === 'WM-4')!.fluidZones.find((z) => z.accumulation === 'Wren oil leg')!;
  const drained = oilInPlace({
    areaAcres: OIL_WELL_DRAINAGE_ACRES,
    netPayFt: wm4.netPay.tvd,
    porosity: wm4.netPay.meanPhi!,
    sw: wm4.netPay.meanSw!,
    bo: OIL_BO,
  });
  const oilWell = oilWellProduction({
    well: 'WM-4',
    drainedOilInPlaceStb: drained,
    recoveryFactor: OIL_WELL_RECOVERY_FACTOR,
    gorScfPerStb: OIL_RS_SCF_PER_STB,
    startYear: 2020,
    startMonth: 5,
    months: 60,
    seed: FIELD_SEED,
  });
  cached = { field: FIELD_NAME, operator: OPERATOR_NAME, seed: FIELD_SEED, cutoffs: MODEL_CUTOFFS, wells, volumes, gasWell, oilWell };
  return cached;
}

/** A JSON-ready description of the model and its truth (what data/model.json holds). */
export function modelJson(t: ModelTruth = modelTruth()): unknown {
  return {
    description:
      'Invented demo field generated from a layered earth model by demo-wells (scripts/generate.ts). ' +
      'Truth per well and zone is integrated exactly over the model layers; depths in ft unless stated.',
    field: t.field,
    operator: t.operator,
    seed: t.seed,
    cutoffs: t.cutoffs,
    formations: FORMATIONS.map((f) => ({
      name: f.name,
      lithology: f.lithology,
      matrix: f.matrix,
      vshTransform: f.vshTransform,
      resistivity: f.resistivity,
      layers: f.layers.map((l) => ({ name: l.name, lithology: l.lithology, thickness: l.thickness, porosity: l.porosity, vsh: l.vsh, sw: l.sw, compartment: l.compartment })),
    })),
    compartments: COMPARTMENTS,
    accumulations: ACCUMULATIONS.map((a) => ({ ...a, areaAcres: cachedAreaAcres(a), lowerContactTvdss: lowerContactTvdss(a) })),
    wells: t.wells.map((w) => {
      const c = w.column;
      const k = c.sampling.unit === 'm' ? 0.3048 : 1;
      return {
        name: w.name,
        uwi: c.well.uwi,
        status: c.well.status,
        x: c.well.x,
        y: c.well.y,
        groundElevationFt: c.well.groundElevationFt,
        kbElevationFt: c.kbElevationFt,
        trajectory: c.well.trajectory,
        depthUnit: c.sampling.unit,
        step: c.sampling.step,
        logTop: c.logTopMd * k,
        logBase: c.logBaseMd * k,
        tops: FORMATIONS.map((f, i) => ({ formation: f.name, md: c.topsMd[i] * k, tvd: c.topsTvd[i] * k })),
        temperatureF: FORMATIONS.map((f, i) => ({ formation: f.name, temperatureF: c.temperatureF[i], rw: c.rw[i] })),
        zones: w.zones.map(stripWell),
        fluidZones: w.fluidZones.map(stripWell),
        zoneParameters: w.zoneParameters,
      };
    }),
    volumes: t.volumes,
    production: {
      gasWell: { ...t.gasWell.input, zi: t.gasWell.zi, backPressure: t.gasWell.backPressure, months: t.gasWell.monthly.length, surveys: t.gasWell.pressures.length },
      oilWell: { ...t.oilWell.input, decline: t.oilWell.decline, drainageAreaAcres: OIL_WELL_DRAINAGE_ACRES, months: t.oilWell.monthly.length },
    },
  };
}

function stripWell<T extends { well: string }>(z: T): Omit<T, 'well'> {
  const { well: _w, ...rest } = z;
  return rest;
}
