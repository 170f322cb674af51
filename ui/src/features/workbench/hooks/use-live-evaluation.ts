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
  sensitivity: ReturnType<typeof sensitivityFor>;
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
  selectedFormation: string | null,
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
  const sensitivity = useMemo(() => {
    if (!base || !selectedFormation || liveError) return null;
    try {
      return sensitivityFor(base, applied, selectedFormation);
    } catch {
      return null;
    }
  }, [base, applied, selectedFormation, liveError]);
  return { base, error: error ?? liveError, live, sensitivity, appliedCutoffs: applied };
}
