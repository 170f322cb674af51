/**
 * The evaluation inputs that belong to the model: the zone parameters each formation's logs
 * were synthesized with, and the cutoffs that define the model's net reservoir and net pay.
 * The service seed, the truth test and the "model vs evaluated" check all use these, so an
 * evaluation with them must recover the model.
 *
 * Zone parameters follow core's `ZoneParameters` shape (plain JSON). Temperature is one value
 * per zone and well (the formation's mid-depth temperature in that well), so the Arps
 * correction the evaluation applies gives back the model's Rw exactly.
 */
import { DT_FLUID, DT_MATRIX, GR_CLEAN, GR_SHALE, RHO_FLUID, RHO_MATRIX, RHO_SHALE, RW_REFERENCE } from './constants.js';
import type { WellColumn } from './column.js';
import { FORMATIONS } from './formations.js';
import type { Formation, Matrix, SaturationRelation, VshTransform } from './types.js';

/** Cutoffs of one formation (inclusive bounds, v/v). */
export interface ModelCutoffs {
  vshMax: number;
  phiMin: number;
  swMax: number;
}

/** Cutoffs per formation name (model choice: the same for every formation). */
export const MODEL_CUTOFFS: Readonly<Record<string, ModelCutoffs>> = Object.fromEntries(
  FORMATIONS.map((f) => [f.name, { vshMax: 0.4, phiMin: 0.08, swMax: 0.5 }]),
);

/** Zone parameters in core's ZoneParameters shape (see core/src/evaluation/zone-parameters.ts). */
export interface ModelZoneParameters {
  vshMethod: VshTransform;
  grClean: number;
  grShale: number;
  grCleanPercentile: number;
  grShalePercentile: number;
  porosityMethod: 'density';
  rhoMatrix: number;
  rhoFluid: number;
  dtMatrix: number;
  dtFluid: number;
  sonicCompaction: number;
  phiShale: number;
  phiMax: number;
  temperatureUnit: 'F';
  temperature: { kind: 'constant'; temperature: number };
  rw: { kind: 'at_temperature'; rw: number; temperature: number };
  swModel: SaturationRelation;
  a: number;
  m: number;
  n: number;
  rsh: number | null;
  permeability: null;
}

/**
 * Apparent density porosity of 100% shale: (rhoMatrix - rhoShale) / (rhoMatrix - rhoFluid)
 * (Asquith & Krygowski 2004, ch. 4 shale correction; common practice). With the model's
 * densities: sandstone (2.65 - 2.45) / 1.65 = 0.121212..., limestone 0.26 / 1.71 = 0.152047...
 */
export function shaleDensityPorosity(matrix: Matrix): number {
  return (RHO_MATRIX[matrix] - RHO_SHALE) / (RHO_MATRIX[matrix] - RHO_FLUID);
}

/** Zone parameters of formation `f` at formation temperature `temperatureF` (F). */
export function formationZoneParameters(f: Formation, temperatureF: number): ModelZoneParameters {
  return {
    vshMethod: f.vshTransform,
    grClean: GR_CLEAN,
    grShale: GR_SHALE,
    grCleanPercentile: 5,
    grShalePercentile: 95,
    porosityMethod: 'density',
    rhoMatrix: RHO_MATRIX[f.matrix],
    rhoFluid: RHO_FLUID,
    dtMatrix: DT_MATRIX[f.matrix],
    dtFluid: DT_FLUID,
    sonicCompaction: 1,
    phiShale: shaleDensityPorosity(f.matrix),
    phiMax: 0.5,
    temperatureUnit: 'F',
    temperature: { kind: 'constant', temperature: temperatureF },
    rw: { kind: 'at_temperature', rw: RW_REFERENCE.rw, temperature: RW_REFERENCE.temperatureF },
    swModel: f.resistivity.relation,
    a: f.resistivity.a,
    m: f.resistivity.m,
    n: f.resistivity.n,
    rsh: f.resistivity.relation === 'simandoux' ? (f.resistivity.rsh ?? null) : null,
    permeability: null,
  };
}

/** Zone parameters of every formation in one well (FORMATIONS order). */
export function wellZoneParameters(col: WellColumn): { formation: string; params: ModelZoneParameters }[] {
  return FORMATIONS.map((f, k) => ({ formation: f.name, params: formationZoneParameters(f, col.temperatureF[k]) }));
}
