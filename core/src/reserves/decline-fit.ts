import { type ArpsEur, type ArpsKind, type ArpsParams, arpsEur, nominalToEffective } from './decline.js';
import { DAYS_PER_YEAR } from './units-constants.js';

/** Options of {@link fitArpsDecline}. */
export interface ArpsFitOptions {
  kind: ArpsKind;
  /** Upper bound of b for 'hyperbolic' (default 1, Arps' range; at most 2). */
  bMax?: number;
  /** Economic-limit rate per day; when given, the fit also returns the EUR to it (from t = 0). */
  economicLimitRate?: number;
}

/** Result of {@link fitArpsDecline}. */
export interface ArpsFit {
  kind: ArpsKind;
  params: ArpsParams;
  /** Effective (secant) annual decline for the fitted Di and b. */
  diEffectivePerYear: number;
  /** Nominal decline per day (= diNominalPerYear / 365.25). */
  diNominalPerDay: number;
  /** Coefficient of determination of the rate fit, 1 - SSE/SST. */
  rSquared: number;
  /** Root-mean-square rate residual, rate units. */
  rmse: number;
  /** Points used. */
  n: number;
  /** Points skipped because t or q was NaN. */
  skipped: number;
  /** True when Di or b ended at a search bound (check the data). */
  atBound: boolean;
  /** EUR to options.economicLimitRate (see arpsEur), or null when no limit was given. */
  eur: ArpsEur | null;
}

const D_MIN = 1e-7; // per day
const D_MAX = 1; // per day
const GOLD = (Math.sqrt(5) - 1) / 2;

function golden(f: (x: number) => number, a: number, b: number, iters = 80): number {
  let c = b - GOLD * (b - a);
  let d = a + GOLD * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < iters; i++) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLD * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLD * (b - a);
      fd = f(d);
    }
  }
  return (a + b) / 2;
}

/**
 * Least-squares fit of an Arps (1945) decline to rate-time data, minimising the sum of squared
 * RATE residuals sum (q_i - q(t_i))^2 (not log-rate). For given D and b the best qi is linear:
 * qi = sum(q g)/sum(g^2) with g = q(t)/qi; D is found by a log-spaced scan then golden-section
 * refinement over [1e-7, 1] per day, and for 'hyperbolic' b by a scan of [0, bMax] then
 * golden-section refinement. Exponential fixes b = 0, harmonic b = 1. With
 * `economicLimitRate` the EUR to that rate is returned as well (see arpsEur).
 * Source of the model: Arps, J.J. (1945) Trans. AIME 160. Fitting method: ordinary least
 * squares, e.g. Press et al. (2007) Numerical Recipes, 3rd ed., ch. 15. // common practice
 *
 * @param tDays times since the start of the decline, days (>= 0); qi is the fitted rate at t = 0
 * @param rates rates per day (>= 0); pairs with NaN are skipped and counted
 * @throws RangeError('fitArpsDecline: ...') for unequal lengths, too few points (2, or 3 for
 *   hyperbolic), negative t or q, an unknown kind, or all-zero rates; RangeError('arpsEur: ...')
 *   for a bad economic limit
 * @example fitArpsDecline([0, 30, 60, 90], [1000, 960, 921, 884], { kind: 'exponential' })
 */
