/**
 * Production of the demo oil well (WM-4, Wren Sand oil leg): monthly volumes from an Arps
 * hyperbolic decline whose ultimate recovery is a recovery factor times the oil in place of
 * the well's drainage area (from the model's own net pay, porosity and Sw at WM-4).
 *
 * - Arps (1945) Trans. AIME 160: q(t) = qi / (1 + b Di t)^(1/b);
 *   Np(t) = qi / ((1 - b) Di) [1 - (1 + b Di t)^(1 - 1/b)];
 *   Np at the economic limit q_el: qi^b / ((1 - b) Di) (qi^(1-b) - q_el^(1-b)),
 *   solved here for Di so that it equals the target EUR. t counts producing days.
 * Model choices: drainage area 160 acres, recovery factor 0.25, qi 1,100 STB/d, b 0.5,
 * economic limit 25 STB/d, GOR held at the solution GOR (no free-gas production modelled),
 * water cut 3% rising linearly with Np/EUR to 38%, 0-2 days of downtime a month.
 */
import { createRandom } from '../random.js';
import { daysInMonth, monthLabel } from './calendar.js';

export interface OilWellInput {
  well: string;
  /** Oil in place of the drainage area, STB. */
  drainedOilInPlaceStb: number;
  recoveryFactor: number;
  gorScfPerStb: number;
  startYear: number;
  startMonth: number;
  months: number;
  seed: number;
}

export interface OilMonth {
  month: string;
  daysOn: number;
  oilStb: number;
  gasMscf: number;
  waterBbl: number;
}

export interface OilWellProduction {
  input: OilWellInput;
  decline: { qiStbd: number; b: number; diPerDay: number; economicLimitStbd: number; eurStb: number };
  monthly: OilMonth[];
}

export const OIL_QI = 1100;
export const OIL_B = 0.5;
export const OIL_QEL = 25;

/** Arps hyperbolic cumulative at producing time t (days). */
export function arpsHyperbolicCumulative(qi: number, di: number, b: number, t: number): number {
  return (qi / ((1 - b) * di)) * (1 - Math.pow(1 + b * di * t, 1 - 1 / b));
}

/** Simulates the oil well month by month. */
export function oilWellProduction(input: OilWellInput): OilWellProduction {
  const eur = input.recoveryFactor * input.drainedOilInPlaceStb;
  const qi = OIL_QI;
  const b = OIL_B;
  const di = (Math.pow(qi, b) * (Math.pow(qi, 1 - b) - Math.pow(OIL_QEL, 1 - b))) / ((1 - b) * eur);
  const rng = createRandom(input.seed, `${input.well}/downtime`);
  let t = 0;
  const monthly: OilMonth[] = [];
  for (let k = 0; k < input.months; k++) {
    const m = monthLabel(input.startYear, input.startMonth, k);
    const daysOn = daysInMonth(m.year, m.month) - Math.floor(rng.uniform() * 3);
    const np0 = arpsHyperbolicCumulative(qi, di, b, t);
    t += daysOn;
    const np1 = arpsHyperbolicCumulative(qi, di, b, t);
    const oil = np1 - np0;
    const wc = 0.03 + 0.35 * (np1 / eur);
    monthly.push({
      month: m.label,
      daysOn,
      oilStb: Math.round(oil),
      gasMscf: Math.round((oil * input.gorScfPerStb) / 1000),
      waterBbl: Math.round((oil * wc) / (1 - wc)),
    });
  }
  return { input, decline: { qiStbd: qi, b, diPerDay: di, economicLimitStbd: OIL_QEL, eurStb: eur }, monthly };
}
