import { requireInRange } from './validate.js';

/** Pseudo-critical temperature and pressure of a natural gas. */
export interface PseudoCritical {
  /** Pseudo-critical temperature, degrees Rankine. */
  tpcR: number;
  /** Pseudo-critical pressure, psia. */
  ppcPsia: number;
}

/**
 * Pseudo-critical properties of a hydrocarbon gas from its specific gravity (air = 1).
 *
 *   Tpc [R]    = 169.2 + 349.5 g - 74.0 g^2
 *   Ppc [psia] = 756.8 - 131.0 g - 3.6 g^2
 *
 * Source: Sutton, R.P. (1985) Compressibility factors for high-molecular-weight reservoir
 * gases. SPE 14265 (fitted for 0.57 < g < 1.68). No correction for CO2, H2S or N2 is applied
 * (Wichert-Aziz is not included); use it for sweet gases.
 *
 * @param gasGravity gas specific gravity relative to air, accepted in [0.55, 1.8]
 * @throws RangeError('pseudoCriticalSutton: gasGravity must be in [0.55, 1.8] ...')
 * @example pseudoCriticalSutton(0.65) // { tpcR: 365.11, ppcPsia: 670.13 }
 */
export function pseudoCriticalSutton(gasGravity: number): PseudoCritical {
  requireInRange('pseudoCriticalSutton', 'gasGravity', gasGravity, 0.55, 1.8);
  const g = gasGravity;
  return {
    tpcR: 169.2 + 349.5 * g - 74.0 * g * g,
    ppcPsia: 756.8 - 131.0 * g - 3.6 * g * g,
  };
}
