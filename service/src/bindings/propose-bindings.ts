import { BINDING_CLASSES, BINDING_KEYS, type BindingKey } from './binding-keys.js';

/** A curve of one of the well's log runs, as the proposal sees it. */
export interface CandidateCurve {
  logRunId: string;
  mnemonic: string;
  curveClass: string | null;
  /** Samples with a value (row count minus nulls). */
  valueCount: number;
  /** False when the curve's unit is not a unit of its class's quantity (it is then never proposed). */
  unitFits: boolean;
}

/**
 * The reader's proposal: for each binding key, the curve of the key's class (with a unit that
 * fits it) with the most samples holding a value; on a tie the first in `curves` order (earlier run, earlier curve).
 * Keys with no curve of their class are absent.
 *
 * @example proposeBindings([{ logRunId: 'r1', mnemonic: 'GR', curveClass: 'gamma_ray', valueCount: 900, unitFits: true }]).get('gr')?.mnemonic // 'GR'
 */
export function proposeBindings<C extends CandidateCurve>(curves: readonly C[]): Map<BindingKey, C> {
  const out = new Map<BindingKey, C>();
  for (const key of BINDING_KEYS) {
    let best: C | undefined;
    for (const c of curves) {
      if (c.curveClass !== BINDING_CLASSES[key] || !c.unitFits) continue;
      if (!best || c.valueCount > best.valueCount) best = c;
    }
    if (best) out.set(key, best);
  }
  return out;
}
