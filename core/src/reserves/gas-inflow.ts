import { fahrenheitToRankine } from './standard-conditions.js';
import { checkSample } from './validate.js';

/**
 * Field-unit constant of pseudo-steady-state radial gas flow in the pressure-squared form,
 * 1422 (q in Mscf/d, T in R), as printed by Lee & Wattenbarger (1996) and Ahmed (2006) (from
 * memory). It is the liquid constant 0.00708 (2 pi x 0.001127) with Bg = (psc / Tsc) z T / p
 * at 14.7 psia and 520 R, per Mscf: 2 x 1000 x 14.7 / (5.6146 x 520 x 0.0070811) = 1422;
 * gas-inflow.test.ts checks that derivation.
 */
export const GAS_RADIAL_FLOW_CONSTANT = 1422;

const MAX = Number.MAX_VALUE;

/** Inputs of {@link gasRadialInflowRate}. */
export interface GasInflowInput {
  /** Permeability, md (> 0). */
  kMd: number;
  /** Net pay, ft (> 0). */
  netPayFt: number;
  /** Average reservoir pressure in the drainage area, psia (> 0). */
  reservoirPressurePsia: number;
  /** Flowing bottom-hole pressure, psia (>= 0, <= the reservoir pressure). */
  bottomholePressurePsia: number;
  /** Reservoir temperature, F. */
  temperatureF: number;
  /** Gas viscosity at the average of the two pressures, cp (> 0). */
  muCp: number;
  /** Gas deviation factor at the average of the two pressures (> 0). */
  z: number;
  /** Drainage radius, ft (> rw). */
  reFt: number;
  /** Wellbore radius, ft (> 0). */
  rwFt: number;
  /** Skin factor, dimensionless (default 0). */
  skin?: number;
}

/** Result of {@link gasRadialInflowRate}. */
export interface GasInflowResult {
  /** Gas rate at the given bottom-hole pressure, Mscf/d. */
  rateMscfPerDay: number;
  /** Rate at zero bottom-hole pressure with the same mu and z (absolute open flow), Mscf/d. */
  absoluteOpenFlowMscfPerDay: number;
  /** Deliverability coefficient C = q / (pr^2 - pwf^2), Mscf/d/psi^2. */
  coefficient: number;
}

/**
 * Pseudo-steady-state radial inflow of gas to a vertical well, pressure-squared form (Darcy
 * flow, no turbulence term; mu and z taken at the average of the two pressures, fit below
 * about 2,000 psia where mu z is nearly constant):
 *
 *   q [Mscf/d] = k h (pr^2 - pwf^2) / (1422 T mu z (ln(re/rw) - 0.75 + s)),  T in R
 *
 * Source: Lee, W.J., Wattenbarger, R.A. (1996) Gas Reservoir Engineering, SPE Textbook Series
 * vol. 5, ch. 7 (pressure-squared approximation); Ahmed, T. (2006) Reservoir Engineering
 * Handbook, 3rd ed., ch. 6 (pseudosteady-state radial flow of gases). Constant: see
 * {@link GAS_RADIAL_FLOW_CONSTANT}.
 *
 * @throws RangeError naming the field out of range, when re <= rw, when the bottom-hole
 *   pressure exceeds the reservoir pressure, or when ln(re/rw) - 0.75 + s <= 0
 * @example gasRadialInflowRate({ kMd: 5, netPayFt: 40, reservoirPressurePsia: 2000, bottomholePressurePsia: 1200, temperatureF: 180, muCp: 0.016, z: 0.87, reFt: 1490, rwFt: 0.328 })
 */
export function gasRadialInflowRate(input: GasInflowInput): GasInflowResult {
  const fn = 'gasRadialInflowRate';
  checkSample(fn, 'kMd', input.kMd, 0, MAX, true);
  checkSample(fn, 'netPayFt', input.netPayFt, 0, MAX, true);
  checkSample(fn, 'reservoirPressurePsia', input.reservoirPressurePsia, 0, MAX, true);
  checkSample(fn, 'bottomholePressurePsia', input.bottomholePressurePsia, 0, MAX);
  checkSample(fn, 'temperatureF', input.temperatureF, -459.67, MAX, true);
  checkSample(fn, 'muCp', input.muCp, 0, MAX, true);
  checkSample(fn, 'z', input.z, 0, MAX, true);
  checkSample(fn, 'rwFt', input.rwFt, 0, MAX, true);
  checkSample(fn, 'reFt', input.reFt, 0, MAX, true);
  const skin = input.skin ?? 0;
  checkSample(fn, 'skin', skin, -MAX, MAX);
  if (!(input.reFt > input.rwFt)) throw new RangeError(`${fn}: reFt must be > rwFt (got ${input.reFt}, ${input.rwFt})`);
  if (input.bottomholePressurePsia > input.reservoirPressurePsia) {
    throw new RangeError(`${fn}: bottomholePressurePsia must be <= reservoirPressurePsia (got ${input.bottomholePressurePsia} > ${input.reservoirPressurePsia}): the well would inject`);
  }
  const denom = Math.log(input.reFt / input.rwFt) - 0.75 + skin;
  if (!(denom > 0)) throw new RangeError(`${fn}: ln(re/rw) - 0.75 + skin must be > 0 (got ${denom})`);
  const c = (input.kMd * input.netPayFt) / (GAS_RADIAL_FLOW_CONSTANT * fahrenheitToRankine(input.temperatureF) * input.muCp * input.z * denom);
  const pr2 = input.reservoirPressurePsia ** 2;
  return {
    rateMscfPerDay: c * (pr2 - input.bottomholePressurePsia ** 2),
    absoluteOpenFlowMscfPerDay: c * pr2,
    coefficient: c,
  };
}
