import { RANKINE_OFFSET } from './units-constants.js';
import { requireFinite, requirePositive } from './validate.js';

/** Pressure and temperature at which surface gas volumes (scf) are stated. */
export interface StandardConditions {
  /** Absolute pressure, psia. */
  pressurePsia: number;
  /** Temperature, degrees Fahrenheit. */
  temperatureF: number;
}

/**
 * Default standard conditions: 14.696 psia (1 standard atmosphere) and 60 F.
 * Some jurisdictions use 14.65 psia / 60 F, which changes Bg (and scf volumes) by about 0.3%;
 * pass your own {@link StandardConditions} where it matters. // common practice
 */
export const STANDARD_CONDITIONS: Readonly<StandardConditions> = Object.freeze({
  pressurePsia: 14.696,
  temperatureF: 60,
});

/**
 * Converts degrees Fahrenheit to degrees Rankine: T[R] = T[F] + 459.67 (NIST SP 811).
 *
 * @param temperatureF temperature, F
 * @returns temperature, R (NaN passes through)
 * @example fahrenheitToRankine(60) // 519.67
 */
export function fahrenheitToRankine(temperatureF: number): number {
  return temperatureF + RANKINE_OFFSET;
}

/**
 * Checks a standard-conditions object (pressure > 0 psia, temperature above absolute zero).
 *
 * @throws RangeError naming the caller and the field
 */
export function checkStandardConditions(fn: string, sc: StandardConditions): void {
  requirePositive(fn, 'standard.pressurePsia', sc.pressurePsia);
  requireFinite(fn, 'standard.temperatureF', sc.temperatureF);
  if (!(fahrenheitToRankine(sc.temperatureF) > 0)) {
    throw new RangeError(`${fn}: standard.temperatureF must be above absolute zero (got ${sc.temperatureF})`);
  }
}
