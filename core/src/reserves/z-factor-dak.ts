import { newtonBracketed } from './root-find.js';
import { requireInRange } from './validate.js';

// Dranchuk & Abou-Kassem (1975), Table 1: the eleven constants fitted to 1,500 points of the
// Standing-Katz chart.
const A1 = 0.3265;
const A2 = -1.07;
const A3 = -0.5339;
const A4 = 0.01569;
const A5 = -0.05165;
const A6 = 0.5475;
const A7 = -0.7361;
const A8 = 0.1844;
const A9 = 0.1056;
const A10 = 0.6134;
const A11 = 0.721;

/**
 * Gas compressibility factor z by the Dranchuk & Abou-Kassem equation of state.
 *
 *   z = 1 + (A1 + A2/Tr + A3/Tr^3 + A4/Tr^4 + A5/Tr^5) rho + (A6 + A7/Tr + A8/Tr^2) rho^2
 *       - A9 (A7/Tr + A8/Tr^2) rho^5 + A10 (1 + A11 rho^2) (rho^2/Tr^3) exp(-A11 rho^2)
 *   with the reduced density rho = 0.27 Ppr / (z Tpr),
 * solved for rho by safeguarded Newton iteration (to 1e-13 relative).
 *
 * Source: Dranchuk, P.M., Abou-Kassem, J.H. (1975) Calculation of z factors for natural gases
 * using equations of state. J. Can. Pet. Technol. 14(3), 34-36 (fitted to the Standing & Katz
 * 1942 chart for 1.0 < Tpr <= 3.0, 0.2 <= Ppr < 30; average absolute error about 0.5%).
 *
 * @param tpr pseudo-reduced temperature T/Tpc, dimensionless, in [1.0, 3.0]
 * @param ppr pseudo-reduced pressure p/Ppc, dimensionless, in [0, 30] (z = 1 at Ppr = 0)
 * @returns z, dimensionless
 * @throws RangeError('zFactorDak: tpr must be in [1, 3] ...') and likewise for ppr
 * @example zFactorDak(1.5, 2.0) // 0.8215 (Standing-Katz chart 0.822)
 */
export function zFactorDak(tpr: number, ppr: number): number {
  requireInRange('zFactorDak', 'tpr', tpr, 1.0, 3.0);
  requireInRange('zFactorDak', 'ppr', ppr, 0, 30);
  if (ppr === 0) return 1;
  const t = tpr;
  const r1 = A1 + A2 / t + A3 / t ** 3 + A4 / t ** 4 + A5 / t ** 5;
  const r2 = (0.27 * ppr) / t;
  const r3 = A6 + A7 / t + A8 / (t * t);
  const r4 = A9 * (A7 / t + A8 / (t * t));
  const r5 = A10 / t ** 3;
  // F(rho) = z_eos(rho) - r2/rho; increasing from -inf at rho -> 0.
  const f = (rho: number): number => {
    const rr = rho * rho;
    return 1 + r1 * rho - r2 / rho + r3 * rr - r4 * rr * rr * rho + r5 * rr * (1 + A11 * rr) * Math.exp(-A11 * rr);
  };
  const df = (rho: number): number => {
    const rr = rho * rho;
    return (
      r1 + r2 / rr + 2 * r3 * rho - 5 * r4 * rr * rr + 2 * r5 * rho * Math.exp(-A11 * rr) * (1 + A11 * rr - A11 * A11 * rr * rr)
    );
  };
  // Bracket: z between 0.05 and 5 covers the chart (0.25 < z < 2 for Tpr >= 1, Ppr <= 30).
  const rho = newtonBracketed('zFactorDak', f, df, r2 / 5, r2 / 0.05, r2);
  return r2 / rho;
}
