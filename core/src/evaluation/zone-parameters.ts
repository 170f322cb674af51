/**
 * Evaluation parameters of one zone, their defaults per lithology, and their validation.
 * Plain JSON (null, never undefined, for "not set") so the service can store them and the
 * UI forms can edit them.
 */
import { FLUID_CONSTANTS, MATRIX_CONSTANTS } from '../petro/porosity.js';
import { PERMEABILITY_METHODS, type PermeabilityMethod } from '../petro/permeability.js';
import { SW_MODELS, type SwModel } from '../petro/saturation.js';
import { VSH_METHODS, type VshMethod } from '../petro/shale-volume.js';
import type { TemperatureModel, TemperatureUnit } from '../petro/temperature.js';
import { arpsOffset } from '../petro/water-resistivity.js';
import type { ParameterIssue } from './errors.js';

export type PorosityMethod = 'density' | 'neutron_density' | 'neutron_density_gas' | 'sonic_wyllie' | 'sonic_rhg';
export const POROSITY_METHODS: readonly PorosityMethod[] = ['density', 'neutron_density', 'neutron_density_gas', 'sonic_wyllie', 'sonic_rhg'];

/**
 * Where the zone's formation water resistivity comes from. Each gives Rw at a reference
 * temperature; the evaluation then corrects it to every sample's formation temperature by
 * Arps (1953).
 * - at_temperature: Rw (ohm.m) measured at `temperature` (the zone's temperature unit).
 * - ssp: from the static SP (mV) with mud filtrate Rmf at rmfTemperature, at the formation
 *   temperature of the zone's mid-depth; `ssp: null` picks SSP = P5(SP) - P95(SP) over the
 *   zone (deflection of clean sand from the shale baseline; needs the SP curve).
 * - pickett: fitted on the zone's own water-bearing interval [top, base] (Sw = 1) from PHIE
 *   and RT; gives a*Rw at the interval's mid-depth temperature; with fitM the fitted slope
 *   replaces m for the zone.
 */
export type RwSource =
  | { kind: 'at_temperature'; rw: number; temperature: number }
  | { kind: 'ssp'; ssp: number | null; rmf: number; rmfTemperature: number }
  | { kind: 'pickett'; top: number; base: number; fitM: boolean };

export interface PermeabilityParameters {
  method: PermeabilityMethod;
  /** Irreducible water saturation (v/v); null uses each sample's SW (valid above the transition zone only). */
  swIrr: number | null;
}

export interface ZoneParameters {
  vshMethod: VshMethod;
  /** gAPI; null for both picks them as percentiles of the zone's GR. */
  grClean: number | null;
  grShale: number | null;
  /** Percentiles (0-100) used when grClean/grShale are null. */
  grCleanPercentile: number;
  grShalePercentile: number;
  porosityMethod: PorosityMethod;
  /** g/cm3 (density methods). */
  rhoMatrix: number;
  rhoFluid: number;
  /** us/ft (sonic methods). */
  dtMatrix: number;
  dtFluid: number;
  /** Wyllie compaction correction factor Cp (>= 1 typical; 1 = none). */
  sonicCompaction: number;
  /** Apparent total porosity of 100% shale on the porosity method (v/v): PHIE = PHIT - VSH * phiShale. 0 = PHIE equals PHIT. */
  phiShale: number;
  /** Upper bound of the physical porosity range [0, phiMax]; values outside are clamped and counted. */
  phiMax: number;
  temperatureUnit: TemperatureUnit;
  /** Formation temperature against TVD (depth unit of the well; gradient per 100 depth units). */
  temperature: TemperatureModel;
  rw: RwSource;
  swModel: SwModel;
  /** Archie tortuosity factor, cementation and saturation exponents. */
  a: number;
  m: number;
  n: number;
  /** Shale resistivity, ohm.m (Simandoux, Indonesia). */
  rsh: number | null;
  /** Permeability transform; needed when the formation has a permMin cutoff. */
  permeability: PermeabilityParameters | null;
}

export type DefaultLithology = 'sandstone' | 'shaly_sand' | 'limestone' | 'dolomite';

