import { newtonBracketed } from './root-find.js';
import { requireInRange } from './validate.js';

/**
 * Gas compressibility factor z by the Hall & Yarborough (Starling-Carnahan) equation.
 *
 *   t = 1/Tpr,  A = 0.06125 t exp(-1.2 (1 - t)^2)
 *   solve  -A Ppr + (y + y^2 + y^3 - y^4)/(1 - y)^3 - (14.76 t - 9.76 t^2 + 4.58 t^3) y^2
 *          + (90.7 t - 242.2 t^2 + 42.4 t^3) y^(2.18 + 2.82 t) = 0   for the reduced density y,
 *   then z = A Ppr / y.
 * Solved by safeguarded Newton iteration on 0 < y < 1 (to 1e-13 relative).
 *
 * Source: Hall, K.R., Yarborough, L. (1973) A new equation of state for Z-factor calculations.
 * Oil & Gas Journal 71(25), 82-92 (fitted to the Standing & Katz 1942 chart; the authors advise
 * against Tpr < 1). The fitted range 1.2 <= Tpr <= 3, 0.1 <= Ppr <= 24 is from memory; between
 * Tpr 1.0 and 1.2 the result is accepted but departs from DAK by up to about 0.02.
 *
 * @param tpr pseudo-reduced temperature, dimensionless, in [1.0, 3.0]
 * @param ppr pseudo-reduced pressure, dimensionless, in [0, 24] (z = 1 at Ppr = 0)
 * @returns z, dimensionless
 * @throws RangeError('zFactorHallYarborough: tpr must be in [1, 3] ...') and likewise for ppr
 * @example zFactorHallYarborough(1.5, 2.0) // 0.8208 (Standing-Katz chart 0.822)
 */
export function zFactorHallYarborough(tpr: number, ppr: number): number {
  requireInRange('zFactorHallYarborough', 'tpr', tpr, 1.0, 3.0);
  requireInRange('zFactorHallYarborough', 'ppr', ppr, 0, 24);
  if (ppr === 0) return 1;
  const t = 1 / tpr;
  const a = 0.06125 * t * Math.exp(-1.2 * (1 - t) * (1 - t));
  const b = t * (14.76 - 9.76 * t + 4.58 * t * t);
  const c = t * (90.7 - 242.2 * t + 42.4 * t * t);
  const d = 2.18 + 2.82 * t;
  const ap = a * ppr;
  const f = (y: number): number => {
    const y2 = y * y;
    const om = 1 - y;
    return -ap + (y + y2 + y2 * y - y2 * y2) / (om * om * om) - b * y2 + c * Math.pow(y, d);
  };
  const df = (y: number): number => {
    const y2 = y * y;
    const om = 1 - y;
    return (1 + 4 * y + 4 * y2 - 4 * y2 * y + y2 * y2) / (om * om * om * om) - 2 * b * y + c * d * Math.pow(y, d - 1);
  };
  const y = newtonBracketed('zFactorHallYarborough', f, df, ap / 1000, 1 - 1e-12, Math.min(ap, 0.5));
  return ap / y;
}
