import { Z_P10, normalCdf, normalQuantile, normalQuantileFast } from './normal.js';

/** Optional truncation of a distribution to [min, max] (either end may be omitted). */
export interface Truncation {
  min?: number;
  max?: number;
}

/**
 * A Monte Carlo input distribution. Lognormal inputs are given by the arithmetic mean and
 * standard deviation of the variable, or by its P90 and P10 (PRMS 2018 convention: P90 is the
 * low value, exceeded with 90% probability = the 10th percentile). Every kind except 'fixed'
 * accepts a truncation; samples are then drawn from the distribution conditioned on the range.
 */
export type Distribution =
  | { kind: 'fixed'; value: number }
  | { kind: 'uniform'; min: number; max: number; truncate?: Truncation }
  | { kind: 'triangular'; min: number; mode: number; max: number; truncate?: Truncation }
  | { kind: 'normal'; mean: number; sd: number; truncate?: Truncation }
  | { kind: 'lognormal'; mean: number; sd: number; truncate?: Truncation }
  | { kind: 'lognormal'; p90: number; p10: number; truncate?: Truncation };

/** Parameters of ln X ~ N(mu, sigma^2). */
export interface LognormalParams {
  mu: number;
  sigma: number;
}

/** A lognormal's parameters with its arithmetic moments and PRMS percentiles, for display. */
export interface LognormalSummary extends LognormalParams {
  mean: number;
  sd: number;
  /** Value exceeded with 90% probability (10th percentile). */
  p90: number;
  p50: number;
  /** Value exceeded with 10% probability (90th percentile). */
  p10: number;
}

/**
 * Lognormal parameters from the arithmetic mean m and standard deviation s of the variable:
 *   sigma^2 = ln(1 + s^2/m^2),  mu = ln(m) - sigma^2/2
 * Source: Aitchison, J., Brown, J.A.C. (1957) The Lognormal Distribution, ch. 2 (moments
 * E[X] = exp(mu + sigma^2/2), Var[X] = (exp(sigma^2) - 1) exp(2 mu + sigma^2)). // from memory
 *
 * @throws RangeError('lognormalFromMeanSd: mean must be > 0 ...'), likewise sd
 * @example lognormalFromMeanSd(100, 30) // { mu: 4.56208, sigma: 0.29356 }
 */
export function lognormalFromMeanSd(mean: number, sd: number): LognormalParams {
  if (!(mean > 0) || !Number.isFinite(mean)) throw new RangeError(`lognormalFromMeanSd: mean must be > 0 (got ${mean})`);
  if (!(sd > 0) || !Number.isFinite(sd)) throw new RangeError(`lognormalFromMeanSd: sd must be > 0 (got ${sd})`);
  const sigma2 = Math.log1p((sd * sd) / (mean * mean));
  return { mu: Math.log(mean) - sigma2 / 2, sigma: Math.sqrt(sigma2) };
}

/**
 * Lognormal parameters from P90 (low, 10th percentile) and P10 (high, 90th percentile):
 *   mu = (ln P90 + ln P10)/2,  sigma = (ln P10 - ln P90) / (2 z0.9),  z0.9 = 1.2815515655446004
 * (PRMS 2018 exceedance convention; z from the standard normal table).
 *
 * @throws RangeError('lognormalFromP90P10: p90 must be > 0 and < p10 ...')
 * @example lognormalFromP90P10(50, 200) // { mu: ln 100, sigma: 0.5409 }
 */
export function lognormalFromP90P10(p90: number, p10: number): LognormalParams {
  if (!(p90 > 0) || !Number.isFinite(p90)) throw new RangeError(`lognormalFromP90P10: p90 must be > 0 (got ${p90})`);
  if (!(p10 > p90) || !Number.isFinite(p10)) {
    throw new RangeError(`lognormalFromP90P10: p10 must be > p90 (P90 is the low value; got p90 ${p90}, p10 ${p10})`);
  }
  const l90 = Math.log(p90);
  const l10 = Math.log(p10);
  return { mu: (l90 + l10) / 2, sigma: (l10 - l90) / (2 * Z_P10) };
}