/**
 * Starting parameters for a lithology // common practice: a starting point to edit, not an
 * interpretation. Matrix constants from MATRIX_CONSTANTS (Asquith & Krygowski 2004 tables);
 * a = 1, m = 2, n = 2 (Archie 1942 for consolidated rock); GR picks at P5/P95 of the zone;
 * porosity clamped to [0, 0.5]; fresh filtrate 1.0 g/cm3, 189 us/ft; a linear geothermal
 * gradient of 1.5 F/100 ft from 60 F (or 2.7 C/100 m from 15 C for metric wells); Rw 0.05
 * ohm.m at 75 F (24 C). Shaly sand: Simandoux with Rsh 2 ohm.m and shale porosity 0.10.
 */
export function defaultZoneParameters(lithology: DefaultLithology, depthUnit: 'ft' | 'm' = 'ft'): ZoneParameters {
  const rock = lithology === 'shaly_sand' ? 'sandstone' : lithology;
  const metric = depthUnit === 'm';
  const shaly = lithology === 'shaly_sand';
  return {
    vshMethod: 'linear',
    grClean: null,
    grShale: null,
    grCleanPercentile: 5,
    grShalePercentile: 95,
    porosityMethod: 'density',
    rhoMatrix: MATRIX_CONSTANTS[rock].rhoMatrix,
    rhoFluid: FLUID_CONSTANTS.rhoFluid,
    dtMatrix: MATRIX_CONSTANTS[rock].dtMatrix,
    dtFluid: FLUID_CONSTANTS.dtFluid,
    sonicCompaction: 1,
    phiShale: shaly ? 0.1 : 0,
    phiMax: 0.5,
    temperatureUnit: metric ? 'C' : 'F',
    temperature: metric
      ? { kind: 'gradient', surfaceTemperature: 15, gradientPer100: 2.7 }
      : { kind: 'gradient', surfaceTemperature: 60, gradientPer100: 1.5 },
    rw: { kind: 'at_temperature', rw: 0.05, temperature: metric ? 24 : 75 },
    swModel: shaly ? 'simandoux' : 'archie',
    a: 1,
    m: 2,
    n: 2,
    rsh: shaly ? 2 : null,
    permeability: null,
  };
}

const finite = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

/**
 * Everything wrong with a zone's parameters, each issue naming the zone and the field.
 * Returns [] when valid (the service and the UI forms use it; evaluateWell throws them).
 * Checks: methods known; GR clean < shale (or both null with percentiles 0 <= clean < shale
 * <= 100); density methods: rhoMatrix and rhoFluid finite, > 0 and different; sonic
 * methods: 0 < dtMatrix < dtFluid, sonicCompaction > 0; 0 <= phiShale < 1; 0 < phiMax <= 1;
 * temperature model fields finite, bhtDepth > 0; rw > 0 and temperatures above Arps' pole;
 * rmf > 0; Pickett top < base; a, m, n > 0; rsh > 0 for Simandoux and Indonesia;
 * swIrr in (0, 1] when set.
 */
