/**
 * Temperature scales and formation temperature.
 *
 * Offsets: F = C * 9/5 + 32; Rankine = F + 459.67; Kelvin = C + 273.15 (exact by definition
 * of the scales; Thompson & Taylor 2008, NIST SP 811). Some field formulas use 460 for
 * Rankine: we never do.
 */
import { requireFinite } from './curve-util.js';

export type TemperatureUnit = 'F' | 'C';

/** Degrees Fahrenheit from degrees Celsius: F = C * 9/5 + 32. */
export function celsiusToFahrenheit(c: number): number {
  return (c * 9) / 5 + 32;
}
/** Degrees Celsius from degrees Fahrenheit: C = (F - 32) * 5/9. */
export function fahrenheitToCelsius(f: number): number {
  return ((f - 32) * 5) / 9;
}
/** Rankine from Fahrenheit: R = F + 459.67 (NIST SP 811). */
export function fahrenheitToRankine(f: number): number {
  return f + 459.67;
}
/** Kelvin from Celsius: K = C + 273.15 (NIST SP 811). */
export function celsiusToKelvin(c: number): number {
  return c + 273.15;
}
/** Temperature in Fahrenheit from a value in the given unit. */
export function toFahrenheit(t: number, unit: TemperatureUnit): number {
  return unit === 'F' ? t : celsiusToFahrenheit(t);
}

/**
 * Temperature models for formation temperature against true vertical depth (below the
 * log's depth datum). Temperatures in the zone's temperature unit; gradient in degrees per
 * 100 depth units (e.g. 1.2 F/100 ft, or 3 C/100 m).
 * - gradient: T = surfaceTemperature + gradientPer100 * depth / 100
 * - bht: the gradient is taken from a bottom-hole temperature `bht` read at depth `bhtDepth`:
 *   gradient = (bht - surfaceTemperature) / bhtDepth (linear geothermal gradient)
 * - constant: one temperature for the whole zone.
 */
export type TemperatureModel =
  | { kind: 'gradient'; surfaceTemperature: number; gradientPer100: number }
  | { kind: 'bht'; surfaceTemperature: number; bht: number; bhtDepth: number }
  | { kind: 'constant'; temperature: number };

/**
 * Linear temperature model reduced to T = t0 + slope * depth (degrees, degrees per depth
 * unit). Throws RangeError naming the field on non-finite values or bhtDepth <= 0.
 * @example temperatureLine({ kind: 'bht', surfaceTemperature: 80, bht: 200, bhtDepth: 10000 }) // { t0: 80, slope: 0.012 }
 */
export function temperatureLine(model: TemperatureModel): { t0: number; slope: number } {
  const fn = 'temperatureLine';
  switch (model.kind) {
    case 'gradient':
      requireFinite(fn, 'surfaceTemperature', model.surfaceTemperature);
      requireFinite(fn, 'gradientPer100', model.gradientPer100);
      return { t0: model.surfaceTemperature, slope: model.gradientPer100 / 100 };
    case 'bht':
      requireFinite(fn, 'surfaceTemperature', model.surfaceTemperature);
      requireFinite(fn, 'bht', model.bht);
      if (!(model.bhtDepth > 0) || !Number.isFinite(model.bhtDepth)) throw new RangeError(`${fn}: bhtDepth must be > 0`);
      return { t0: model.surfaceTemperature, slope: (model.bht - model.surfaceTemperature) / model.bhtDepth };
    case 'constant':
      requireFinite(fn, 'temperature', model.temperature);
      return { t0: model.temperature, slope: 0 };
    default:
      throw new RangeError(`${fn}: unknown kind '${(model as { kind: string }).kind}'`);
  }
}

/**
 * Formation temperature at a true vertical depth by the given model (linear geothermal
 * gradient; Asquith & Krygowski 2004, ch. 1, formation temperature from surface and
 * bottom-hole temperatures). Throws as {@link temperatureLine}.
 * @example formationTemperature({ kind: 'bht', surfaceTemperature: 80, bht: 200, bhtDepth: 10000 }, 7000) // 164
 */
export function formationTemperature(model: TemperatureModel, tvd: number): number {
  const { t0, slope } = temperatureLine(model);
  return t0 + slope * tvd;
}