/**
 * Mean, standard deviation and P90/P50/P10 of a lognormal with parameters mu, sigma
 * (inverse of the two conversions above, so the UI can show either form).
 *
 * @throws RangeError('lognormalSummary: sigma must be > 0 ...')
 * @example lognormalSummary({ mu: Math.log(100), sigma: 0.5 }).p50 // 100
 */
export function lognormalSummary(params: LognormalParams): LognormalSummary {
  const { mu, sigma } = params;
  if (!Number.isFinite(mu)) throw new RangeError(`lognormalSummary: mu must be finite (got ${mu})`);
  if (!(sigma > 0) || !Number.isFinite(sigma)) throw new RangeError(`lognormalSummary: sigma must be > 0 (got ${sigma})`);
  const mean = Math.exp(mu + (sigma * sigma) / 2);
  return {
    mu,
    sigma,
    mean,
    sd: mean * Math.sqrt(Math.expm1(sigma * sigma)),
    p90: Math.exp(mu - Z_P10 * sigma),
    p50: Math.exp(mu),
    p10: Math.exp(mu + Z_P10 * sigma),
  };
}

/** A distribution checked and reduced to what sampling needs. */
interface Prepared {
  kind: 'fixed' | 'uniform' | 'triangular' | 'normal' | 'lognormal';
  /** fixed: value; uniform/triangular: min; normal: mean; lognormal: mu */
  a: number;
  /** uniform/triangular: max; normal: sd; lognormal: sigma */
  b: number;
  /** triangular: mode */
  c: number;
  /** probability range kept by truncation */
  pLo: number;
  pHi: number;
  /** truncation bounds in value space (-Infinity / Infinity when none) */
  xLo?: number;
  xHi?: number;
}

function fail(fn: string, field: string, msg: string): never {
  throw new RangeError(`${fn}: ${field} ${msg}`);
}

function finite(fn: string, field: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) fail(fn, field, `must be a finite number (got ${String(v)})`);
  return v;
}

function cdf(d: Prepared, x: number): number {
  switch (d.kind) {
    case 'fixed':
      return x < d.a ? 0 : 1;
    case 'uniform':
      return Math.min(1, Math.max(0, (x - d.a) / (d.b - d.a)));
    case 'triangular': {
      const { a, b, c } = d;
      if (x <= a) return 0;
      if (x >= b) return 1;
      return x <= c ? ((x - a) * (x - a)) / ((b - a) * (c - a)) : 1 - ((b - x) * (b - x)) / ((b - a) * (b - c));
    }
    case 'normal':
      return normalCdf((x - d.a) / d.b);
    case 'lognormal':
      return x <= 0 ? 0 : normalCdf((Math.log(x) - d.a) / d.b);
  }
}

/**
 * Checks a distribution and resolves its parameters. `fn`/`field` name the caller and input
 * in errors, e.g. "runMonteCarlo: inputs.porosity.sd must be > 0".
 */
