/**
 * Sonic porosity (v/v) from compressional transit time (us/ft): Wyllie time average and
 * Raymer-Hunt-Gardner, each with its forward form so a synthetic log inverts exactly.
 */
import { type CurveInput, outputFor, requirePositive } from './curve-util.js';

/**
 * Wyllie time-average porosity: phi = (dt - dtMatrix) / (dtFluid - dtMatrix) / cp, where cp
 * is the compaction correction factor (1 for consolidated rock).
 * Source: Wyllie, Gregory & Gardner (1956) Geophysics 21(1); cp as in Asquith & Krygowski
 * (2004) ch. 4. Units: us/ft. No argument checks (per-sample kernel).
 * @example sonicPorosityWyllie(80, 55.5, 189) // 0.18352
 */
export function sonicPorosityWyllie(dt: number, dtMatrix: number, dtFluid: number, cp = 1): number {
  return (dt - dtMatrix) / (dtFluid - dtMatrix) / cp;
}

/** Forward Wyllie time average: dt = phi dtFluid + (1 - phi) dtMatrix (us/ft), with cp = 1. */
export function transitTimeWyllie(phi: number, dtMatrix: number, dtFluid: number): number {
  return phi * dtFluid + (1 - phi) * dtMatrix;
}

/**
 * Raymer-Hunt-Gardner porosity: the exact root of the velocity relation
 * 1/dt = (1 - phi)^2 / dtMatrix + phi / dtFluid (Raymer, Hunt & Gardner 1980, SPWLA 21st
 * symposium, the consolidated-rock branch, valid for phi below about 0.37), i.e.
 * phi = -alpha - sqrt(alpha^2 + dtMatrix/dt - 1), alpha = dtMatrix / (2 dtFluid) - 1
 * (the smaller root; from memory: this closed form is the one printed with the RHG chart).
 * dt < dtMatrix gives a negative porosity (clamp later); a dt beyond the relation's reach
 * (root negative) gives NaN. Units: us/ft. No argument checks (per-sample kernel).
 * @example sonicPorosityRhg(transitTimeRhg(0.2, 55.5, 189), 55.5, 189) // 0.2
 */
export function sonicPorosityRhg(dt: number, dtMatrix: number, dtFluid: number): number {
  const alpha = dtMatrix / (2 * dtFluid) - 1;
  return -alpha - Math.sqrt(alpha * alpha + dtMatrix / dt - 1);
}

/** Forward Raymer-Hunt-Gardner: dt = 1 / ((1 - phi)^2 / dtMatrix + phi / dtFluid) (us/ft). */
export function transitTimeRhg(phi: number, dtMatrix: number, dtFluid: number): number {
  return 1 / (((1 - phi) * (1 - phi)) / dtMatrix + phi / dtFluid);
}

export interface SonicPorosityParams {
  method: 'wyllie' | 'rhg';
  /** us/ft */
  dtMatrix: number;
  /** us/ft; must exceed dtMatrix */
  dtFluid: number;
  /** Wyllie compaction correction factor (>= 1; default 1). */
  cp?: number;
}

/**
 * Sonic porosity curve by Wyllie or Raymer-Hunt-Gardner.
 * Throws RangeError naming the field when dtMatrix/dtFluid are not > 0, dtFluid <= dtMatrix,
 * or cp is not > 0.
 */
export function sonicPorosity(dt: CurveInput, p: SonicPorosityParams, output?: Float64Array): Float64Array {
  const fn = 'sonicPorosity';
  requirePositive(fn, 'dtMatrix', p.dtMatrix);
  requirePositive(fn, 'dtFluid', p.dtFluid);
  if (!(p.dtFluid > p.dtMatrix)) throw new RangeError(`${fn}: dtFluid must be > dtMatrix`);
  const cp = p.cp ?? 1;
  requirePositive(fn, 'cp', cp);
  const out = outputFor(fn, dt.length, output);
  for (let i = 0; i < dt.length; i++) {
    out[i] = p.method === 'rhg' ? sonicPorosityRhg(dt[i], p.dtMatrix, p.dtFluid) : sonicPorosityWyllie(dt[i], p.dtMatrix, p.dtFluid, cp);
  }
  return out;
}
