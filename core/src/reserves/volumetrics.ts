import {
  BBL_PER_ACRE_FT,
  FT3_PER_ACRE_FT,
  M2_PER_ACRE,
  M2_PER_KM2,
  M3_PER_BBL,
  M3_PER_FT3,
  M_PER_FT,
} from './units-constants.js';
import { checkSample } from './validate.js';

/** Area units a reserves case accepts. */
export type AreaUnit = 'acre' | 'km2';
/** Thickness units a reserves case accepts. */
export type LengthUnit = 'ft' | 'm';

/** Rock and fluid inputs shared by the volumetric formulas (field units). */
export interface VolumetricRockInput {
  /** Reservoir area, acres (>= 0). */
  areaAcres: number;
  /** Net pay thickness, ft (>= 0). */
  netPayFt: number;
  /** Mean porosity, fraction in [0, 1]. */
  porosity: number;
  /** Mean water saturation, fraction in [0, 1]. */
  sw: number;
}

const MAX = Number.MAX_VALUE;

function checkRock(fn: string, r: VolumetricRockInput): void {
  checkSample(fn, 'areaAcres', r.areaAcres, 0, MAX);
  checkSample(fn, 'netPayFt', r.netPayFt, 0, MAX);
  checkSample(fn, 'porosity', r.porosity, 0, 1);
  checkSample(fn, 'sw', r.sw, 0, 1);
}

/**
 * Hydrocarbon pore volume in acre-feet: A h phi (1 - Sw).
 *
 * @throws RangeError naming the field when a value is out of range (NaN passes through)
 * @example hydrocarbonPoreVolumeAcreFt({ areaAcres: 640, netPayFt: 30, porosity: 0.2, sw: 0.25 }) // 2880
 */
export function hydrocarbonPoreVolumeAcreFt(input: VolumetricRockInput): number {
  checkRock('hydrocarbonPoreVolumeAcreFt', input);
  return input.areaAcres * input.netPayFt * input.porosity * (1 - input.sw);
}

/**
 * Original oil in place (stock-tank barrels), volumetric method.
 *
 *   N [STB] = 7758.37 A h phi (1 - Sw) / Bo,   7758.37 = 43,560 ft3/acre-ft / 5.614583 ft3/bbl
 *
 * Source: Craft, B.C., Hawkins, M.F., rev. Terry, R.E. (1991) Applied Petroleum Reservoir
 * Engineering, 2nd ed., ch. 3 (volumetric oil in place; printed with the rounded 7758).
 * Constants: NIST SP 811 (see units-constants.ts).
 *
 * @param input.bo oil formation volume factor, rb/STB (> 0)
 * @throws RangeError('oilInPlace: bo must be in (0, ...]') etc.; NaN passes through
 * @example oilInPlace({ areaAcres: 640, netPayFt: 30, porosity: 0.2, sw: 0.25, bo: 1.2 }) // 18.6 million STB
 */
export function oilInPlace(input: VolumetricRockInput & { bo: number }): number {
  checkRock('oilInPlace', input);
  checkSample('oilInPlace', 'bo', input.bo, 0, MAX, true);
  return (BBL_PER_ACRE_FT * input.areaAcres * input.netPayFt * input.porosity * (1 - input.sw)) / input.bo;
}

/**
 * Original gas in place (standard cubic feet), volumetric method for a gas reservoir
 * (gas saturation Sg = 1 - Sw; no oil phase).
 *
 *   G [scf] = 43,560 A h phi (1 - Sw) / Bg,   Bg in reservoir ft3 per scf
 *
 * Source: Craft & Hawkins (1991), ch. 1 (volumetric gas in place).
 *
 * @param input.bg gas formation volume factor, rcf/scf (> 0), e.g. from gasFvf
 * @throws RangeError('gasInPlace: bg must be in (0, ...]') etc.; NaN passes through
 * @example gasInPlace({ areaAcres: 640, netPayFt: 30, porosity: 0.2, sw: 0.25, bg: 0.005 }) // 25.1e9 scf
 */
export function gasInPlace(input: VolumetricRockInput & { bg: number }): number {
  checkRock('gasInPlace', input);
  checkSample('gasInPlace', 'bg', input.bg, 0, MAX, true);
  return (FT3_PER_ACRE_FT * input.areaAcres * input.netPayFt * input.porosity * (1 - input.sw)) / input.bg;
}

