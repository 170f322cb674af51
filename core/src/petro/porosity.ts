/**
 * Porosity (v/v) from the density and neutron logs, total and effective, with the forward
 * (log response) forms so a synthetic log inverts exactly.
 *
 * Units: densities g/cm3, neutron porosity v/v on the same matrix as rhoMatrix (matrix
 * corrected), porosity v/v. NaN samples pass through. Clamping to a physical range is a
 * separate, recorded step (see `clampCurve`); these functions return the raw formula value.
 */
import { type CurveInput, outputFor, requireFinite, sameLength } from './curve-util.js';

export type Lithology = 'sandstone' | 'limestone' | 'dolomite';

/**
 * Matrix constants per lithology. Densities 2.65 / 2.71 / 2.87 g/cm3 and sonic
 * 55.5 / 47.6 / 43.5 us/ft, fluid 1.0 g/cm3 and 189 us/ft (fresh mud filtrate).
 * // from memory: Asquith & Krygowski (2004) tables of matrix density and matrix transit
 * // time (some texts use 2.648 / 2.710 / 2.876 g/cm3 and 51.0 us/ft for fast sandstone).
 */
export const MATRIX_CONSTANTS: Readonly<Record<Lithology, { rhoMatrix: number; dtMatrix: number }>> = {
  sandstone: { rhoMatrix: 2.65, dtMatrix: 55.5 },
  limestone: { rhoMatrix: 2.71, dtMatrix: 47.6 },
  dolomite: { rhoMatrix: 2.87, dtMatrix: 43.5 },
};
/** Fresh-water mud filtrate: 1.0 g/cm3 and 189 us/ft (common practice; 1.1 g/cm3 for salty mud). */
export const FLUID_CONSTANTS = { rhoFluid: 1.0, dtFluid: 189 } as const;

/**
 * Density porosity: phi = (rhoMatrix - rhob) / (rhoMatrix - rhoFluid), the inverse of the
 * volumetric mixing law {@link bulkDensityFromPorosity}.
 * Source: Asquith & Krygowski (2004) ch. 4, density porosity equation.
 * No argument checks (per-sample kernel); rhoMatrix = rhoFluid gives +-Infinity.
 * @example densityPorosity(2.40, 2.65, 1.0) // 0.151515...
 */
export function densityPorosity(rhob: number, rhoMatrix: number, rhoFluid: number): number {
  return (rhoMatrix - rhob) / (rhoMatrix - rhoFluid);
}

/** Forward form: bulk density of a rock of porosity phi, rhob = phi rhoFluid + (1 - phi) rhoMatrix (g/cm3). */
export function bulkDensityFromPorosity(phi: number, rhoMatrix: number, rhoFluid: number): number {
  return phi * rhoFluid + (1 - phi) * rhoMatrix;
}

/**
 * Neutron-density porosity, arithmetic mean: phi = (phiN + phiD) / 2, for liquid-filled rock.
 * Source: Asquith & Krygowski (2004) ch. 4 (neutron-density combination) // common practice.
 */
export function neutronDensityPorosity(phiN: number, phiD: number): number {
  return 0.5 * (phiN + phiD);
}

/**
 * Neutron-density porosity, root-mean-square (gas-effect) form: phi = sqrt((phiN^2 + phiD^2) / 2).
 * Source: Gaymard & Poupon (1968) The Log Analyst 9(5); as printed in Asquith & Krygowski
 * (2004) ch. 4 for gas zones. A negative phiN (gas crossover) enters squared.
 * @example neutronDensityGasPorosity(0.10, 0.30) // 0.2236
 */
export function neutronDensityGasPorosity(phiN: number, phiD: number): number {
  return Math.sqrt(0.5 * (phiN * phiN + phiD * phiD));
}

/**
 * Apparent (total) porosity of shale from its density: (rhoMatrix - rhoShale) / (rhoMatrix - rhoFluid).
 * Used as `phiShale` in {@link effectivePorosity}. Common practice.
 */
export function shalePorosityFromDensity(rhoShale: number, rhoMatrix: number, rhoFluid: number): number {
  return (rhoMatrix - rhoShale) / (rhoMatrix - rhoFluid);
}

/**
 * Effective (shale-corrected) porosity: PHIE = PHIT - Vsh * phiShale, where phiShale is the
 * apparent total porosity the porosity tool reads in 100% shale (v/v). With phiShale = 0,
 * PHIE = PHIT even where Vsh is NaN. Common practice (the shale-volume correction of
 * Asquith & Krygowski 2004, ch. 4, written on the computed total porosity).
 * @example effectivePorosity(0.25, 0.2, 0.1) // 0.23
 */
export function effectivePorosity(phit: number, vsh: number, phiShale: number): number {
  return phiShale === 0 ? phit : phit - vsh * phiShale;
}

export interface DensityPorosityParams {
  rhoMatrix: number;
  rhoFluid: number;
}

function checkDensity(fn: string, p: DensityPorosityParams): void {
  requireFinite(fn, 'rhoMatrix', p.rhoMatrix);
  requireFinite(fn, 'rhoFluid', p.rhoFluid);
  if (p.rhoMatrix === p.rhoFluid) throw new RangeError(`${fn}: rhoMatrix must differ from rhoFluid`);
}

/**
 * Density porosity curve (array form of {@link densityPorosity}).
 * Throws RangeError naming the field when rhoMatrix or rhoFluid is not finite or they are equal.
 * @example densityPorosityCurve([2.65, 2.40], { rhoMatrix: 2.65, rhoFluid: 1 }) // [0, 0.1515]
 */
export function densityPorosityCurve(rhob: CurveInput, p: DensityPorosityParams, output?: Float64Array): Float64Array {
  const fn = 'densityPorosityCurve';
  checkDensity(fn, p);
  const out = outputFor(fn, rhob.length, output);
  for (let i = 0; i < rhob.length; i++) out[i] = densityPorosity(rhob[i], p.rhoMatrix, p.rhoFluid);
  return out;
}

/**
 * Neutron-density porosity curve: density porosity from rhob, combined with nphi by the
 * arithmetic mean (`gas: false`) or the root-mean-square gas form (`gas: true`).
 * Throws RangeError on bad densities or unequal lengths.
 */
export function neutronDensityPorosityCurve(
  nphi: CurveInput,
  rhob: CurveInput,
  p: DensityPorosityParams & { gas?: boolean },
  output?: Float64Array,
): Float64Array {
  const fn = 'neutronDensityPorosityCurve';
  checkDensity(fn, p);
  const n = sameLength(fn, { nphi, rhob });
  const out = outputFor(fn, n, output);
  for (let i = 0; i < n; i++) {
    const phiD = densityPorosity(rhob[i], p.rhoMatrix, p.rhoFluid);
    out[i] = p.gas ? neutronDensityGasPorosity(nphi[i], phiD) : neutronDensityPorosity(nphi[i], phiD);
  }
  return out;
}

/**
 * Effective porosity curve (array form of {@link effectivePorosity}); phiShale in [0, 1).
 * Throws RangeError when phiShale is outside [0, 1) or lengths differ.
 */
export function effectivePorosityCurve(phit: CurveInput, vsh: CurveInput, phiShale: number, output?: Float64Array): Float64Array {
  const fn = 'effectivePorosityCurve';
  if (!(phiShale >= 0 && phiShale < 1)) throw new RangeError(`${fn}: phiShale must be in [0, 1)`);
  const n = sameLength(fn, { phit, vsh });
  const out = outputFor(fn, n, output);
  for (let i = 0; i < n; i++) out[i] = effectivePorosity(phit[i], vsh[i], phiShale);
  return out;
}