function prepare(d: Distribution, fn: string, field: string): Prepared {
  if (d === null || typeof d !== 'object') fail(fn, field, 'must be a distribution object');
  let p: Prepared;
  switch (d.kind) {
    case 'fixed':
      return { kind: 'fixed', a: finite(fn, `${field}.value`, d.value), b: 0, c: 0, pLo: 0, pHi: 1 };
    case 'uniform': {
      const a = finite(fn, `${field}.min`, d.min);
      const b = finite(fn, `${field}.max`, d.max);
      if (!(b > a)) fail(fn, `${field}.max`, `must be > min (got min ${a}, max ${b})`);
      p = { kind: 'uniform', a, b, c: 0, pLo: 0, pHi: 1 };
      break;
    }
    case 'triangular': {
      const a = finite(fn, `${field}.min`, d.min);
      const c = finite(fn, `${field}.mode`, d.mode);
      const b = finite(fn, `${field}.max`, d.max);
      if (!(b > a)) fail(fn, `${field}.max`, `must be > min (got min ${a}, max ${b})`);
      if (c < a || c > b) fail(fn, `${field}.mode`, `must be in [min, max] (got ${c})`);
      p = { kind: 'triangular', a, b, c, pLo: 0, pHi: 1 };
      break;
    }
    case 'normal': {
      const m = finite(fn, `${field}.mean`, d.mean);
      const s = finite(fn, `${field}.sd`, d.sd);
      if (!(s > 0)) fail(fn, `${field}.sd`, `must be > 0 (got ${s})`);
      p = { kind: 'normal', a: m, b: s, c: 0, pLo: 0, pHi: 1 };
      break;
    }
    case 'lognormal': {
      let lp: LognormalParams;
      if ('p90' in d) {
        const p90 = finite(fn, `${field}.p90`, d.p90);
        const p10 = finite(fn, `${field}.p10`, d.p10);
        if (!(p90 > 0)) fail(fn, `${field}.p90`, `must be > 0 (got ${p90})`);
        if (!(p10 > p90)) fail(fn, `${field}.p10`, `must be > p90 (P90 is the low value; got p90 ${p90}, p10 ${p10})`);
        lp = lognormalFromP90P10(p90, p10);
      } else {
        const m = finite(fn, `${field}.mean`, d.mean);
        const s = finite(fn, `${field}.sd`, d.sd);
        if (!(m > 0)) fail(fn, `${field}.mean`, `must be > 0 (got ${m})`);
        if (!(s > 0)) fail(fn, `${field}.sd`, `must be > 0 (got ${s})`);
        lp = lognormalFromMeanSd(m, s);
      }
      p = { kind: 'lognormal', a: lp.mu, b: lp.sigma, c: 0, pLo: 0, pHi: 1 };
      break;
    }
    default:
      fail(fn, `${field}.kind`, `must be fixed, uniform, triangular, normal or lognormal (got ${String((d as { kind: unknown }).kind)})`);
  }
  const t = d.truncate;
  if (t !== undefined) {
    const lo = t.min === undefined ? -Infinity : finite(fn, `${field}.truncate.min`, t.min);
    const hi = t.max === undefined ? Infinity : finite(fn, `${field}.truncate.max`, t.max);
    if (!(hi > lo)) fail(fn, `${field}.truncate.max`, `must be > truncate.min (got ${lo}, ${hi})`);
    p.pLo = lo === -Infinity ? 0 : cdf(p, lo);
    p.pHi = hi === Infinity ? 1 : cdf(p, hi);
    p.xLo = lo;
    p.xHi = hi;
    if (!(p.pHi - p.pLo > 1e-12)) fail(fn, `${field}.truncate`, 'leaves no probability in range');
  }
  return p;
}

function quantileOf(d: Prepared, p: number, fast: boolean): number {
  const x = unclampedQuantile(d, p, fast);
  // A bound far out in a tail has F(bound) rounding to 0 or 1, so the inverse there is
  // infinite; the truncated distribution's quantile never leaves [xLo, xHi].
  return d.xLo === undefined ? x : Math.min(d.xHi!, Math.max(d.xLo, x));
}

function unclampedQuantile(d: Prepared, p: number, fast: boolean): number {
  const q = d.pLo + p * (d.pHi - d.pLo);
  switch (d.kind) {
    case 'fixed':
      return d.a;
    case 'uniform':
      return d.a + q * (d.b - d.a);
    case 'triangular': {
      const { a, b, c } = d;
      const fc = (c - a) / (b - a);
      return q < fc ? a + Math.sqrt(q * (b - a) * (c - a)) : b - Math.sqrt((1 - q) * (b - a) * (b - c));
    }
    case 'normal':
      return d.a + d.b * (fast ? normalQuantileFast(q) : normalQuantile(q));
    case 'lognormal':
      return Math.exp(d.a + d.b * (fast ? normalQuantileFast(q) : normalQuantile(q)));
  }
}

