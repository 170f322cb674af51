import { pseudoCriticalSutton } from './pseudo-critical.js';
import {
  STANDARD_CONDITIONS,
  checkStandardConditions,
  fahrenheitToRankine,
  type StandardConditions,
} from './standard-conditions.js';
import { FT3_PER_BBL } from './units-constants.js';
import { requireFinite, requirePositive } from './validate.js';
import { zFactorDak } from './z-factor-dak.js';
import { zFactorHallYarborough } from './z-factor-hall-yarborough.js';

/** The z-factor correlations a user can pick. */
export type ZFactorMethod = 'dak' | 'hall-yarborough';

/** Inputs of {@link gasFvf}. */
export interface GasFvfInput {
  /** Reservoir pressure, psia (> 0). */
  pressurePsia: number;
  /** Reservoir temperature, F. */
  temperatureF: number;
  /** Gas compressibility factor at reservoir conditions (> 0). */
  z: number;
  /** Standard conditions of the scf; default 14.696 psia and 60 F. */
  standard?: StandardConditions;
}

/**
 * Gas formation volume factor Bg: reservoir volume of the gas that occupies one standard
 * cubic foot at standard conditions.
 *
 *   Bg [rcf/scf] = (psc / Tsc) z T / p,   T and Tsc in Rankine (F + 459.67)
 *
 * Source: Craft, B.C., Hawkins, M.F., rev. Terry, R.E. (1991) Applied Petroleum Reservoir
 * Engineering, 2nd ed., ch. 1 (Bg from the real-gas law; with psc = 14.7 psia and Tsc = 520 R
 * the coefficient is the printed 0.02827).
 *
 * @throws RangeError('gasFvf: pressurePsia must be > 0 ...'), likewise z, temperatureF (above
 *   absolute zero) and standard.*
 * @example gasFvf({ pressurePsia: 2000, temperatureF: 150, z: 0.85 }) // 0.0073 rcf/scf
 */
export function gasFvf(input: GasFvfInput): number {
  const sc = input.standard ?? STANDARD_CONDITIONS;
  requirePositive('gasFvf', 'pressurePsia', input.pressurePsia);
  requirePositive('gasFvf', 'z', input.z);
  requireFinite('gasFvf', 'temperatureF', input.temperatureF);
  checkStandardConditions('gasFvf', sc);
  const tR = fahrenheitToRankine(input.temperatureF);
  if (!(tR > 0)) throw new RangeError(`gasFvf: temperatureF must be above absolute zero (got ${input.temperatureF})`);
  return ((sc.pressurePsia / fahrenheitToRankine(sc.temperatureF)) * input.z * tR) / input.pressurePsia;
}

/** Inputs of {@link gasPvt}. */
export interface GasPvtInput {
  pressurePsia: number;
  temperatureF: number;
  /** Gas specific gravity, air = 1. */
  gasGravity: number;
  /** z-factor correlation; default 'dak'. */
  zMethod?: ZFactorMethod;
  standard?: StandardConditions;
}

/** Result of {@link gasPvt}: every intermediate, so the UI can show the chain. */
export interface GasPvtResult {
  tpcR: number;
  ppcPsia: number;
  tpr: number;
  ppr: number;
  z: number;
  zMethod: ZFactorMethod;
  /** Bg, reservoir cubic feet per scf. */
  bgRcfPerScf: number;
  /** Bg, reservoir barrels per scf (rcf / 5.614583). */
  bgRbPerScf: number;
  /** Gas expansion factor Eg = 1/Bg, scf per reservoir cubic foot. */
  egScfPerRcf: number;
  standard: StandardConditions;
}

/**
 * Gas PVT chain for a dry/sweet gas: Sutton (1985) pseudo-criticals from gas gravity, reduced
 * properties Tpr = T/Tpc and Ppr = p/Ppc, z by the chosen correlation (Dranchuk & Abou-Kassem
 * 1975 or Hall & Yarborough 1973), then Bg by {@link gasFvf}.
 *
 * @throws RangeError from each step, naming the function and field (e.g. a Tpr outside [1, 3])
 * @example gasPvt({ pressurePsia: 3000, temperatureF: 180, gasGravity: 0.7 }).z // 0.8705
 */
export function gasPvt(input: GasPvtInput): GasPvtResult {
  requirePositive('gasPvt', 'pressurePsia', input.pressurePsia);
  requireFinite('gasPvt', 'temperatureF', input.temperatureF);
  const zMethod = input.zMethod ?? 'dak';
  if (zMethod !== 'dak' && zMethod !== 'hall-yarborough') {
    throw new RangeError(`gasPvt: zMethod must be 'dak' or 'hall-yarborough' (got ${String(zMethod)})`);
  }
  const standard = input.standard ?? STANDARD_CONDITIONS;
  const { tpcR, ppcPsia } = pseudoCriticalSutton(input.gasGravity);
  const tpr = fahrenheitToRankine(input.temperatureF) / tpcR;
  const ppr = input.pressurePsia / ppcPsia;
  const z = zMethod === 'dak' ? zFactorDak(tpr, ppr) : zFactorHallYarborough(tpr, ppr);
  const bgRcfPerScf = gasFvf({ pressurePsia: input.pressurePsia, temperatureF: input.temperatureF, z, standard });
  return {
    tpcR,
    ppcPsia,
    tpr,
    ppr,
    z,
    zMethod,
    bgRcfPerScf,
    bgRbPerScf: bgRcfPerScf / FT3_PER_BBL,
    egScfPerRcf: 1 / bgRcfPerScf,
    standard: { ...standard },
  };
}
