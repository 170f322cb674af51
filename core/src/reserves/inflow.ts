import { checkSample } from './validate.js';

/**
 * Field-unit constant of radial Darcy flow, 0.00708 STB/d per (md ft psi / cp), as printed by
 * Craft & Hawkins (1991) and Ahmed (2006): it is 2 pi x 0.001127 (0.001127 converts
 * md ft2 psi/(cp ft) to bbl/d) = 0.0070811, rounded. This module uses the printed 0.00708.
 */
export const RADIAL_FLOW_CONSTANT = 0.00708;

/** Darcy's law conversion constant in field units, bbl/d per (md ft2 psi / (cp ft)). */
export const DARCY_FIELD_CONSTANT = 0.001127;

const MAX = Number.MAX_VALUE;

/** Inputs of {@link radialInflowRate}. */
export interface RadialInflowInput {
  /** Permeability, md (> 0). */
  kMd: number;
  /** Net pay, ft (> 0). */
  netPayFt: number;
  /** Drawdown: average reservoir pressure minus flowing bottom-hole pressure, psi (>= 0). */
  drawdownPsi: number;
  /** Oil viscosity, cp (> 0). */
  muCp: number;
  /** Oil formation volume factor, rb/STB (> 0). */
  bo: number;
  /** Drainage radius, ft (> rw). */
  reFt: number;
  /** Wellbore radius, ft (> 0). */
  rwFt: number;
  /** Skin factor, dimensionless (default 0). */
  skin?: number;
}

/** Result of {@link radialInflowRate}. */
export interface InflowResult {
  /** Oil rate, STB/d. */
  rateStbPerDay: number;
  /** Productivity index, STB/d/psi. */
  productivityIndex: number;
}

/**
 * Pseudo-steady-state radial inflow of oil to a vertical well (Darcy's law, circular drainage
 * area, average reservoir pressure):
 *
 *   q [STB/d] = 0.00708 k h (pr - pwf) / (mu Bo (ln(re/rw) - 0.75 + s))
 *
 * Source: Craft, B.C., Hawkins, M.F., rev. Terry, R.E. (1991) Applied Petroleum Reservoir
 * Engineering, 2nd ed., ch. 6; Dake, L.P. (1978) Fundamentals of Reservoir Engineering,
 * ch. 6 (pseudo-steady-state inflow equation with the -3/4 term). Constant: 0.00708 (see
 * {@link RADIAL_FLOW_CONSTANT}).
 *
 * @throws RangeError('radialInflowRate: reFt must be > rwFt ...') and for each field out of range,
 *   or when ln(re/rw) - 0.75 + s <= 0 (skin too negative)
 * @example radialInflowRate({ kMd: 50, netPayFt: 30, drawdownPsi: 500, muCp: 1.2, bo: 1.25, reFt: 1490, rwFt: 0.328 })
 */
export function radialInflowRate(input: RadialInflowInput): InflowResult {
  const fn = 'radialInflowRate';
  checkSample(fn, 'kMd', input.kMd, 0, MAX, true);
  checkSample(fn, 'netPayFt', input.netPayFt, 0, MAX, true);
  checkSample(fn, 'drawdownPsi', input.drawdownPsi, 0, MAX);
  checkSample(fn, 'muCp', input.muCp, 0, MAX, true);
  checkSample(fn, 'bo', input.bo, 0, MAX, true);
  checkSample(fn, 'rwFt', input.rwFt, 0, MAX, true);
  checkSample(fn, 'reFt', input.reFt, 0, MAX, true);
  const skin = input.skin ?? 0;
  checkSample(fn, 'skin', skin, -MAX, MAX);
  if (!(input.reFt > input.rwFt)) throw new RangeError(`${fn}: reFt must be > rwFt (got ${input.reFt}, ${input.rwFt})`);
  const denom = Math.log(input.reFt / input.rwFt) - 0.75 + skin;
  if (!(denom > 0)) throw new RangeError(`${fn}: ln(re/rw) - 0.75 + skin must be > 0 (got ${denom})`);
  const j = (RADIAL_FLOW_CONSTANT * input.kMd * input.netPayFt) / (input.muCp * input.bo * denom);
  return { rateStbPerDay: j * input.drawdownPsi, productivityIndex: j };
}

