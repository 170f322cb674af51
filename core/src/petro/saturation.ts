/**
 * Water saturation (Sw, v/v of pore volume) from deep resistivity: Archie, Simandoux (one
 * named form), Indonesia; each with its forward form (Rt from Sw) so synthetic logs invert
 * exactly. The saturation returned is the raw root (may exceed 1); clamping to [0, 1] is a
 * separate, counted step. Units: resistivities ohm.m, porosity and Vsh v/v.
 */
import { type CurveInput, at, outputFor, requirePositive, sameLength } from './curve-util.js';

export type SwModel = 'archie' | 'simandoux' | 'indonesia';
export const SW_MODELS: readonly SwModel[] = ['archie', 'simandoux', 'indonesia'];

function powFast(x: number, e: number): number {
  return e === 2 ? x * x : Math.pow(x, e);
}

/**
 * Formation resistivity factor F = a / phi^m (Archie 1942, with the tortuosity factor a of
 * Winsauer et al. 1952). No argument checks.
 * @example formationFactor(0.2, 0.62, 2.15) // 19.73 (Humble form)
 */
export function formationFactor(phi: number, a: number, m: number): number {
  return a / powFast(phi, m);
}

/**
 * Archie water saturation: Sw = (a Rw / (phi^m Rt))^(1/n).
 * Source: Archie, G.E. (1942) Trans. AIME 146, 54-62 (F = phi^-m, Sw^n = Ro/Rt); a from
 * Winsauer et al. (1952). phi = 0 gives +Infinity (clamped to 1 later). No argument checks
 * (per-sample kernel; the array form checks rw, a, m, n > 0).
 * @example archieSaturation(0.2, 10, 0.05, 1, 2, 2) // 0.35355
 */
export function archieSaturation(phi: number, rt: number, rw: number, a: number, m: number, n: number): number {
  const x = (a * rw) / (powFast(phi, m) * rt);
  return n === 2 ? Math.sqrt(x) : Math.pow(x, 1 / n);
}

/** Forward Archie: Rt = a Rw / (phi^m Sw^n) (ohm.m). */
export function archieResistivity(phi: number, sw: number, rw: number, a: number, m: number, n: number): number {
  return (a * rw) / (powFast(phi, m) * powFast(sw, n));
}

/**
 * Simandoux water saturation, in the form
 *   1/Rt = phi^m Sw^n / (a Rw) + Vsh Sw / Rsh
 * (shale term linear in Sw, no (1 - Vsh) factor on the clean term). This is Simandoux (1963)
 * generalised to a, m, n; with a = 0.8 and m = n = 2 it is the closed form printed in Asquith
 * & Krygowski (2004) ch. 7, Sw = (0.4 Rw / phi^2)[sqrt((Vsh/Rsh)^2 + 5 phi^2 / (Rw Rt)) - Vsh/Rsh]
 * // from memory. Reduces to Archie at Vsh = 0.
 * n = 2: the quadratic root, written as 2C / (B + sqrt(B^2 + 4AC)) with A = phi^m/(a Rw),
 * B = Vsh/Rsh, C = 1/Rt (stable, and gives C/B at phi = 0).
 * n != 2: Newton iteration on f(S) = A S^n + B S - C from the Archie value (an upper bound),
 * to |dS| < 1e-12, at most 50 steps, bisection safeguard; returns NaN if it fails.
 * No argument checks (per-sample kernel).
 * @example simandouxSaturation(0.2, 10, 0.2, 0.05, 2, 1, 2, 2) // 0.29653 (phi, rt, vsh, rw, rsh, a, m, n)
 */
export function simandouxSaturation(
  phi: number,
  rt: number,
  vsh: number,
  rw: number,
  rsh: number,
  a: number,
  m: number,
  n: number,
): number {
  const A = powFast(phi, m) / (a * rw);
  const B = vsh / rsh;
  const C = 1 / rt;
  if (n === 2) return (2 * C) / (B + Math.sqrt(B * B + 4 * A * C));
  return simandouxIterative(A, B, C, n);
}

function simandouxIterative(A: number, B: number, C: number, n: number): number {
  if (!(A === A && B === B && C === C)) return NaN;
  if (A === 0) return B > 0 ? C / B : Infinity;
  // Bracket [0, hi]: f(0) = -C <= 0, f(Archie) = B * Archie >= 0.
  let hi = Math.pow(C / A, 1 / n);
  if (B === 0) return hi;
  let lo = 0;
  let s = hi;
  for (let k = 0; k < 50; k++) {
    const sn1 = Math.pow(s, n - 1);
    const f = A * sn1 * s + B * s - C;
    if (f > 0) hi = s;
    else lo = s;
    const d = n * A * sn1 + B;
    let next = s - f / d;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - s) < 1e-12) return next;
    s = next;
  }
  return NaN;
}

