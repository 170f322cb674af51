/**
 * Unit normalisation for log curves: each recognised unit spelling maps to a canonical unit
 * of its quantity and the factor that converts to it (canonical = value x factor).
 *
 * Factors:
 * - 1 ft = 0.3048 m exactly; 1 in = 2.54 cm exactly (Thompson, A., Taylor, B.N. (2008)
 *   NIST Special Publication 811, Guide for the Use of the International System of Units,
 *   Appendix B.8, "foot" and "inch"; from memory: both listed as exact).
 * - 1 g/cm3 = 1000 kg/m3 (SI prefixes, NIST SP 811 section 4; exact).
 * - 1 % = 0.01; 1 p.u. (porosity unit) = 1 % of bulk volume (common practice).
 * - slowness: x us/m = x * 0.3048 us/ft, since one foot is 0.3048 m (same NIST factor).
 * - 1 V = 1000 mV (SI prefix).
 * Unit spellings are the ones met in LAS files (common practice), compared case-insensitively
 * after removing spaces.
 */

export type UnitQuantity =
  | 'length'
  | 'density'
  | 'fraction'
  | 'slowness'
  | 'gamma'
  | 'potential'
  | 'resistivity'
  | 'photoelectric'
  | 'diameter';

export interface UnitInfo {
  quantity: UnitQuantity;
  /** The canonical unit of the quantity (for length: the unit itself, 'ft' or 'm'). */
  canonical: string;
  /** Multiply a value in this unit by `factor` to get the canonical unit. */
  factor: number;
}

/** Metres in one international foot, exact (NIST SP 811, 2008, App. B.8). */
export const METRES_PER_FOOT = 0.3048;

const TABLE: ReadonlyArray<readonly [UnitQuantity, string, number, readonly string[]]> = [
  ['length', 'ft', 1, ['FT', 'F', 'FEET', 'FOOT']],
  ['length', 'm', 1, ['M', 'METER', 'METERS', 'METRE', 'METRES']],
  ['density', 'g/cm3', 1, ['G/CM3', 'G/CC', 'G/C3', 'GM/CC', 'GR/CC', 'GRM/CC', 'GM/CM3', 'GRAM/CC', 'G/CM³']],
  ['density', 'g/cm3', 0.001, ['KG/M3', 'K/M3', 'KG/M³']],
  ['fraction', 'v/v', 1, ['V/V', 'FRAC', 'FRACTION', 'DEC', 'DECIMAL', 'M3/M3', 'CFCF', 'FT3/FT3', 'CU.FT/CU.FT']],
  ['fraction', 'v/v', 0.01, ['%', 'PU', 'P.U.', 'P.U', 'PERCENT', 'PCT', 'PERC']],
  ['slowness', 'us/ft', 1, ['US/FT', 'US/F', 'USEC/FT', 'USEC/F', 'MICROSEC/FT', 'US/FOOT']],
  ['slowness', 'us/ft', METRES_PER_FOOT, ['US/M', 'USEC/M', 'MICROSEC/M']],
  ['gamma', 'gAPI', 1, ['GAPI', 'API', 'API-GR', 'APIG', 'GAPI-U']],
  ['potential', 'mV', 1, ['MV', 'MILLIVOLT', 'MILLIVOLTS']],
  ['potential', 'mV', 1000, ['V', 'VOLT', 'VOLTS']],
  ['resistivity', 'ohm.m', 1, ['OHMM', 'OHM.M', 'OHM-M', 'OHM_M', 'OHMS', 'OHM', 'OHMMETER', 'Ω.M', 'ΩM']],
  ['photoelectric', 'b/e', 1, ['B/E', 'BARN/E', 'BARNS/E', 'B/EL', 'BARN/ELECTRON', 'BARNS/ELECTRON']],
  ['diameter', 'in', 1, ['IN', 'INCH', 'INCHES']],
  ['diameter', 'in', 1 / 25.4, ['MM', 'MILLIMETRE', 'MILLIMETER', 'MILLIMETRES', 'MILLIMETERS']],
  ['diameter', 'in', 1 / 2.54, ['CM', 'CENTIMETRE', 'CENTIMETER']],
];

const LOOKUP = new Map<string, UnitInfo>();
for (const [quantity, canonical, factor, spellings] of TABLE) {
  for (const s of spellings) LOOKUP.set(s, { quantity, canonical, factor });
}

/** The lookup key of a unit spelling: upper case, no spaces, micro sign as 'U'. */
function unitKey(unit: string): string {
  return unit.replace(/\s+/g, '').toUpperCase().replace(/^[µΜ]/, 'U');
}

/**
 * Identifies a unit spelling. Returns null for '' and for spellings not in the table.
 *
 * @example parseUnit('K/M3') // { quantity: 'density', canonical: 'g/cm3', factor: 0.001 }
 */
export function parseUnit(unit: string): UnitInfo | null {
  const key = unitKey(unit);
  if (key === '') return null;
  return LOOKUP.get(key) ?? null;
}

/**
 * The depth unit a unit spelling stands for: 'ft', 'm', or null (time index, unknown).
 *
 * @example depthUnitOf('F') // 'ft'
 */
export function depthUnitOf(unit: string): 'ft' | 'm' | null {
  const info = parseUnit(unit);
  return info && info.quantity === 'length' ? (info.canonical as 'ft' | 'm') : null;
}

/**
 * Feet to metres: m = ft x 0.3048 (exact; NIST SP 811, 2008, App. B.8).
 * @example feetToMetres(1000) // 304.8
 */
export function feetToMetres(feet: number): number {
  return feet * METRES_PER_FOOT;
}

/**
 * Metres to feet: ft = m / 0.3048 (exact definition; NIST SP 811, 2008, App. B.8).
 * @example metresToFeet(304.8) // 1000
 */
export function metresToFeet(metres: number): number {
  return metres / METRES_PER_FOOT;
}

/**
 * Converts a depth array between 'ft' and 'm' (same unit: a copy). NaN stays NaN.
 * Returns a new Float64Array; the input is not changed.
 *
 * @param values depths in `from`
 * @throws RangeError when `from` or `to` is not 'ft' or 'm'
 * @example convertDepths([0, 100], 'ft', 'm') // Float64Array [0, 30.48]
 */
export function convertDepths(values: Float64Array | readonly number[], from: 'ft' | 'm', to: 'ft' | 'm'): Float64Array {
  for (const [name, u] of [['from', from], ['to', to]] as const) {
    if (u !== 'ft' && u !== 'm') throw new RangeError(`convertDepths: ${name} must be 'ft' or 'm', got ${JSON.stringify(u)}`);
  }
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = from === to ? v : from === 'ft' ? v * METRES_PER_FOOT : v / METRES_PER_FOOT;
  }
  return out;
}
