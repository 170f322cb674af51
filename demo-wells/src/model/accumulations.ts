/**
 * Hydrocarbon accumulations of the Wrenmoor model: one fluid leg of one compartment inside
 * one formation. Each has a map area (the area inside its lower contact on the top of its
 * hydrocarbon-bearing layer, computed from the structure) and a reference pressure and
 * temperature at its lower contact for the gas formation volume factor.
 */
import {
  GAS_GRADIENT_PSI_PER_FT,
  GEOTHERMAL_GRADIENT_F_PER_100FT,
  OIL_GRADIENT_PSI_PER_FT,
  SURFACE_TEMPERATURE_F,
  WATER_GRADIENT_PSI_PER_FT,
  WATER_TABLE_ELEVATION_FT,
} from './constants.js';
import { FORMATIONS, compartmentByName, formationTopsTvdss, layerBoundaries } from './formations.js';
import { areaAboveLevelAcres } from './structure.js';
import { WELLS } from './wells.js';

export interface Accumulation {
  name: string;
  formation: string;
  compartment: string;
  fluid: 'gas' | 'oil';
  /** Name of its fluid zone: "<formation> <fluid>". */
  zoneName: string;
}

const acc = (name: string, formation: string, compartment: string, fluid: 'gas' | 'oil'): Accumulation => ({
  name,
  formation,
  compartment,
  fluid,
  zoneName: `${formation} ${fluid}`,
});

export const ACCUMULATIONS: readonly Accumulation[] = [
  acc('Fenna gas', 'Fenna Sand', 'Fenna', 'gas'),
  acc('Marrow thin-sand oil', 'Marrow Shale', 'Marrow thin sand', 'oil'),
  acc('Wren gas cap', 'Wren Sand', 'Wren', 'gas'),
  acc('Wren oil leg', 'Wren Sand', 'Wren', 'oil'),
  acc('Tillet oil leg', 'Tillet Shaly Sand', 'Wren', 'oil'),
];

export function accumulationByName(name: string): Accumulation {
  const a = ACCUMULATIONS.find((k) => k.name === name);
  if (!a) throw new RangeError(`accumulationByName: unknown accumulation '${name}'`);
  return a;
}

/** TVDSS (ft) of the accumulation's lower contact (gas: goc, oil: owc). */
export function lowerContactTvdss(a: Accumulation): number {
  const c = compartmentByName(a.compartment);
  return a.fluid === 'gas' ? c.goc : c.owc;
}

/** Top (TVDSS ft) of the first layer of the accumulation's compartment in its formation, at (x, y). */
function hydrocarbonLayerTop(a: Accumulation): (x: number, y: number) => number {
  const k = FORMATIONS.findIndex((f) => f.name === a.formation);
  const f = FORMATIONS[k];
  const j = f.layers.findIndex((l) => l.compartment === a.compartment);
  return (x, y) => {
    const tops = formationTopsTvdss(x, y);
    return layerBoundaries(f, tops[k], tops[k + 1] - tops[k])[j];
  };
}

/** Map area of the accumulation, acres: where its layer top lies above its lower contact (100 ft grid over +-20,000 ft). */
export function accumulationAreaAcres(a: Accumulation): number {
  return areaAboveLevelAcres(hydrocarbonLayerTop(a), lowerContactTvdss(a));
}

/**
 * Initial pressure (psia) at the accumulation's lower contact: hydrostatic water pressure at
 * the compartment's owc, p = 14.696 + 0.45 (owc + 300), then up the oil column at 0.33 psi/ft
 * to a goc above it (model choices, constants.ts).
 */
export function contactPressurePsia(a: Accumulation): number {
  const c = compartmentByName(a.compartment);
  const pOwc = 14.696 + WATER_GRADIENT_PSI_PER_FT * (c.owc + WATER_TABLE_ELEVATION_FT);
  return a.fluid === 'gas' ? pOwc - OIL_GRADIENT_PSI_PER_FT * (c.owc - c.goc) : pOwc;
}

/** Mean ground elevation of the wells, ft above sea level (datum of the field temperature line). */
export const MEAN_GROUND_ELEVATION_FT = WELLS.reduce((s, w) => s + w.groundElevationFt, 0) / WELLS.length;

/** Temperature (F) at the accumulation's lower contact, rounded to 0.1 F. */
export function contactTemperatureF(a: Accumulation): number {
  const depth = lowerContactTvdss(a) + MEAN_GROUND_ELEVATION_FT;
  return Math.round(10 * (SURFACE_TEMPERATURE_F + (GEOTHERMAL_GRADIENT_F_PER_100FT * depth) / 100)) / 10;
}

/** Gas gradient (psi/ft) used for pressures above a gas contact. */
export const GAS_GRADIENT = GAS_GRADIENT_PSI_PER_FT;