/** Forward Simandoux (same form): Rt = 1 / (phi^m Sw^n / (a Rw) + Vsh Sw / Rsh) (ohm.m). */
export function simandouxResistivity(
  phi: number,
  sw: number,
  vsh: number,
  rw: number,
  rsh: number,
  a: number,
  m: number,
  n: number,
): number {
  return 1 / ((powFast(phi, m) * powFast(sw, n)) / (a * rw) + (vsh * sw) / rsh);
}

/**
 * Indonesia water saturation (Poupon & Leveaux 1971, SPWLA 12th symposium):
 *   1/sqrt(Rt) = [ Vsh^(1 - Vsh/2) / sqrt(Rsh) + sqrt(phi^m / (a Rw)) ] Sw^(n/2)
 * solved in closed form, Sw = ( (1/sqrt(Rt)) / [ ... ] )^(2/n). Reduces to Archie at Vsh = 0.
 * No argument checks (per-sample kernel).
 * @example indonesiaSaturation(0.2, 10, 0.2, 0.05, 2, 1, 2, 2) // 0.29818 (phi, rt, vsh, rw, rsh, a, m, n)
 */
export function indonesiaSaturation(
  phi: number,
  rt: number,
  vsh: number,
  rw: number,
  rsh: number,
  a: number,
  m: number,
  n: number,
): number {
  const denom = Math.pow(vsh, 1 - 0.5 * vsh) / Math.sqrt(rsh) + Math.sqrt(powFast(phi, m) / (a * rw));
  const x = 1 / (Math.sqrt(rt) * denom);
  return n === 2 ? x : Math.pow(x, 2 / n);
}

/** Forward Indonesia (same form): Rt = 1 / ([Vsh^(1-Vsh/2)/sqrt(Rsh) + sqrt(phi^m/(a Rw))]^2 Sw^n). */
export function indonesiaResistivity(
  phi: number,
  sw: number,
  vsh: number,
  rw: number,
  rsh: number,
  a: number,
  m: number,
  n: number,
): number {
  const t = Math.pow(vsh, 1 - 0.5 * vsh) / Math.sqrt(rsh) + Math.sqrt(powFast(phi, m) / (a * rw));
  return 1 / (t * t * powFast(sw, n));
}

export interface SaturationParams {
  model: SwModel;
  /** ohm.m at formation temperature; one value or one per sample. */
  rw: number | CurveInput;
  a: number;
  m: number;
  n: number;
  /** Shale resistivity, ohm.m (Simandoux and Indonesia). */
  rsh?: number;
}

/**
 * Water saturation curve by the named model (raw roots, not clamped).
 * `vsh` is required for Simandoux and Indonesia.
 * Throws RangeError naming the field when rw, a, m, n (or rsh for shaly models) are not
 * > 0, vsh is missing for a shaly model, or lengths differ.
 */
export function waterSaturation(
  phi: CurveInput,
  rt: CurveInput,
  p: SaturationParams,
  vsh?: CurveInput,
  output?: Float64Array,
): Float64Array {
  const fn = 'waterSaturation';
  requirePositive(fn, 'a', p.a);
  requirePositive(fn, 'm', p.m);
  requirePositive(fn, 'n', p.n);
  if (typeof p.rw === 'number') requirePositive(fn, 'rw', p.rw);
  else for (let i = 0; i < p.rw.length; i++) if (!(p.rw[i] > 0)) throw new RangeError(`${fn}: rw must be > 0 (sample ${i})`);
  const shaly = p.model !== 'archie';
  if (shaly) {
    requirePositive(fn, 'rsh', p.rsh ?? NaN);
    if (!vsh) throw new RangeError(`${fn}: vsh is required for the ${p.model} model`);
  }
  const n = sameLength(fn, { phi, rt, vsh, rw: typeof p.rw === 'number' ? undefined : p.rw });
  const out = outputFor(fn, n, output);
  const rsh = p.rsh ?? NaN;
  for (let i = 0; i < n; i++) {
    const rw = at(p.rw, i);
    if (p.model === 'archie') out[i] = archieSaturation(phi[i], rt[i], rw, p.a, p.m, p.n);
    else if (p.model === 'simandoux') out[i] = simandouxSaturation(phi[i], rt[i], vsh![i], rw, rsh, p.a, p.m, p.n);
    else if (p.model === 'indonesia') out[i] = indonesiaSaturation(phi[i], rt[i], vsh![i], rw, rsh, p.a, p.m, p.n);
    else throw new RangeError(`${fn}: unknown model '${p.model as string}'`);
  }
  return out;
}
