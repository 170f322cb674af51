/**
 * A LAS file's curves in the units the evaluation computes in, and the splice of two
 * logging runs. Pure (works on core's parsed LasFile).
 */
import { normaliseCurveUnits, recogniseCurve } from '@poreline/core';
import type { CurveClass, LasFile } from '@poreline/core';

/** Curves evaluateWell reads, in canonical units (gAPI, g/cm3, v/v, us/ft, ohm.m, mV). */
export type CanonicalKey = 'gr' | 'rhob' | 'nphi' | 'dt' | 'rt' | 'sp';

export interface CanonicalLog {
  depth: Float64Array;
  depthUnit: 'ft' | 'm';
  curves: Partial<Record<CanonicalKey, Float64Array>>;
}

const KEY_OF_CLASS: Partial<Record<CurveClass, CanonicalKey>> = {
  gamma_ray: 'gr',
  bulk_density: 'rhob',
  neutron_porosity: 'nphi',
  sonic: 'dt',
  deep_resistivity: 'rt',
  spontaneous_potential: 'sp',
};

/**
 * The curves of a parsed LAS file bound by core's recognition (mnemonic, unit, description)
 * and converted to canonical units; the first curve recognised for a class wins.
 * Throws RangeError('canonicalLog: ...') when the index is not a depth in ft or m.
 */
export function canonicalLog(las: LasFile): CanonicalLog {
  const unit = las.index.depthUnit;
  if (unit !== 'ft' && unit !== 'm') throw new RangeError(`canonicalLog: index ${las.index.mnemonic} is not a depth in ft or m`);
  const curves: Partial<Record<CanonicalKey, Float64Array>> = {};
  for (const c of las.curves.slice(1)) {
    const r = recogniseCurve(c.mnemonic, c.unit, c.description);
    const key = r ? KEY_OF_CLASS[r.curveClass] : undefined;
    if (!r || !key || curves[key]) continue;
    curves[key] = normaliseCurveUnits(c.values, c.unit, r.curveClass).values;
  }
  return { depth: Float64Array.from(las.curves[0].values), depthUnit: unit, curves };
}

/**
 * Splices two runs of one well: the upper run above `spliceDepth`, the lower run from it
 * down (default: the middle of their overlap). Curves missing in either run are dropped.
 * Throws RangeError('spliceRuns: ...') when the units differ or the runs do not overlap.
 */
export function spliceRuns(upper: CanonicalLog, lower: CanonicalLog, spliceDepth?: number): CanonicalLog {
  if (upper.depthUnit !== lower.depthUnit) throw new RangeError('spliceRuns: the runs have different depth units');
  const upperEnd = upper.depth[upper.depth.length - 1];
  const lowerStart = lower.depth[0];
  if (!(upperEnd >= lowerStart)) throw new RangeError('spliceRuns: the runs do not overlap');
  const at = spliceDepth ?? 0.5 * (lowerStart + upperEnd);
  const iu = upper.depth.findIndex((d) => d >= at);
  const il = lower.depth.findIndex((d) => d >= at);
  const nu = iu < 0 ? upper.depth.length : iu;
  const join = (a: Float64Array, b: Float64Array): Float64Array => {
    const out = new Float64Array(nu + (b.length - il));
    out.set(a.subarray(0, nu), 0);
    out.set(b.subarray(il), nu);
    return out;
  };
  const curves: Partial<Record<CanonicalKey, Float64Array>> = {};
  for (const k of Object.keys(upper.curves) as CanonicalKey[]) {
    const a = upper.curves[k];
    const b = lower.curves[k];
    if (a && b) curves[k] = join(a, b);
  }
  return { depth: join(upper.depth, lower.depth), depthUnit: upper.depthUnit, curves };
}
