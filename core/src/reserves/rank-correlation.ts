/**
 * Dependence between Monte Carlo inputs, stated as rank (Spearman) correlations and drawn
 * through a Gaussian copula: each input keeps its own distribution; the standard normal scores
 * of the inputs' uniforms are mixed by the Cholesky factor of a correlation matrix, then turned
 * back into uniforms and sampled by inversion as before.
 *
 * A rank correlation survives every increasing transform, so the Spearman correlation asked for
 * is the one the inputs get, whatever their distributions, once it is converted to the normal
 * (Pearson) correlation of the scores: rho = 2 sin(pi rho_s / 6) (Kruskal, W.H. (1958) Ordinal
 * measures of association, J. Am. Stat. Assoc. 53, 814-861; the relation goes back to Pearson,
 * K. (1907)). Generating a random vector with given marginals and correlations this way is the
 * NORTA method (Cario, M.C., Nelson, B.L. (1997) Modeling and generating random vectors with
 * arbitrary marginal distributions and correlation matrix, Northwestern University).
 */
import { normalCdf, normalQuantileFast } from './normal.js';

/** A rank (Spearman) correlation between two named inputs, in (-1, 1). */
export interface InputCorrelation<K extends string = string> {
  a: K;
  b: K;
  rank: number;
}

/** Largest |rank correlation| accepted (1 would make two inputs one). */
export const MAX_RANK_CORRELATION = 0.99;

/**
 * Pearson correlation of two standard normal scores whose rank (Spearman) correlation is
 * `rank`: 2 sin(pi rank / 6) (Kruskal 1958). Odd, increasing, fixes 0 and +-1.
 *
 * @example normalCorrelationForRank(0.5) // 0.5176380902050415
 */
export function normalCorrelationForRank(rank: number): number {
  return 2 * Math.sin((Math.PI * rank) / 6);
}

/**
 * Lower Cholesky factor L of a symmetric matrix (L L^T = m), rows as arrays.
 *
 * @throws RangeError when the matrix is not positive definite
 */
export function choleskyLower(m: readonly (readonly number[])[]): number[][] {
  const n = m.length;
  const l = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = m[i][j];
      for (let k = 0; k < j; k++) s -= l[i][k] * l[j][k];
      if (i === j) {
        if (!(s > 1e-12)) throw new RangeError('choleskyLower: the matrix is not positive definite');
        l[i][i] = Math.sqrt(s);
      } else {
        l[i][j] = s / l[j][j];
      }
    }
  }
  return l;
}

/**
 * Checks correlations against the input names: known, distinct, not fixed, each pair once,
 * |rank| <= {@link MAX_RANK_CORRELATION}. Errors name the entry: `correlations[1].rank ...`.
 */
export function checkCorrelations(correlations: readonly InputCorrelation[], names: readonly string[], fixed: ReadonlySet<string>, fn: string): void {
  if (!Array.isArray(correlations)) throw new RangeError(`${fn}: correlations must be a list`);
  const seen = new Set<string>();
  correlations.forEach((c, i) => {
    const at = `${fn}: correlations[${i}]`;
    if (!c || typeof c !== 'object') throw new RangeError(`${at} must be { a, b, rank }`);
    for (const side of ['a', 'b'] as const) {
      if (!names.includes(c[side])) throw new RangeError(`${at}.${side} must be one of ${names.join(', ')} (got ${String(c[side])})`);
      if (fixed.has(c[side])) throw new RangeError(`${at}.${side}: ${c[side]} is fixed; give it a distribution to correlate it`);
    }
    if (c.a === c.b) throw new RangeError(`${at}: a and b must be two different inputs (both ${c.a})`);
    if (typeof c.rank !== 'number' || !Number.isFinite(c.rank) || Math.abs(c.rank) > MAX_RANK_CORRELATION) {
      throw new RangeError(`${at}.rank must be a number in [-${MAX_RANK_CORRELATION}, ${MAX_RANK_CORRELATION}] (got ${String(c.rank)})`);
    }
    const key = [c.a, c.b].sort().join('~');
    if (seen.has(key)) throw new RangeError(`${at}: the pair ${c.a} and ${c.b} is given twice`);
    seen.add(key);
  });
}