/** Inputs of {@link joshiHorizontalRate}. */
export interface JoshiInput {
  /** Horizontal permeability, md (> 0). */
  khMd: number;
  /** Vertical permeability, md (> 0); default kh (isotropic). */
  kvMd?: number;
  /** Net pay, ft (> 0). */
  netPayFt: number;
  /** Drawdown pe - pwf, psi (>= 0). */
  drawdownPsi: number;
  muCp: number;
  bo: number;
  /** Horizontal (lateral) length L, ft (> 0, L/2 < 0.9 reh). */
  lengthFt: number;
  /** Drainage radius of the horizontal well, ft. */
  rehFt: number;
  rwFt: number;
}

/** Result of {@link joshiHorizontalRate}. */
export interface JoshiResult extends InflowResult {
  /** Half the major axis of the drainage ellipse, ft. */
  aFt: number;
  /** Anisotropy factor beta = sqrt(kh/kv). */
  beta: number;
  /** Steady-state rate of a vertical well in the same drainage radius, STB/d. */
  verticalRateStbPerDay: number;
  /** Productivity ratio Jh / Jv (same reh, drawdown and fluid; both steady state). */
  productivityRatio: number;
}

/**
 * Steady-state oil rate of a horizontal well (Joshi 1988), and its productivity ratio to a
 * vertical well in the same drainage radius:
 *
 *   a = (L/2) [0.5 + sqrt(0.25 + (2 reh / L)^4)]^0.5,   beta = sqrt(kh / kv)
 *   qh = 0.00708 kh h dp / (mu Bo [ln((a + sqrt(a^2 - (L/2)^2)) / (L/2)) + (beta h / L) ln(beta h / (2 rw))])
 *   qv = 0.00708 kh h dp / (mu Bo ln(reh / rw))
 *
 * Source: Joshi, S.D. (1988) Augmentation of well productivity with slant and horizontal wells.
 * JPT 40(6), 729-739. The isotropic form (beta = 1) is the paper's; the anisotropy scaling
 * h -> beta h is written from memory (other printed variants use beta^2 h / L or (beta + 1) rw).
 *
 * @throws RangeError('joshiHorizontalRate: lengthFt/2 must be < 0.9 rehFt ...') and per field
 */
export function joshiHorizontalRate(input: JoshiInput): JoshiResult {
  const fn = 'joshiHorizontalRate';
  for (const k of ['khMd', 'netPayFt', 'muCp', 'bo', 'lengthFt', 'rehFt', 'rwFt'] as const) {
    checkSample(fn, k, input[k], 0, MAX, true);
  }
  checkSample(fn, 'drawdownPsi', input.drawdownPsi, 0, MAX);
  const kv = input.kvMd ?? input.khMd;
  checkSample(fn, 'kvMd', kv, 0, MAX, true);
  const { khMd: kh, netPayFt: h, lengthFt: L, rehFt: reh, rwFt: rw } = input;
  if (!(L / 2 < 0.9 * reh)) throw new RangeError(`${fn}: lengthFt/2 must be < 0.9 rehFt (got L ${L}, reh ${reh})`);
  if (!(reh > rw)) throw new RangeError(`${fn}: rehFt must be > rwFt`);
  const beta = Math.sqrt(kh / kv);
  const half = L / 2;
  const a = half * Math.sqrt(0.5 + Math.sqrt(0.25 + ((2 * reh) / L) ** 4));
  const denomH = Math.log((a + Math.sqrt(a * a - half * half)) / half) + ((beta * h) / L) * Math.log((beta * h) / (2 * rw));
  if (!(denomH > 0)) throw new RangeError(`${fn}: flow resistance term is not positive (${denomH}); check h, L and rw`);
  const c = (RADIAL_FLOW_CONSTANT * kh * h) / (input.muCp * input.bo);
  const jh = c / denomH;
  const jv = c / Math.log(reh / rw);
  return {
    rateStbPerDay: jh * input.drawdownPsi,
    productivityIndex: jh,
    aFt: a,
    beta,
    verticalRateStbPerDay: jv * input.drawdownPsi,
    productivityRatio: jh / jv,
  };
}