/**
 * Recoverable volume = in-place volume x recovery factor (same units as the in-place volume).
 *
 * @param recoveryFactor fraction in [0, 1]
 * @throws RangeError('recoverable: recoveryFactor must be in [0, 1] ...')
 * @example recoverable(1e6, 0.3) // 300000
 */
export function recoverable(inPlace: number, recoveryFactor: number): number {
  checkSample('recoverable', 'inPlace', inPlace, 0, MAX);
  checkSample('recoverable', 'recoveryFactor', recoveryFactor, 0, 1);
  return inPlace * recoveryFactor;
}

/**
 * Converts an area to acres (1 km2 = 1e6 m2 / 4046.8564224 m2 per acre = 247.105 acres).
 *
 * @throws RangeError('areaToAcres: unit must be acre or km2')
 * @example areaToAcres(1, 'km2') // 247.105...
 */
export function areaToAcres(value: number, unit: AreaUnit): number {
  if (unit === 'acre') return value;
  if (unit === 'km2') return (value * M2_PER_KM2) / M2_PER_ACRE;
  throw new RangeError(`areaToAcres: unit must be 'acre' or 'km2' (got ${String(unit)})`);
}

/**
 * Converts a thickness to feet (1 m = 1/0.3048 ft).
 *
 * @throws RangeError('lengthToFeet: unit must be ft or m')
 */
export function lengthToFeet(value: number, unit: LengthUnit): number {
  if (unit === 'ft') return value;
  if (unit === 'm') return value / M_PER_FT;
  throw new RangeError(`lengthToFeet: unit must be 'ft' or 'm' (got ${String(unit)})`);
}

/** Stock-tank barrels to cubic metres (0.158987294928 m3/bbl, NIST SP 811). */
export function stbToM3(stb: number): number {
  return stb * M3_PER_BBL;
}

/**
 * Standard cubic feet to cubic metres (0.028316846592 m3/ft3, NIST SP 811). A pure volume
 * conversion: the m3 stays at the scf's standard conditions (not re-stated at 15 C / 101.325 kPa).
 */
export function scfToM3(scf: number): number {
  return scf * M3_PER_FT3;
}

/** SI inputs of {@link volumetricsMetric}. */
export interface VolumetricMetricInput {
  fluid: 'oil' | 'gas';
  /** Area, m2. */
  areaM2: number;
  /** Net pay, m. */
  netPayM: number;
  porosity: number;
  sw: number;
  /** Bo (rm3/sm3, same as rb/STB) for oil; Bg (rm3/sm3, same as rcf/scf) for gas. */
  fvf: number;
}

/**
 * In-place volume computed directly in SI: V [m3 at surface] = A h phi (1 - Sw) / B.
 * Formation volume factors are ratios, so Bo in rb/STB equals Bo in rm3/sm3 and Bg in rcf/scf
 * equals Bg in rm3/sm3. Agrees with the field-unit result converted by stbToM3 / scfToM3 to
 * within the rounding of 5.614583 ft3/bbl (about 6e-8).
 *
 * @throws RangeError('volumetricsMetric: fvf must be in (0, ...]') etc.
 * @example volumetricsMetric({ fluid: 'oil', areaM2: 2.59e6, netPayM: 9.144, porosity: 0.2, sw: 0.25, fvf: 1.2 })
 */
export function volumetricsMetric(input: VolumetricMetricInput): number {
  const fn = 'volumetricsMetric';
  if (input.fluid !== 'oil' && input.fluid !== 'gas') {
    throw new RangeError(`${fn}: fluid must be 'oil' or 'gas' (got ${String(input.fluid)})`);
  }
  checkSample(fn, 'areaM2', input.areaM2, 0, MAX);
  checkSample(fn, 'netPayM', input.netPayM, 0, MAX);
  checkSample(fn, 'porosity', input.porosity, 0, 1);
  checkSample(fn, 'sw', input.sw, 0, 1);
  checkSample(fn, 'fvf', input.fvf, 0, MAX, true);
  return (input.areaM2 * input.netPayM * input.porosity * (1 - input.sw)) / input.fvf;
}
