/**
 * Formation water resistivity (Rw, ohm.m): Arps temperature correction and Rw from the
 * static SP. The Pickett-plot fit is in pickett.ts.
 */
import { requireFinite, requirePositive } from './curve-util.js';
import { type TemperatureUnit, toFahrenheit } from './temperature.js';

/**
 * Arps' offset for the temperature unit: 6.77 in Fahrenheit (Arps 1953), 21.5 in Celsius.
 * 21.5 C is 6.77 F converted (T_F + 6.77 = 1.8 (T_C + 21.54)) and rounded, so the two forms
 * differ by under 0.05% over 20-200 C. We use the offset of the unit the caller gives.
 */
export function arpsOffset(unit: TemperatureUnit): number {
  return unit === 'F' ? 6.77 : 21.5;
}

/**
 * Resistivity of a brine at temperature t2 from its value r1 at t1 (Arps 1953):
 * R2 = R1 (T1 + k) / (T2 + k), k = 6.77 (F) or 21.5 (C).
 * Source: Arps, J.J. (1953) Trans. AIME 198; as printed in Asquith & Krygowski (2004) ch. 1.
 * Units: ohm.m, degrees of `unit`. No argument checks (per-sample kernel; see {@link arpsRw}).
 * @example resistivityAtTemperature(0.6, 75, 200, 'F') // 0.23728
 */
export function resistivityAtTemperature(r1: number, t1: number, t2: number, unit: TemperatureUnit): number {
  const k = unit === 'F' ? 6.77 : 21.5;
  return (r1 * (t1 + k)) / (t2 + k);
}

/**
 * Checked form of {@link resistivityAtTemperature}.
 * Throws RangeError('arpsRw: rw must be > 0') and similar for non-finite temperatures or a
 * temperature at or below -k (the formula's pole).
 */
export function arpsRw(rw: number, tRw: number, tFormation: number, unit: TemperatureUnit): number {
  const fn = 'arpsRw';
  requirePositive(fn, 'rw', rw);
  requireFinite(fn, 'tRw', tRw);
  requireFinite(fn, 'tFormation', tFormation);
  const k = arpsOffset(unit);
  if (!(tRw > -k)) throw new RangeError(`${fn}: tRw must be > ${-k} ${unit}`);
  if (!(tFormation > -k)) throw new RangeError(`${fn}: tFormation must be > ${-k} ${unit}`);
  return resistivityAtTemperature(rw, tRw, tFormation, unit);
}

/**
 * Electrochemical SP coefficient K = 61 + 0.133 T (T in F), mV per decade.
 * // from memory: Asquith & Krygowski (2004) ch. 2, the form of K used with the SSP equation
 * // (some texts use 60 + 0.133 T or 65 + 0.24 T(C)).
 */
export function spCoefficient(tFormationF: number): number {
  return 61 + 0.133 * tFormationF;
}

export interface SspParams {
  /** Static SP, mV (negative when Rw < Rmf). */
  ssp: number;
  /** Mud filtrate resistivity, ohm.m, at rmfTemperature. */
  rmf: number;
  rmfTemperature: number;
  /** Formation temperature, same unit. */
  formationTemperature: number;
  temperatureUnit: TemperatureUnit;
}

/**
 * Rw at formation temperature from the static SP:
 * SSP = -K log10(Rmfe / Rwe), so Rwe = Rmfe * 10^(SSP / K), with K = 61 + 0.133 T(F),
 * Rmf corrected to formation temperature by Arps, Rmfe = 0.85 Rmf and Rw taken equal to Rwe.
 * Source: Asquith & Krygowski (2004) ch. 2 (SSP equation; Rmfe = 0.85 Rmf for Rmf above
 * about 0.1 ohm.m at 75 F) // from memory. The chart correction from Rwe to Rw for very
 * saline or very fresh water is not applied; keep Rwe above about 0.1 ohm.m.
 * Throws RangeError naming the field when rmf <= 0 or values are not finite.
 */
export function rwFromSsp(p: SspParams): number {
  const fn = 'rwFromSsp';
  requireFinite(fn, 'ssp', p.ssp);
  requirePositive(fn, 'rmf', p.rmf);
  const rmfT = arpsRw(p.rmf, p.rmfTemperature, p.formationTemperature, p.temperatureUnit);
  const k = spCoefficient(toFahrenheit(p.formationTemperature, p.temperatureUnit));
  return 0.85 * rmfT * Math.pow(10, p.ssp / k);
}
