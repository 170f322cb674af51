import { useMemo } from 'react';
import type { Cutoffs, WorkbenchDto } from '../../../types/workbench';
import type { MergedSamples } from '../api/get-merged-samples';
import { applyLiveCutoffs, evaluateBase, sensitivityFor, type BaseEvaluation } from '../utils/live-evaluation';
import { useAnimationFrameValue } from './use-animation-frame-value';

export interface LiveEvaluation {
  /** Curves from evaluateWell (null while not evaluable). */
  base: BaseEvaluation | null;
  /** Why the well cannot be evaluated yet (core's message names zone and field). */
  error: string | null;
  live: ReturnType<typeof applyLiveCutoffs> | null;
  /** The cutoffs the live result was computed with (the latest slider values, at frame rate). */
  appliedCutoffs: Readonly<Record<string, Cutoffs>>;
}

/**
 * Evaluates the well in the browser with core: the curves once per samples/parameters, then
 * flags, zone summaries and sensitivities on every (frame-throttled) cutoff change.
 */
export function useLiveEvaluation(
  samples: MergedSamples | undefined,
  workbench: WorkbenchDto | undefined,
  cutoffs: Readonly<Record<string, Cutoffs>>,
): LiveEvaluation {
  const [base, error] = useMemo<[BaseEvaluation | null, string | null]>(() => {
    if (!samples || !workbench) return [null, null];
    if (!workbench.zones.length) return [null, 'No zones yet: enter formation tops for this well.'];
    try {
      return [evaluateBase(samples, workbench, workbench.cutoffs), null];
    } catch (e) {
      return [null, e instanceof Error ? e.message : String(e)];
    }
  }, [samples, workbench]);
  const applied = useAnimationFrameValue(cutoffs);
  const [live, liveError] = useMemo(() => {
    if (!base) return [null, null] as const;
    try {
      return [applyLiveCutoffs(base, applied), null] as const;
    } catch (e) {
      return [null, e instanceof Error ? e.message : String(e)] as const;
    }
  }, [base, applied]);
  return { base, error: error ?? liveError, live, appliedCutoffs: applied };
}

/** Net pay and phi-h against each cutoff of one formation, on the frame-throttled cutoffs. */
export function useSensitivity(live: LiveEvaluation, formation: string | null) {
  const { base, appliedCutoffs, error } = live;
  return useMemo(() => {
    if (!base || !formation || error) return null;
    try {
      return sensitivityFor(base, appliedCutoffs, formation);
    } catch {
      return null;
    }
  }, [base, appliedCutoffs, formation, error]);
}

/**
 * The formation to tune first: the one with the most net pay at the stored cutoffs (from the
 * curves' own evaluation, so it does not jump while sliders move), else the first zone.
 */
export function defaultFormation(base: BaseEvaluation | null, names: readonly string[]): string | null {
  const zones = base?.result.zones ?? [];
  let best: { name: string; pay: number } | null = null;
  for (const z of zones) if (!best || z.netPay.thickness.md > best.pay) best = { name: z.formation, pay: z.netPay.thickness.md };
  return best && best.pay > 0 ? best.name : (names[0] ?? null);
}
