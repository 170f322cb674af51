// Monte Carlo reserves benchmark: 100,000 trials x 6 inputs (goal <= 100 ms in Node).
// Prints ours against a reference (pure-rand draws) and a floor (the least any implementation
// must do: 600k raw draws, the model, one sort), measured in the same run. Median of RUNS runs
// after WARM warm-up runs, ours and the reference interleaved so both see the same machine load;
// the first (cold, un-optimised) run is shown separately. BENCH_NO_GC=1 skips the forced GC per run.
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { skipN } from 'pure-rand/utils/skipN';
import { runMonteCarlo } from '../src/reserves/monte-carlo.js';
import { fillUniform, streamSeed } from '../src/reserves/random.js';
import { sampleRankCorrelation } from '../src/reserves/rank-correlation.js';
import { sampleRankCorrelation as ssRankCorrelation } from 'simple-statistics';
import { type ReservesCaseInput, evaluateReservesCase } from '../src/reserves/reserves-case.js';

const TRIALS = 100_000;
const WARM = 10;
const RUNS = 15;
const NAMES = ['area', 'netPay', 'porosity', 'sw', 'bo', 'recoveryFactor'] as const;

const CASE: ReservesCaseInput = {
  fluid: 'oil',
  area: 640,
  areaUnit: 'acre',
  netPay: 30,
  porosity: 0.2,
  sw: 0.25,
  recoveryFactor: 0.3,
  bo: 1.2,
  distributions: {
    area: { kind: 'triangular', min: 400, mode: 640, max: 900 },
    netPay: { kind: 'lognormal', p90: 20, p10: 45 },
    porosity: { kind: 'normal', mean: 0.2, sd: 0.03, truncate: { min: 0.05, max: 0.35 } },
    sw: { kind: 'uniform', min: 0.2, max: 0.4 },
    bo: { kind: 'triangular', min: 1.1, mode: 1.2, max: 1.35 },
    recoveryFactor: { kind: 'lognormal', mean: 0.3, sd: 0.05, truncate: { max: 0.7 } },
  },
  monteCarlo: { trials: TRIALS, seed: 20240601 },
};

const gc = process.env.BENCH_NO_GC ? () => {} : ((globalThis as { gc?: () => void }).gc ?? (() => {}));

function time(fn: () => unknown): number {
  gc();
  const t = performance.now();
  fn();
  return performance.now() - t;
}

type Stats = { cold: number; median: number; min: number };

/** Times `a` and `b` interleaved (a, b, a, b, ...) so both see the same machine load. */
function measurePair(a: () => unknown, b: () => unknown): [Stats, Stats] {
  const coldA = time(a);
  const coldB = time(b);
  for (let i = 0; i < WARM; i++) {
    time(a);
    time(b);
  }
  const xa: number[] = [];
  const xb: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    xa.push(time(a));
    xb.push(time(b));
  }
  const st = (xs: number[], cold: number): Stats => {
    xs.sort((p, q) => p - q);
    return { cold, median: xs[Math.floor(xs.length / 2)], min: xs[0] };
  };
  return [st(xa, coldA), st(xb, coldB)];
}

// --- uniform draws: ours (fillUniform) vs pure-rand (reference package, same sequence) ---
const bufs = NAMES.map(() => new Float64Array(TRIALS));
const oursDraws = () => NAMES.forEach((n, k) => fillUniform(streamSeed(1, n), bufs[k]));
const pureDraws = () =>
  NAMES.forEach((n, k) => {
    const rng = xoroshiro128plus(streamSeed(1, n));
    skipN(rng, 16);
    const b = bufs[k];
    for (let i = 0; i < TRIALS; i++) b[i] = uniformFloat64(rng);
  });
// Same sequence check before timing.
const check = fillUniform(streamSeed(1, 'area'), new Float64Array(1000));
const ref = xoroshiro128plus(streamSeed(1, 'area'));
skipN(ref, 16);
for (let i = 0; i < 1000; i++) if (check[i] !== uniformFloat64(ref)) throw new Error(`draw ${i} differs from pure-rand`);