export function fitArpsDecline(
  tDays: Float64Array | readonly number[],
  rates: Float64Array | readonly number[],
  options: ArpsFitOptions,
): ArpsFit {
  const fn = 'fitArpsDecline';
  const kind = options?.kind;
  if (kind !== 'exponential' && kind !== 'hyperbolic' && kind !== 'harmonic') {
    throw new RangeError(`${fn}: kind must be 'exponential', 'hyperbolic' or 'harmonic' (got ${String(kind)})`);
  }
  const bMax = options.bMax ?? 1;
  if (!(bMax > 0 && bMax <= 2)) throw new RangeError(`${fn}: bMax must be in (0, 2] (got ${bMax})`);
  if (tDays.length !== rates.length) throw new RangeError(`${fn}: tDays and rates must have the same length`);
  const ts: number[] = [];
  const qs: number[] = [];
  let skipped = 0;
  for (let i = 0; i < tDays.length; i++) {
    const t = tDays[i];
    const q = rates[i];
    if (Number.isNaN(t) || Number.isNaN(q)) {
      skipped++;
      continue;
    }
    if (!(t >= 0) || !Number.isFinite(t)) throw new RangeError(`${fn}: tDays[${i}] must be finite and >= 0 (got ${t})`);
    if (!(q >= 0) || !Number.isFinite(q)) throw new RangeError(`${fn}: rates[${i}] must be finite and >= 0 (got ${q})`);
    ts.push(t);
    qs.push(q);
  }
  const n = ts.length;
  const minPoints = kind === 'hyperbolic' ? 3 : 2;
  if (n < minPoints) throw new RangeError(`${fn}: needs at least ${minPoints} points with values (got ${n})`);
  if (qs.every((q) => q === 0)) throw new RangeError(`${fn}: all rates are 0`);
  let tMax = 0;
  for (const t of ts) tMax = Math.max(tMax, t);
  if (!(tMax > 0)) throw new RangeError(`${fn}: tDays must span a positive interval`);

  // Profile SSE over (D per day, b): best qi is linear given the shape g.
  const g = new Float64Array(n);
  const sseAndQi = (d: number, b: number): [number, number] => {
    let sqg = 0;
    let sgg = 0;
    for (let i = 0; i < n; i++) {
      const gi = b === 0 ? Math.exp(-d * ts[i]) : Math.exp(-Math.log1p(b * d * ts[i]) / b);
      g[i] = gi;
      sqg += qs[i] * gi;
      sgg += gi * gi;
    }
    const qi = sqg / sgg;
    let sse = 0;
    for (let i = 0; i < n; i++) {
      const r = qs[i] - qi * g[i];
      sse += r * r;
    }
    return [sse, qi];
  };
  const lnMin = Math.log(D_MIN);
  const lnMax = Math.log(D_MAX);
  const bestD = (b: number): { lnD: number; sse: number } => {
    const steps = 120;
    let bestI = 0;
    let best = Infinity;
    for (let i = 0; i <= steps; i++) {
      const s = sseAndQi(Math.exp(lnMin + ((lnMax - lnMin) * i) / steps), b)[0];
      if (s < best) {
        best = s;
        bestI = i;
      }
    }
    const h = (lnMax - lnMin) / steps;
    const lo = Math.max(lnMin, lnMin + (bestI - 1) * h);
    const hi = Math.min(lnMax, lnMin + (bestI + 1) * h);
    const lnD = golden((x) => sseAndQi(Math.exp(x), b)[0], lo, hi);
    return { lnD, sse: sseAndQi(Math.exp(lnD), b)[0] };
  };

  let b = kind === 'exponential' ? 0 : 1;
  if (kind === 'hyperbolic') {
    const steps = 40;
    let bestJ = 0;
    let best = Infinity;
    for (let j = 0; j <= steps; j++) {
      const s = bestD((bMax * j) / steps).sse;
      if (s < best) {
        best = s;
        bestJ = j;
      }
    }
    const lo = Math.max(0, (bMax * (bestJ - 1)) / steps);
    const hi = Math.min(bMax, (bMax * (bestJ + 1)) / steps);
    b = golden((x) => bestD(x).sse, lo, hi, 50);
    if (b < 1e-9) b = 0;
  }
  const { lnD } = bestD(b);
  const d = Math.exp(lnD);
  const [sse, qi] = sseAndQi(d, b);
  let mean = 0;
  for (const q of qs) mean += q / n;
  let sst = 0;
  for (const q of qs) sst += (q - mean) * (q - mean);
  const diNominalPerYear = d * DAYS_PER_YEAR;
  const params = { qi, diNominalPerYear, b };
  const eur = options.economicLimitRate === undefined ? null : arpsEur(params, options.economicLimitRate);
  const atBound =
    Math.abs(lnD - lnMin) < 1e-6 || Math.abs(lnD - lnMax) < 1e-6 || (kind === 'hyperbolic' && (b === 0 || Math.abs(b - bMax) < 1e-6));
  return {
    kind,
    params,
    diEffectivePerYear: nominalToEffective(diNominalPerYear, b),
    diNominalPerDay: d,
    rSquared: sst > 0 ? 1 - sse / sst : 1,
    rmse: Math.sqrt(sse / n),
    n,
    skipped,
    atBound,
    eur,
  };
}