/**
 * Checks a distribution; throws a RangeError naming `fn` and the field (e.g.
 * "runMonteCarlo: porosity.sd must be > 0") or returns silently.
 */
export function checkDistribution(d: Distribution, fn = 'checkDistribution', field = 'distribution'): void {
  prepare(d, fn, field);
}

/**
 * Quantile (inverse CDF) of a distribution, after truncation: the value with cumulative
 * probability p. Note PRMS naming: the input's "P90" is distributionQuantile(d, 0.1).
 *
 *   uniform    a + p (b - a)
 *   triangular a + sqrt(p (b-a)(c-a)) for p < (c-a)/(b-a), else b - sqrt((1-p)(b-a)(b-c))
 *   normal     mean + sd z(p);   lognormal exp(mu + sigma z(p))
 * With truncation to [lo, hi], p is first mapped to F(lo) + p (F(hi) - F(lo)).
 *
 * @throws RangeError('distributionQuantile: p must be in [0, 1]') or naming a bad field
 * @example distributionQuantile({ kind: 'triangular', min: 0, mode: 1, max: 2 }, 0.5) // 1
 */
export function distributionQuantile(d: Distribution, p: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`distributionQuantile: p must be in [0, 1] (got ${p})`);
  return quantileOf(prepare(d, 'distributionQuantile', 'distribution'), p, false);
}

/**
 * Maps uniform draws u in [0, 1) to samples of `d` by inversion (one uniform per sample, so
 * each input's samples depend only on its own stream). Draws are shifted by 2^-54 to lie
 * strictly inside (0, 1), so unbounded distributions never return an infinite value.
 * Normal quantiles use Acklam's approximation (relative error < 1.15e-9).
 *
 * @param uniforms draws in [0, 1) (not modified)
 * @param output optional array to write into (length >= uniforms.length)
 * @returns a new Float64Array (or `output`)
 * @throws RangeError naming `fn` and `field` for an invalid distribution
 */
export function sampleDistribution(
  d: Distribution,
  uniforms: Float64Array | readonly number[],
  output?: Float64Array,
  fn = 'sampleDistribution',
  field = 'distribution',
): Float64Array {
  const pd = prepare(d, fn, field);
  const n = uniforms.length;
  const out = output ?? new Float64Array(n);
  if (out.length < n) throw new RangeError(`${fn}: output is shorter than uniforms`);
  const half = 5.551115123125783e-17; // 2^-54
  const lo = pd.pLo;
  const span = pd.pHi - pd.pLo;
  switch (pd.kind) {
    case 'fixed':
      out.fill(pd.a, 0, n);
      break;
    case 'uniform': {
      const a = pd.a + lo * (pd.b - pd.a);
      const w = span * (pd.b - pd.a);
      for (let i = 0; i < n; i++) out[i] = a + (uniforms[i] + half) * w;
      break;
    }
    case 'triangular': {
      const { a, b, c } = pd;
      const fc = (c - a) / (b - a);
      const left = (b - a) * (c - a);
      const right = (b - a) * (b - c);
      for (let i = 0; i < n; i++) {
        const q = lo + (uniforms[i] + half) * span;
        out[i] = q < fc ? a + Math.sqrt(q * left) : b - Math.sqrt((1 - q) * right);
      }
      break;
    }
    case 'normal':
      for (let i = 0; i < n; i++) out[i] = pd.a + pd.b * normalQuantileFast(lo + (uniforms[i] + half) * span);
      break;
    case 'lognormal':
      for (let i = 0; i < n; i++) out[i] = Math.exp(pd.a + pd.b * normalQuantileFast(lo + (uniforms[i] + half) * span));
      break;
  }
  if (pd.xLo !== undefined && (pd.kind === 'normal' || pd.kind === 'lognormal')) {
    const xLo = pd.xLo;
    const xHi = pd.xHi!;
    for (let i = 0; i < n; i++) out[i] = Math.min(xHi, Math.max(xLo, out[i]));
  }
  return out;
}