export function validateZoneParameters(p: ZoneParameters, zoneName: string): ParameterIssue[] {
  const issues: ParameterIssue[] = [];
  const bad = (field: string, message: string) => issues.push({ zone: zoneName, field, message: `${field} ${message}` });
  const positive = (field: string, x: unknown) => {
    if (!finite(x) || !(x > 0)) bad(field, 'must be > 0');
  };

  if (!VSH_METHODS.includes(p.vshMethod)) bad('vshMethod', `must be one of ${VSH_METHODS.join(', ')}`);
  if (p.grClean === null || p.grShale === null) {
    if (p.grClean !== p.grShale) bad(p.grClean === null ? 'grClean' : 'grShale', 'must be set when the other GR pick is set (or both null for percentiles)');
    if (!finite(p.grCleanPercentile) || p.grCleanPercentile < 0 || p.grCleanPercentile > 100) bad('grCleanPercentile', 'must be in [0, 100]');
    if (!finite(p.grShalePercentile) || p.grShalePercentile < 0 || p.grShalePercentile > 100) bad('grShalePercentile', 'must be in [0, 100]');
    else if (!(p.grCleanPercentile < p.grShalePercentile)) bad('grShalePercentile', 'must be greater than grCleanPercentile');
  } else {
    if (!finite(p.grClean)) bad('grClean', 'must be a finite number');
    if (!finite(p.grShale)) bad('grShale', 'must be a finite number');
    else if (!(p.grShale > p.grClean)) bad('grShale', `must be greater than grClean (${p.grClean} gAPI)`);
  }

  if (!POROSITY_METHODS.includes(p.porosityMethod)) bad('porosityMethod', `must be one of ${POROSITY_METHODS.join(', ')}`);
  if (p.porosityMethod === 'density' || p.porosityMethod === 'neutron_density' || p.porosityMethod === 'neutron_density_gas') {
    positive('rhoMatrix', p.rhoMatrix);
    positive('rhoFluid', p.rhoFluid);
    if (finite(p.rhoMatrix) && p.rhoMatrix === p.rhoFluid) bad('rhoMatrix', `must differ from rhoFluid (both ${p.rhoMatrix} g/cm3)`);
  } else if (p.porosityMethod === 'sonic_wyllie' || p.porosityMethod === 'sonic_rhg') {
    positive('dtMatrix', p.dtMatrix);
    positive('dtFluid', p.dtFluid);
    if (finite(p.dtMatrix) && finite(p.dtFluid) && !(p.dtFluid > p.dtMatrix)) bad('dtFluid', `must be greater than dtMatrix (${p.dtMatrix} us/ft)`);
    positive('sonicCompaction', p.sonicCompaction);
  }
  if (!finite(p.phiShale) || p.phiShale < 0 || p.phiShale >= 1) bad('phiShale', 'must be in [0, 1)');
  if (!finite(p.phiMax) || !(p.phiMax > 0) || p.phiMax > 1) bad('phiMax', 'must be in (0, 1]');

  const unitOk = p.temperatureUnit === 'F' || p.temperatureUnit === 'C';
  if (!unitOk) bad('temperatureUnit', "must be 'F' or 'C'");
  const pole = unitOk ? -arpsOffset(p.temperatureUnit) : -Infinity;
  const temp = p.temperature;
  if (!temp || typeof temp !== 'object') bad('temperature', 'must be a temperature model');
  else if (temp.kind === 'gradient') {
    if (!finite(temp.surfaceTemperature)) bad('temperature.surfaceTemperature', 'must be a finite number');
    if (!finite(temp.gradientPer100)) bad('temperature.gradientPer100', 'must be a finite number');
  } else if (temp.kind === 'bht') {
    if (!finite(temp.surfaceTemperature)) bad('temperature.surfaceTemperature', 'must be a finite number');
    if (!finite(temp.bht)) bad('temperature.bht', 'must be a finite number');
    positive('temperature.bhtDepth', temp.bhtDepth);
  } else if (temp.kind === 'constant') {
    if (!finite(temp.temperature) || !(temp.temperature > pole)) bad('temperature.temperature', `must be a finite number above ${pole}`);
  } else bad('temperature.kind', "must be 'gradient', 'bht' or 'constant'");

  const rw = p.rw;
  if (!rw || typeof rw !== 'object') bad('rw', 'must be an Rw source');
  else if (rw.kind === 'at_temperature') {
    positive('rw.rw', rw.rw);
    if (!finite(rw.temperature) || !(rw.temperature > pole)) bad('rw.temperature', `must be a finite number above ${pole} ${p.temperatureUnit}`);
  } else if (rw.kind === 'ssp') {
    if (rw.ssp !== null && !finite(rw.ssp)) bad('rw.ssp', 'must be a finite number (mV) or null to pick it from the SP curve');
    positive('rw.rmf', rw.rmf);
    if (!finite(rw.rmfTemperature) || !(rw.rmfTemperature > pole)) bad('rw.rmfTemperature', `must be a finite number above ${pole} ${p.temperatureUnit}`);
  } else if (rw.kind === 'pickett') {
    if (!finite(rw.top)) bad('rw.top', 'must be a finite depth');
    if (!finite(rw.base)) bad('rw.base', 'must be a finite depth');
    else if (finite(rw.top) && !(rw.base > rw.top)) bad('rw.base', 'must be deeper than rw.top');
  } else bad('rw.kind', "must be 'at_temperature', 'ssp' or 'pickett'");

  if (!SW_MODELS.includes(p.swModel)) bad('swModel', `must be one of ${SW_MODELS.join(', ')}`);
  positive('a', p.a);
  positive('m', p.m);
  positive('n', p.n);
  if (p.swModel === 'simandoux' || p.swModel === 'indonesia') positive('rsh', p.rsh);
  if (p.permeability !== null) {
    if (!PERMEABILITY_METHODS.includes(p.permeability.method)) bad('permeability.method', `must be one of ${PERMEABILITY_METHODS.join(', ')}`);
    const s = p.permeability.swIrr;
    if (s !== null && (!finite(s) || !(s > 0) || s > 1)) bad('permeability.swIrr', 'must be in (0, 1] or null');
  }
  return issues;
}
