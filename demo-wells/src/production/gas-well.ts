/**
 * Production of the demo gas well (WM-1, Fenna Sand): a volumetric, depletion-drive gas
 * reservoir produced by one well, so its p/z falls on the straight line of the gas material
 * balance and the gas in place it gives is the model's volumetric OGIP.
 *
 * - Material balance, no water influx: p/z = (pi/zi) (1 - Gp/G) (Craft & Hawkins 1991,
 *   ch. 1, volumetric gas reservoir).
 * - z from core (Sutton 1985 pseudo-criticals, Dranchuk & Abou-Kassem 1975).
 * - Deliverability by the back-pressure equation q = C (pR^2 - pwf^2)^n (Rawlins, E.L.,
 *   Schellhardt, M.A. (1936) Back-pressure data on natural-gas wells and their application
 *   to production practices. U.S. Bureau of Mines Monograph 7), with a constant flowing
 *   bottom-hole pressure; stepped one producing day at a time.
 * Model choices: n = 0.85, pwf = 600 psia, initial rate 8,000 Mscf/d, water yield 2 bbl/MMscf,
 * 0-3 days of downtime a month and one 12-day workover, static surveys every 6 months with
 * gauge noise sd 4 psi.
 */
import { pseudoCriticalSutton, zFactorDak } from '@poreline/core';
import { createRandom } from '../random.js';
import { daysInMonth, monthLabel } from './calendar.js';

export interface GasWellInput {
  well: string;
  /** Gas in place the well drains, scf. */
  gasInPlaceScf: number;
  initialPressurePsia: number;
  temperatureF: number;
  gasGravity: number;
  /** Datum of the pressures, ft TVDSS. */
  datumTvdss: number;
  startYear: number;
  startMonth: number;
  months: number;
  seed: number;
}

export interface GasMonth {
  month: string;
  daysOn: number;
  gasMscf: number;
  waterBbl: number;
}

export interface StaticPressure {
  /** First day of the month of the survey (YYYY-MM-01). */
  date: string;
  /** Cumulative gas at the survey, MMscf (sum of the monthly volumes before it). */
  cumGasMmscf: number;
  pressurePsia: number;
}

export interface GasWellProduction {
  input: GasWellInput;
  zi: number;
  backPressure: { c: number; n: number; pwfPsia: number };
  monthly: GasMonth[];
  pressures: StaticPressure[];
}

const N_EXP = 0.85;
const PWF = 600;
const QI_MSCFD = 8000;

/** z at pressure p (psia). */
function zAt(p: number, tR: number, ppc: number, tpc: number): number {
  return zFactorDak(tR / tpc, p / ppc);
}

/**
 * Pressure whose p/z equals `target`: secant iteration from `guess` (p/z rises smoothly with p
 * here), to 1e-9 psi; bisection on [14.7, pMax] if the secant leaves the bracket.
 */
function pressureFromPz(target: number, guess: number, pMax: number, tR: number, ppc: number, tpc: number): number {
  const f = (p: number) => p / zAt(p, tR, ppc, tpc) - target;
  let p0 = guess;
  let p1 = guess * 0.999;
  let f0 = f(p0);
  for (let k = 0; k < 50; k++) {
    const f1 = f(p1);
    if (f1 === 0 || Math.abs(p1 - p0) < 1e-9) return p1;
    const p2 = p1 - (f1 * (p1 - p0)) / (f1 - f0);
    if (!(p2 > 14.7 && p2 < pMax)) break;
    p0 = p1;
    f0 = f1;
    p1 = p2;
  }
  let lo = 14.7;
  let hi = pMax;
  for (let k = 0; k < 100; k++) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** Simulates the gas well month by month. */
export function gasWellProduction(input: GasWellInput): GasWellProduction {
  const { tpcR, ppcPsia } = pseudoCriticalSutton(input.gasGravity);
  const tR = input.temperatureF + 459.67;
  const pi = input.initialPressurePsia;
  const zi = zAt(pi, tR, ppcPsia, tpcR);
  const pzi = pi / zi;
  const c = QI_MSCFD / Math.pow(pi * pi - PWF * PWF, N_EXP);
  const rng = createRandom(input.seed, `${input.well}/downtime`);
  const noise = createRandom(input.seed, `${input.well}/gauge`);
  const G = input.gasInPlaceScf / 1000; // Mscf
  let gp = 0; // Mscf, exact
  let p = pi;
  let gpReported = 0; // Mscf, sum of rounded monthly volumes
  const monthly: GasMonth[] = [];
  const pressures: StaticPressure[] = [];
  const workoverMonth = 31;
  for (let k = 0; k < input.months; k++) {
    const m = monthLabel(input.startYear, input.startMonth, k);
    if (k % 6 === 0) {
      p = pressureFromPz(pzi * (1 - gp / G), p, pi * 1.01, tR, ppcPsia, tpcR);
      pressures.push({ date: `${m.label}-01`, cumGasMmscf: gpReported / 1000, pressurePsia: Math.round(p + noise.normal(0, 4)) });
    }
    const days = daysInMonth(m.year, m.month);
    const down = k === workoverMonth ? 12 : Math.floor(rng.uniform() * 4);
    const daysOn = days - down;
    let vol = 0;
    for (let d = 0; d < daysOn; d++) {
      p = pressureFromPz(pzi * (1 - gp / G), p, pi * 1.01, tR, ppcPsia, tpcR);
      const q = p > PWF ? c * Math.pow(p * p - PWF * PWF, N_EXP) : 0;
      vol += q;
      gp += q;
    }
    const gasMscf = Math.round(vol);
    gpReported += gasMscf;
    monthly.push({ month: m.label, daysOn, gasMscf, waterBbl: Math.round((2 * gasMscf) / 1000) });
  }
  return { input, zi, backPressure: { c, n: N_EXP, pwfPsia: PWF }, monthly, pressures };
}
