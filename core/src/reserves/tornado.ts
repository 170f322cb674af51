import { type Distribution, checkDistribution, distributionQuantile } from './distributions.js';

/** Which values the other inputs hold while one input swings. */
export type TornadoBase = 'p50' | 'base';

/** One bar of a tornado chart. */
export interface TornadoRow<K extends string> {
  input: K;
  /** The input's P90 (PRMS: exceeded with 90% probability, its 10th percentile). */
  inputP90: number;
  /** The input's P10 (exceeded with 10% probability, its 90th percentile). */
  inputP10: number;
  /** Model output with this input at its P90, others at base. */
  outputAtInputP90: number;
  /** Model output with this input at its P10, others at base. */
  outputAtInputP10: number;
  /** Smaller and larger of the two outputs (bar ends). */
  low: number;
  high: number;
  /** |outputAtInputP10 - outputAtInputP90|. */
  swing: number;
}

/** Result of {@link tornado}. */
export interface TornadoResult<K extends string> {
  base: TornadoBase;
  /** The value each input holds when it is not swinging. */
  baseValues: Record<K, number>;
  /** Model output with every input at its base value. */
  baseOutput: number;
  /** Bars, largest swing first (ties keep input order). */
  rows: TornadoRow<K>[];
  /** Plain statement of the method, for display. */
  method: string;
}

/** Options of {@link tornado}. */
export interface TornadoOptions<K extends string> {
  inputs: Readonly<Record<K, Distribution>>;
  /** Scalar model: input values -> output. */
  model: (values: Readonly<Record<K, number>>) => number;
  /**
   * 'p50' (default): others at their own P50 (median). 'base': others at `baseValues`
   * (e.g. the deterministic case).
   */
  base?: TornadoBase;
  /** Required when base is 'base': one value per input. */
  baseValues?: Readonly<Record<K, number>>;
}

/**
 * One-at-a-time sensitivity (tornado): each input is set to its P90 and then its P10 (PRMS
 * exceedance convention: P90 = 10th percentile of the input, P10 = 90th percentile), the other
 * inputs held at their P50 (or at given base values), and the model evaluated. Bars are sorted
 * by swing |output(P10) - output(P90)|. Fixed inputs have zero swing. // common practice
 * (e.g. Murtha, J.A. (1997) Monte Carlo simulation: its status and future, JPT 49(4), SPE 37932;
 * citation from memory).
 *
 * @throws RangeError('tornado: ...') for bad distributions, a missing base value, or a model
 *   returning a non-finite number at the base point
 */
export function tornado<K extends string>(options: TornadoOptions<K>): TornadoResult<K> {
  const fn = 'tornado';
  const { inputs, model } = options;
  const base = options.base ?? 'p50';
  if (base !== 'p50' && base !== 'base') throw new RangeError(`${fn}: base must be 'p50' or 'base' (got ${String(base)})`);
  if (typeof model !== 'function') throw new RangeError(`${fn}: model must be a function`);
  const names = Object.keys(inputs) as K[];
  const baseValues = {} as Record<K, number>;
  for (const k of names) {
    checkDistribution(inputs[k], fn, `inputs.${k}`);
    if (base === 'p50') baseValues[k] = distributionQuantile(inputs[k], 0.5);
    else {
      const v = options.baseValues?.[k];
      if (typeof v !== 'number' || !Number.isFinite(v)) throw new RangeError(`${fn}: baseValues.${k} must be a finite number`);
      baseValues[k] = v;
    }
  }
  const baseOutput = model({ ...baseValues });
  if (!Number.isFinite(baseOutput)) throw new RangeError(`${fn}: model output at the base point is not finite (${baseOutput})`);
  const rows: TornadoRow<K>[] = names.map((k) => {
    const inputP90 = distributionQuantile(inputs[k], 0.1);
    const inputP10 = distributionQuantile(inputs[k], 0.9);
    const outputAtInputP90 = model({ ...baseValues, [k]: inputP90 });
    const outputAtInputP10 = model({ ...baseValues, [k]: inputP10 });
    return {
      input: k,
      inputP90,
      inputP10,
      outputAtInputP90,
      outputAtInputP10,
      low: Math.min(outputAtInputP90, outputAtInputP10),
      high: Math.max(outputAtInputP90, outputAtInputP10),
      swing: Math.abs(outputAtInputP10 - outputAtInputP90),
    };
  });
  rows.sort((a, b) => b.swing - a.swing);
  const method =
    'Each input set to its P90 (10th percentile) and its P10 (90th percentile) in turn, ' +
    (base === 'p50' ? 'other inputs at their P50 (median).' : 'other inputs at the base (deterministic) values.');
  return { base, baseValues, baseOutput, rows, method };
}
