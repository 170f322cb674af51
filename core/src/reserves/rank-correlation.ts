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
 * Ranks of the values, 1 to n, ties given their average rank (NaN ranks NaN, and then the
 * others are not 1 to n). The order comes
 * from an LSD radix sort of the values' bit patterns made unsigned-sortable (sign bit set for
 * positives, all bits flipped for negatives: the IEEE 754 total order), four passes of 16 bits:
 * about 3x faster than sorting a copy and binary-searching each value (bench/montecarlo.bench.ts).
 */
export function ranks(x: Float64Array): Float64Array {
  const n = x.length;
  const words = new Uint32Array(Float64Array.from(x).buffer); // little-endian: [2i] low, [2i + 1] high
  const lo = new Uint32Array(n);
  const hi = new Uint32Array(n);
  for (let i = 0; i < n; i++) {
    const h = words[2 * i + 1];
    if (h & 0x80000000) {
      hi[i] = ~h >>> 0;
      lo[i] = ~words[2 * i] >>> 0;
    } else {
      hi[i] = (h | 0x80000000) >>> 0;
      lo[i] = words[2 * i];
    }
  }
  let idx = new Uint32Array(n);
  for (let i = 0; i < n; i++) idx[i] = i;
  let tmp = new Uint32Array(n);
  const count = new Uint32Array(65537);
  for (let pass = 0; pass < 4; pass++) {
    const key = pass < 2 ? lo : hi;
    const shift = pass % 2 === 0 ? 0 : 16;
    count.fill(0);
    for (let k = 0; k < n; k++) count[((key[k] >>> shift) & 0xffff) + 1]++;
    if (count[((key[0] >>> shift) & 0xffff) + 1] === n) continue; // every value has this digit
    for (let d = 1; d <= 65536; d++) count[d] += count[d - 1];
    for (let k = 0; k < n; k++) {
      const i = idx[k];
      tmp[count[(key[i] >>> shift) & 0xffff]++] = i;
    }
    const t = idx;
    idx = tmp;
    tmp = t;
  }
  const out = new Float64Array(n);
  for (let k = 0; k < n; ) {
    const v = x[idx[k]];
    if (Number.isNaN(v)) {
      out[idx[k++]] = Number.NaN; // NaN sorts first or last by its sign bit; its rank is NaN
      continue;
    }
    let j = k + 1;
    while (j < n && x[idx[j]] === v) j++; // -0 and +0 are adjacent and equal
    const r = (k + 1 + j) / 2; // average of ranks k+1 .. j
    for (let m = k; m < j; m++) out[idx[m]] = r;
    k = j;
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
