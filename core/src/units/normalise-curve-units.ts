/**
 * Converts a curve's samples to the canonical unit of its class (g/cm3, v/v, us/ft, gAPI,
 * mV, in, ohm.m, b/e): canonical = value x factor, with the factors of `units.ts`
 * (NIST SP 811 for ft, in; SI prefixes; 1 p.u. = 1 % common practice).
 */
import { curveClassInfo, type CurveClass } from '../curves/curve-classes.js';
import { parseUnit } from './units.js';

export interface NormalisedCurve {
  /** New array in the canonical unit; NaN stays NaN. */
  values: Float64Array;
  unit: string;
  factor: number;
  /** True when the curve had no unit and the canonical unit was assumed (factor 1). */
  assumed: boolean;
}

/**
 * Returns the samples in the canonical unit of `curveClass`.
 *
 * @param values samples in `unit` (not changed)
 * @param unit the curve's unit as written ('' = none: canonical assumed, `assumed: true`)
 * @param curveClass the bound class
 * @throws RangeError when the unit is unknown or belongs to another quantity, naming both
 * @example normaliseCurveUnits([2450], 'kg/m3', 'bulk_density') // { values: [2.45], unit: 'g/cm3', factor: 0.001 }
 * @example normaliseCurveUnits([25], 'PU', 'neutron_porosity')    // { values: [0.25], unit: 'v/v', factor: 0.01 }
 */
export function normaliseCurveUnits(values: Float64Array | readonly number[], unit: string, curveClass: CurveClass): NormalisedCurve {
  const info = curveClassInfo(curveClass);
  let factor = 1;
  let assumed = false;
  if (unit.trim() === '') {
    assumed = true;
  } else {
    const u = parseUnit(unit);
    if (!u) throw new RangeError(`normaliseCurveUnits: unit ${JSON.stringify(unit)} is not a known ${info.label.toLowerCase()} unit`);
    if (u.quantity !== info.quantity) {
      throw new RangeError(`normaliseCurveUnits: unit ${JSON.stringify(unit)} is a ${u.quantity} unit; ${curveClass} needs a ${info.quantity} unit such as ${info.canonicalUnit}`);
    }
    factor = u.factor;
  }
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = factor === 1 ? values[i] : values[i] * factor;
  return { values: out, unit: info.canonicalUnit, factor, assumed };
}
