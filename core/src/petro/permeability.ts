/**
 * Permeability (mD) from porosity and irreducible water saturation: published transforms.
 * Both assume the water saturation given is irreducible (above the transition zone).
 */
import { type CurveInput, at, outputFor, sameLength } from './curve-util.js';

export type PermeabilityMethod = 'timur' | 'coates';
export const PERMEABILITY_METHODS: readonly PermeabilityMethod[] = ['timur', 'coates'];

/**
 * Timur (1968): k = 0.136 phi^4.4 / Swi^2 with phi and Swi in PERCENT, k in mD; here phi and
 * Swi are v/v, so k = 0.136 * 100^2.4 * phi^4.4 / Swi^2 (= 8581 phi^4.4 / Swi^2).
 * Source: Timur, A. (1968) An investigation of permeability, porosity and residual water
 * saturation relationships. The Log Analyst 9(4) // from memory.
 * @example timurPermeability(0.25, 0.2) // 479.9 mD
 */
export function timurPermeability(phi: number, swi: number): number {
  return (0.136 * Math.pow(100, 2.4) * Math.pow(phi, 4.4)) / (swi * swi);
}

/**
 * Coates: sqrt(k) = 100 phi^2 (1 - Swi) / Swi, k in mD, phi and Swi v/v.
 * Source: Coates, G.R., Denoo, S. (1981) The producibility answer product. The Technical
 * Review 29(2); as printed in Asquith & Krygowski (2004) ch. 8 // from memory.
 * @example coatesPermeability(0.25, 0.2) // 625 mD
 */
export function coatesPermeability(phi: number, swi: number): number {
  const r = (100 * phi * phi * (1 - swi)) / swi;
  return swi >= 1 ? 0 : r * r;
}

/** Permeability by method (per-sample kernel). */
export function permeabilityFrom(method: PermeabilityMethod, phi: number, swi: number): number {
  return method === 'timur' ? timurPermeability(phi, swi) : coatesPermeability(phi, swi);
}

/**
 * Permeability curve by the named transform; swi is one value or a curve (v/v).
 * Throws RangeError on an unknown method, a constant swi outside (0, 1], or unequal lengths.
 */
export function permeabilityCurve(
  method: PermeabilityMethod,
  phi: CurveInput,
  swi: number | CurveInput,
  output?: Float64Array,
): Float64Array {
  const fn = 'permeabilityCurve';
  if (!PERMEABILITY_METHODS.includes(method)) throw new RangeError(`${fn}: unknown method '${method as string}'`);
  if (typeof swi === 'number' && !(swi > 0 && swi <= 1)) throw new RangeError(`${fn}: swi must be in (0, 1]`);
  const n = sameLength(fn, { phi, swi: typeof swi === 'number' ? undefined : swi });
  const out = outputFor(fn, n, output);
  for (let i = 0; i < n; i++) out[i] = permeabilityFrom(method, phi[i], at(swi, i));
  return out;
}
