import { type Distribution, sampleDistribution } from './distributions.js';
import { fillUniform, streamSeed } from './random.js';
import { checkCorrelations, correlateUniforms, type InputCorrelation } from './rank-correlation.js';

/** Largest number of trials accepted in one run. */
export const MAX_TRIALS = 5_000_000;

/**
 * A vectorised model: receives one Float64Array of samples per input (all of length `trials`)
 * and returns the output samples (a Float64Array of the same length). Must not modify inputs.
 */
export type VectorModel<K extends string> = (samples: Readonly<Record<K, Float64Array>>, trials: number) => Float64Array;

/** Options of {@link runMonteCarlo}. */
export interface MonteCarloOptions<K extends string> {
  /** One distribution per input name. */
  inputs: Readonly<Record<K, Distribution>>;
  /** Vectorised model (see {@link perTrial} to wrap a scalar function). */
  model: VectorModel<K>;
  /** Number of trials, integer in [1, 5,000,000]. */
  trials: number;
  /** Seed stored with the case, an integer (low 32 bits used); the same seed gives the same run. */
  seed: number;
  /** Rank correlations between inputs (default none: independent inputs). */
  correlations?: readonly InputCorrelation<K>[];
}

/** Result of {@link runMonteCarlo}. */
export interface MonteCarloRun<K extends string> {
  seed: number;
  trials: number;
  /** The sampled inputs, one array per input. */
  samples: Record<K, Float64Array>;
  /** Model output per trial. */
  output: Float64Array;
}

function checkTrialsSeed(fn: string, trials: number, seed: number): void {
  if (!Number.isInteger(trials) || trials < 1 || trials > MAX_TRIALS) {
    throw new RangeError(`${fn}: trials must be an integer in [1, ${MAX_TRIALS}] (got ${trials})`);
  }
  if (!Number.isInteger(seed) || Math.abs(seed) > 2 ** 53) throw new RangeError(`${fn}: seed must be an integer (got ${seed})`);
}

/**
 * Samples every input: each input has its own xoroshiro128+ stream seeded by
 * streamSeed(seed, name), drawn by inversion (one uniform per trial). Inputs are independent
 * unless `correlations` ties some of them (rank correlations through a Gaussian copula, see
 * rank-correlation.ts); inputs in no correlation get the very samples of an independent run.
 *
 * @throws RangeError naming the input, e.g. 'sampleInputs: inputs.porosity.sd must be > 0 ...',
 *   or the correlation entry, e.g. 'sampleInputs: correlations[0].rank must be ...'
 */
export function sampleInputs<K extends string>(
  inputs: Readonly<Record<K, Distribution>>,
  trials: number,
  seed: number,
  fn = 'sampleInputs',
  correlations: readonly InputCorrelation<NoInfer<K>>[] = [],
): Record<K, Float64Array> {
  checkTrialsSeed(fn, trials, seed);
  if (inputs === null || typeof inputs !== 'object') throw new RangeError(`${fn}: inputs must be an object of distributions`);
  const names = Object.keys(inputs) as K[];
  const fixed = new Set<string>(names.filter((k) => inputs[k]?.kind === 'fixed'));
  checkCorrelations(correlations, names, fixed, fn);
  const tied = new Set<string>(correlations.flatMap((c) => [c.a, c.b]));
  // Correlated inputs need their uniforms side by side; the others share one buffer.
  const own: Record<string, Float64Array> = {};
  for (const name of names) if (tied.has(name)) own[name] = fillUniform(streamSeed(seed, name), new Float64Array(trials));
  correlateUniforms(own, correlations, fn);
  const out = {} as Record<K, Float64Array>;
  const u = new Float64Array(trials);
  for (const name of names) {
    const d = inputs[name];
    const x = new Float64Array(trials);
    if (d && d.kind === 'fixed') sampleDistribution(d, u, x, fn, `inputs.${name}`);
    else sampleDistribution(d, own[name] ?? fillUniform(streamSeed(seed, name), u), x, fn, `inputs.${name}`);
    out[name] = x;
  }
  return out;
}

/**
 * Monte Carlo simulation with a stored seed: samples each input's distribution `trials` times
 * (see {@link sampleInputs}) and evaluates the vectorised model over the sample arrays.
 * Reproducible: the same inputs, trials and seed give identical output on every run and
 * platform (integer generator, deterministic inversion).
 *
 * @throws RangeError('runMonteCarlo: trials must be an integer in [1, 5000000] ...'), a bad
 *   seed, a bad distribution (naming the input), or a model output of the wrong length
 * @example
 *   runMonteCarlo({ inputs: { a: { kind: 'uniform', min: 1, max: 2 } },
 *     model: (s) => s.a.map((v) => 2 * v), trials: 1000, seed: 42 })
 */
export function runMonteCarlo<K extends string>(options: MonteCarloOptions<K>): MonteCarloRun<K> {
  const { inputs, model, trials, seed, correlations } = options;
  if (typeof model !== 'function') throw new RangeError('runMonteCarlo: model must be a function');
  const samples = sampleInputs(inputs, trials, seed, 'runMonteCarlo', correlations);
  const output = model(samples, trials);
  if (!(output instanceof Float64Array) || output.length !== trials) {
    throw new RangeError(`runMonteCarlo: model must return a Float64Array of length trials (${trials})`);
  }
  return { seed, trials, samples, output };
}

/**
 * Wraps a scalar model (one trial's input values -> one output) as a {@link VectorModel}.
 * Convenient, but slower than writing the loop over arrays directly.
 *
 * @example perTrial<'a' | 'b'>((v) => v.a * v.b)
 */
export function perTrial<K extends string>(fn: (values: Readonly<Record<K, number>>) => number): VectorModel<K> {
  return (samples, trials) => {
    const names = Object.keys(samples) as K[];
    const values = {} as Record<K, number>;
    const out = new Float64Array(trials);
    for (let i = 0; i < trials; i++) {
      for (const k of names) values[k] = samples[k][i];
      out[i] = fn(values);
    }
    return out;
  };
}
