import { DAYS_PER_YEAR } from './units-constants.js';

/** Arps decline types. Exponential is b = 0, harmonic b = 1, hyperbolic 0 < b (< 1 classically). */
export type ArpsKind = 'exponential' | 'hyperbolic' | 'harmonic';

/**
 * Arps decline parameters. Time is in days and rates per day; the decline rate is stated as a
 * NOMINAL (instantaneous) rate per year of 365.25 days. Use {@link nominalToEffective} for the
 * effective (secant) annual decline.
 */
export interface ArpsParams {
  /** Rate at t = 0, volume per day (> 0). */
  qi: number;
  /** Initial nominal decline rate Di, 1/year (> 0). */
  diNominalPerYear: number;
  /** Arps exponent b in [0, 2] (0 exponential, 1 harmonic; > 1 is outside Arps 1945). */
  b: number;
}

const FN_RATE = 'arpsRate';

function checkParams(fn: string, p: ArpsParams): void {
  if (!(p.qi > 0) || !Number.isFinite(p.qi)) throw new RangeError(`${fn}: qi must be > 0 (got ${p.qi})`);
  if (!(p.diNominalPerYear > 0) || !Number.isFinite(p.diNominalPerYear)) {
    throw new RangeError(`${fn}: diNominalPerYear must be > 0 (got ${p.diNominalPerYear})`);
  }
  if (!(p.b >= 0 && p.b <= 2)) throw new RangeError(`${fn}: b must be in [0, 2] (got ${p.b})`);
}

/** ln(q(t)/qi) = -ln(1 + b D t)/b, with its b -> 0 limit -D t (D per day). */
function logRatio(b: number, d: number, t: number): number {
  return b === 0 ? -d * t : -Math.log1p(b * d * t) / b;
}

/**
 * Arps (1945) rate at time t.
 *
 *   q = qi exp(-D t)              b = 0 (exponential)
 *   q = qi / (1 + b D t)^(1/b)    0 < b (hyperbolic; b = 1 harmonic: qi / (1 + D t))
 * with D = diNominalPerYear / 365.25 per day. Evaluated as qi exp(-log1p(b D t)/b), which is
 * continuous as b -> 0.
 * Source: Arps, J.J. (1945) Analysis of decline curves. Trans. AIME 160, 228-247.
 *
 * @param tDays time since qi, days (>= 0; NaN passes through)
 * @throws RangeError('arpsRate: qi must be > 0 ...'), likewise diNominalPerYear, b, tDays < 0
 * @example arpsRate({ qi: 1000, diNominalPerYear: 0.5, b: 0 }, 730.5) // 367.9 (= 1000 e^-1)
 */
export function arpsRate(params: ArpsParams, tDays: number): number {
  checkParams(FN_RATE, params);
  if (tDays < 0) throw new RangeError(`${FN_RATE}: tDays must be >= 0 (got ${tDays})`);
  return params.qi * Math.exp(logRatio(params.b, params.diNominalPerYear / DAYS_PER_YEAR, tDays));
}

/**
 * {@link arpsRate} over an array of times; returns a new Float64Array (NaN passes through).
 */
export function arpsRates(params: ArpsParams, tDays: Float64Array | readonly number[]): Float64Array {
  checkParams('arpsRates', params);
  const d = params.diNominalPerYear / DAYS_PER_YEAR;
  const out = new Float64Array(tDays.length);
  for (let i = 0; i < tDays.length; i++) {
    if (tDays[i] < 0) throw new RangeError(`arpsRates: tDays[${i}] must be >= 0 (got ${tDays[i]})`);
    out[i] = params.qi * Math.exp(logRatio(params.b, d, tDays[i]));
  }
  return out;
}

/**
 * Arps (1945) cumulative production from 0 to t (volume; rate per day x days).
 *
 *   Np = (qi - q) / D                                   b = 0
 *   Np = qi / ((1 - b) D) [1 - (q/qi)^(1-b)]            0 < b, b != 1
 *   Np = (qi / D) ln(qi / q)                            b = 1
 * The general form is evaluated with expm1 as qi/((1-b)D) * -expm1((1-b) ln(q/qi)), which is
 * continuous through b = 1 (and b -> 0). D is the nominal decline per day.
 *
 * @throws RangeError as {@link arpsRate}
 * @example arpsCumulative({ qi: 1000, diNominalPerYear: 0.5, b: 1 }, 365.25) // (1000/D) ln 1.5
 */
export function arpsCumulative(params: ArpsParams, tDays: number): number {
  checkParams('arpsCumulative', params);
  if (tDays < 0) throw new RangeError(`arpsCumulative: tDays must be >= 0 (got ${tDays})`);
  const { qi, b } = params;
  const d = params.diNominalPerYear / DAYS_PER_YEAR;
  const lr = logRatio(b, d, tDays); // ln(q/qi) <= 0
  if (b === 0) return (qi * -Math.expm1(lr)) / d;
  if (b === 1) return (qi / d) * -lr;
  return (qi / ((1 - b) * d)) * -Math.expm1((1 - b) * lr);
}

