/**
 * Clamping to a physical range, counted (never hidden): the evaluation records how many
 * samples were pulled to each bound so a zone summary can report them.
 */
import { type CurveInput, outputFor } from './curve-util.js';

export interface ClampResult {
  values: Float64Array;
  /** Samples raised to `min`. */
  belowCount: number;
  /** Samples lowered to `max`. */
  aboveCount: number;
}

/**
 * Clamps each finite sample to [min, max] (NaN stays NaN; +-Infinity is clamped and counted).
 * Throws RangeError when min > max.
 * @example clampCurve([-0.1, 0.5, 1.2], 0, 1) // { values: [0, 0.5, 1], belowCount: 1, aboveCount: 1 }
 */
export function clampCurve(values: CurveInput, min: number, max: number, output?: Float64Array): ClampResult {
  const fn = 'clampCurve';
  if (!(min <= max)) throw new RangeError(`${fn}: min must be <= max`);
  const out = outputFor(fn, values.length, output);
  let belowCount = 0;
  let aboveCount = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v < min) {
      out[i] = min;
      belowCount++;
    } else if (v > max) {
      out[i] = max;
      aboveCount++;
    } else out[i] = v;
  }
  return { values: out, belowCount, aboveCount };
}