// --- floor: raw draws + model over uniform inputs + one sort ---
const floor = () => {
  const u = NAMES.map((n) => fillUniform(streamSeed(2, n), new Float64Array(TRIALS)));
  const out = new Float64Array(TRIALS);
  for (let i = 0; i < TRIALS; i++) {
    out[i] = (7758 * (400 + 500 * u[0][i]) * (20 + 25 * u[1][i]) * (0.1 + 0.2 * u[2][i]) * (0.8 - 0.2 * u[3][i]) * (0.2 + 0.2 * u[5][i])) / (1.1 + 0.25 * u[4][i]);
  }
  out.sort();
  return out[TRIALS >> 1];
};

// --- ours: sampling + model only, and the whole case ---
const model = (s: Record<(typeof NAMES)[number], Float64Array>, n: number) => {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = (7758.37 * s.area[i] * s.netPay[i] * s.porosity[i] * (1 - s.sw[i]) * s.recoveryFactor[i]) / s.bo[i];
  return out;
};
const mcOnly = () => runMonteCarlo({ inputs: CASE.distributions as Required<NonNullable<ReservesCaseInput['distributions']>>, model, trials: TRIALS, seed: 1 });
const wholeCase = () => evaluateReservesCase(CASE);

const rows: [string, Stats, string, Stats][] = [];
const pair = (a: string, fa: () => unknown, b: string, fb: () => unknown) => {
  const [ma, mb] = measurePair(fa, fb);
  rows.push([a, ma, b, mb]);
};
pair('600k uniform draws, fillUniform (ours)', oursDraws, 'pure-rand xoroshiro128plus + uniformFloat64', pureDraws);
pair('runMonteCarlo: sample 6 inputs + model', mcOnly, 'floor: raw draws + model + 1 sort', floor);
pair('evaluateReservesCase (MC, 2 outputs, stats, tornado)', wholeCase, 'floor: raw draws + model + 1 sort', floor);
// Correlated inputs: porosity with Sw and area with net pay (Gaussian copula), the whole case again.
const CORRELATED: ReservesCaseInput = { ...CASE, correlations: [{ a: 'porosity', b: 'sw', rank: -0.5 }, { a: 'area', b: 'netPay', rank: 0.3 }] };
pair('evaluateReservesCase with 2 rank correlations', () => evaluateReservesCase(CORRELATED), 'evaluateReservesCase, independent inputs', wholeCase);
// The sample rank correlation of 100,000 pairs: ours (sort + binary search) against simple-statistics.
const rx = fillUniform(streamSeed(3, 'x'), new Float64Array(TRIALS));
const noise = fillUniform(streamSeed(3, 'y'), new Float64Array(TRIALS));
const ry = rx.map((v, i) => v + 0.5 * noise[i]);
const rxArr = Array.from(rx);
const ryArr = Array.from(ry);
pair('sampleRankCorrelation (ours), 100,000 pairs', () => sampleRankCorrelation(rx, ry), 'simple-statistics sampleRankCorrelation', () => ssRankCorrelation(rxArr, ryArr));

const r = evaluateReservesCase(CASE).probabilistic!.recoverable.field;
console.log(`Monte Carlo benchmark, ${TRIALS.toLocaleString('en')} trials x 6 inputs, Node ${process.version}; median of ${RUNS} after ${WARM} warm-up (cold = first run)`);
console.log('| ours | ms median / min / cold | reference or floor | ms median / min / cold | ours / ref (median) |');
console.log('|---|---|---|---|---|');
for (const [a, ma, b, mb] of rows) {
  const f = (m: Stats) => `${m.median.toFixed(1)} / ${m.min.toFixed(1)} / ${m.cold.toFixed(1)}`;
  console.log(`| ${a} | ${f(ma)} | ${b} | ${f(mb)} | ${(ma.median / mb.median).toFixed(2)} |`);
}
console.log(`goal <= 100 ms for the whole case: ${rows[2][1].median <= 100 ? 'met' : 'NOT met'} (median ${rows[2][1].median.toFixed(1)} ms, min ${rows[2][1].min.toFixed(1)} ms)`);
console.log(`machine load average (1 min): ${(await import('node:os')).loadavg()[0].toFixed(2)} on ${(await import('node:os')).cpus().length} CPUs`);
console.log(`recoverable P90 / P50 / P10 = ${r.p90.toExponential(4)} / ${r.p50.toExponential(4)} / ${r.p10.toExponential(4)} STB`);