/** Largest uniform below 1 on the 2^-53 grid (what fillUniform can return). */
const U_MAX = 1 - 2 ** -53;
const HALF = 2 ** -54;

/**
 * Makes the uniforms of the named inputs dependent, in place: scores z = Phi^-1(u + 2^-54),
 * mixed per trial by the Cholesky factor of the normal correlations (from the rank
 * correlations, 1 on the diagonal, 0 for pairs not given), back to u = Phi(z'). Inputs not in
 * any correlation are untouched, so their samples stay those of an independent run.
 *
 * @param uniforms one array of draws in [0, 1) per input name (all the same length)
 * @throws RangeError naming `fn` when the correlations cannot hold together (matrix not
 *   positive definite)
 */
export function correlateUniforms(uniforms: Record<string, Float64Array>, correlations: readonly InputCorrelation[], fn: string): void {
  if (correlations.length === 0) return;
  const group = [...new Set(correlations.flatMap((c) => [c.a, c.b]))];
  const k = group.length;
  const m: number[][] = Array.from({ length: k }, (_, i) => Array.from({ length: k }, (_, j) => (i === j ? 1 : 0)));
  for (const c of correlations) {
    const i = group.indexOf(c.a);
    const j = group.indexOf(c.b);
    m[i][j] = m[j][i] = normalCorrelationForRank(c.rank);
  }
  let l: number[][];
  try {
    l = choleskyLower(m);
  } catch {
    throw new RangeError(
      `${fn}: the correlations contradict each other (${group.join(', ')}): no set of inputs can have them all at once (the correlation matrix is not positive definite); weaken the strongest ones`,
    );
  }
  const cols = group.map((name) => uniforms[name]);
  const n = cols[0].length;
  const z = new Float64Array(k);
  for (let t = 0; t < n; t++) {
    for (let i = 0; i < k; i++) z[i] = normalQuantileFast(cols[i][t] + HALF);
    // z' = L z (z holds this trial's original scores throughout)
    for (let i = 0; i < k; i++) {
      const row = l[i];
      let s = 0;
      for (let j = 0; j <= i; j++) s += row[j] * z[j];
      cols[i][t] = Math.min(U_MAX, normalCdf(s));
    }
  }
}

/**
 * Ranks of the values, 1 to n, ties given their average rank (NaN ranks NaN): a sorted copy
 * and two binary searches per value.
 */
export function ranks(x: Float64Array): Float64Array {
  const sorted = Float64Array.from(x).sort(); // typed-array sort: numeric, NaN last
  let finite = sorted.length;
  while (finite > 0 && Number.isNaN(sorted[finite - 1])) finite--;
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (Number.isNaN(v)) {
      out[i] = Number.NaN;
      continue;
    }
    let lo = 0;
    let hi = finite;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (sorted[mid] < v) lo = mid + 1;
      else hi = mid;
    }
    let up = lo;
    let top = finite;
    while (up < top) {
      const mid = (up + top) >>> 1;
      if (sorted[mid] <= v) up = mid + 1;
      else top = mid;
    }
    out[i] = (lo + 1 + up) / 2; // average of ranks lo+1 .. up
  }
  return out;
}

/**
 * Sample rank (Spearman) correlation: the Pearson correlation of the ranks, ties averaged.
 * Same value as simple-statistics' sampleRankCorrelation (checked in the test), which is too
 * slow for 100,000 trials inside a case run (bench/montecarlo.bench.ts).
 *
 * @throws RangeError when the arrays differ in length or hold fewer than 2 values
 */
export function sampleRankCorrelation(x: Float64Array, y: Float64Array): number {
  if (x.length !== y.length || x.length < 2) throw new RangeError('sampleRankCorrelation: x and y must have the same length, at least 2');
  const rx = ranks(x);
  const ry = ranks(y);
  const n = rx.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += rx[i];
    my += ry[i];
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = rx[i] - mx;
    const dy = ry[i] - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  return sxy / Math.sqrt(sxx * syy);
}
