/**
 * Deterministic in-place volumes of an accumulation from per-well fluid-zone summaries, by
 * the published volumetric equations (Craft & Hawkins 1991, ch. 1 and 3, through core's
 * gasInPlace / oilInPlace):
 *   G [scf] = 43,560 A h phi (1 - Sw) / Bg,    N [STB] = 7758.37 A h phi (1 - Sw) / Bo
 * with A the accumulation's map area, and h, phi, Sw combined over the wells that have net
 * pay in it: h the arithmetic mean of true vertical net pay, phi weighted by h, Sw by phi h
 * (core's combineWellInputs 'thickness'), so A h phi (1 - Sw) = A mean(HCPT).
 * Bg from core's gasPvt (Sutton pseudo-criticals, Dranchuk & Abou-Kassem z) at the pressure
 * and temperature of the accumulation's lower contact; Bo is the model's constant.
 *
 * The same function gives the model's own volumes (from the model's layer properties) and
 * the volumes of an evaluation (from its zone summaries), so the two compare like for like.
 */
import { combineWellInputs, gasInPlace, gasPvt, oilInPlace } from '@poreline/core';
import { OIL_BO } from './constants.js';
import {
  type Accumulation,
  accumulationAreaAcres,
  contactPressurePsia,
  contactTemperatureF,
} from './accumulations.js';
import { compartmentByName } from './formations.js';

/** One well's summary of an accumulation's fluid zone. */
export interface AccumulationWellInput {
  well: string;
  /** True vertical (or true vertical stratigraphic) net pay, ft. */
  netPayTvdFt: number;
  /** Mean porosity over the net pay (thickness-weighted), v/v. */
  meanPhi: number;
  /** Mean Sw over the net pay (pore-volume-weighted), v/v. */
  meanSw: number;
}

export interface AccumulationVolume {
  accumulation: string;
  fluid: 'gas' | 'oil';
  areaAcres: number;
  wells: string[];
  netPayFt: number;
  porosity: number;
  sw: number;
  /** A h phi (1 - Sw), acre-ft. */
  hcpvAcreFt: number;
  /** Bg (rcf/scf) or Bo (rb/STB). */
  fvf: number;
  pressurePsia: number;
  temperatureF: number;
  /** z-factor at the reference conditions (gas only, else null). */
  z: number | null;
  /** In place: scf for gas, STB for oil. */
  inPlace: number;
  inPlaceUnit: 'scf' | 'STB';
}

/** Map areas are computed once per accumulation (a 400 x 400 grid each). */
const areaCache = new Map<string, number>();
export function cachedAreaAcres(a: Accumulation): number {
  let v = areaCache.get(a.name);
  if (v === undefined) {
    v = accumulationAreaAcres(a);
    areaCache.set(a.name, v);
  }
  return v;
}

/**
 * In-place volume of accumulation `a` from the wells' summaries (wells with zero net pay
 * should be left out by the caller: they are outside the accumulation's pay).
 * Throws RangeError('accumulationVolume: ...') when no well is given.
 */
export function accumulationVolume(a: Accumulation, wells: readonly AccumulationWellInput[]): AccumulationVolume {
  if (wells.length === 0) throw new RangeError(`accumulationVolume: no well has net pay in ${a.name}`);
  const comb = combineWellInputs(
    wells.map((w) => ({ name: w.well, netPayFt: w.netPayTvdFt, porosity: w.meanPhi, sw: w.meanSw })),
    'thickness',
  );
  const areaAcres = cachedAreaAcres(a);
  const rock = { areaAcres, netPayFt: comb.netPayFt, porosity: comb.porosity, sw: comb.sw };
  const pressurePsia = contactPressurePsia(a);
  const temperatureF = contactTemperatureF(a);
  let fvf: number;
  let z: number | null = null;
  let inPlace: number;
  if (a.fluid === 'gas') {
    const pvt = gasPvt({ pressurePsia, temperatureF, gasGravity: compartmentByName(a.compartment).gasGravity });
    fvf = pvt.bgRcfPerScf;
    z = pvt.z;
    inPlace = gasInPlace({ ...rock, bg: fvf });
  } else {
    fvf = OIL_BO;
    inPlace = oilInPlace({ ...rock, bo: fvf });
  }
  return {
    accumulation: a.name,
    fluid: a.fluid,
    areaAcres,
    wells: wells.map((w) => w.well),
    netPayFt: comb.netPayFt,
    porosity: comb.porosity,
    sw: comb.sw,
    hcpvAcreFt: areaAcres * comb.netPayFt * comb.porosity * (1 - comb.sw),
    fvf,
    pressurePsia,
    temperatureF,
    z,
    inPlace,
    inPlaceUnit: a.fluid === 'gas' ? 'scf' : 'STB',
  };
}