/**
 * Time for the Arps rate to fall from qi to q (days):
 *   t = ln(qi/q) / D (b = 0);   t = ((qi/q)^b - 1) / (b D) (b > 0)
 *
 * @throws RangeError('arpsTimeToRate: rate must be > 0 ...')
 */
export function arpsTimeToRate(params: ArpsParams, rate: number): number {
  checkParams('arpsTimeToRate', params);
  if (!(rate > 0)) throw new RangeError(`arpsTimeToRate: rate must be > 0 (got ${rate})`);
  if (rate >= params.qi) return 0;
  const d = params.diNominalPerYear / DAYS_PER_YEAR;
  const l = Math.log(params.qi / rate);
  return params.b === 0 ? l / d : Math.expm1(params.b * l) / (params.b * d);
}

/** Result of {@link arpsEur}. */
export interface ArpsEur {
  /** Estimated ultimate recovery: cumulativeBefore + Np from t = 0 to the economic limit. */
  eur: number;
  /** Production from t = 0 to the economic limit. */
  remaining: number;
  /** Time from t = 0 until the rate reaches the economic limit, days. */
  tLimitDays: number;
  economicLimitRate: number;
}

/**
 * EUR to an economic-limit rate: Np at the time the Arps rate falls to `economicLimitRate`,
 * plus any production before t = 0. If the limit is at or above qi the remaining volume is 0.
 *
 * @param economicLimitRate rate per day (> 0)
 * @param cumulativeBefore production before t = 0 (default 0)
 * @throws RangeError('arpsEur: economicLimitRate must be > 0 ...')
 * @example arpsEur({ qi: 1000, diNominalPerYear: 0.5, b: 0 }, 100).remaining // (1000-100)/D
 */
export function arpsEur(params: ArpsParams, economicLimitRate: number, cumulativeBefore = 0): ArpsEur {
  checkParams('arpsEur', params);
  if (!(economicLimitRate > 0) || !Number.isFinite(economicLimitRate)) {
    throw new RangeError(`arpsEur: economicLimitRate must be > 0 (got ${economicLimitRate})`);
  }
  if (!(cumulativeBefore >= 0)) throw new RangeError(`arpsEur: cumulativeBefore must be >= 0 (got ${cumulativeBefore})`);
  const tLimitDays = arpsTimeToRate(params, economicLimitRate);
  const remaining = arpsCumulative(params, tLimitDays);
  return { eur: cumulativeBefore + remaining, remaining, tLimitDays, economicLimitRate };
}

/**
 * Effective (secant) annual decline from the nominal one: the fraction of rate lost over one
 * year, De = 1 - q(1 yr)/qi.
 *   De = 1 - exp(-Di)  (b = 0);   De = 1 - (1 + b Di)^(-1/b)  (b > 0)
 * // common practice (secant effective decline, as used in reserves reporting)
 *
 * @param diNominalPerYear nominal decline, 1/year (> 0)
 * @throws RangeError('nominalToEffective: ...')
 * @example nominalToEffective(0.5, 0) // 0.3935
 */
export function nominalToEffective(diNominalPerYear: number, b: number): number {
  if (!(diNominalPerYear > 0)) throw new RangeError(`nominalToEffective: diNominalPerYear must be > 0 (got ${diNominalPerYear})`);
  if (!(b >= 0 && b <= 2)) throw new RangeError(`nominalToEffective: b must be in [0, 2] (got ${b})`);
  return -Math.expm1(logRatio(b, diNominalPerYear, 1));
}

/**
 * Nominal annual decline from the effective (secant) one, inverse of {@link nominalToEffective}:
 *   Di = -ln(1 - De)  (b = 0);   Di = ((1 - De)^(-b) - 1) / b  (b > 0)
 *
 * @param effectivePerYear fraction in (0, 1)
 * @throws RangeError('effectiveToNominal: ...')
 * @example effectiveToNominal(0.3935, 0) // 0.5
 */
export function effectiveToNominal(effectivePerYear: number, b: number): number {
  if (!(effectivePerYear > 0 && effectivePerYear < 1)) {
    throw new RangeError(`effectiveToNominal: effectivePerYear must be in (0, 1) (got ${effectivePerYear})`);
  }
  if (!(b >= 0 && b <= 2)) throw new RangeError(`effectiveToNominal: b must be in [0, 2] (got ${b})`);
  const l = -Math.log1p(-effectivePerYear); // ln(1/(1-De))
  return b === 0 ? l : Math.expm1(b * l) / b;
}
