import { decodeCurveBundle } from '@poreline/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiBinary } from '../../../lib/api-client';
import { wellPath } from './paths';

/** One curve of the merged bundle: its key (GR, RHOB, ...), canonical unit and samples (NaN = missing). */
export interface MergedCurve {
  mnemonic: string;
  unit: string;
  values: Float64Array;
  source: { logRunId: string; mnemonic: string } | null;
}

/** The well's bound curves on one merged depth index, as the evaluation reads them. */
export interface MergedSamples {
  depth: Float64Array;
  depthUnit: string;
  curves: Record<string, MergedCurve>;
}

/** Decodes the merged curve bundle: entry 0 is the index (DEPT), then one entry per bound curve. */
export function toMergedSamples(bytes: Uint8Array): MergedSamples {
  const bundle = decodeCurveBundle(bytes);
  if (!bundle.entries.length) throw new RangeError('toMergedSamples: the bundle holds no depth index');
  const curves: Record<string, MergedCurve> = {};
  bundle.entries.forEach((entry, i) => {
    if (i === 0) return;
    const source = entry.source as { logRunId?: unknown; mnemonic?: unknown } | undefined;
    curves[entry.mnemonic.toUpperCase()] = {
      mnemonic: entry.mnemonic.toUpperCase(),
      unit: entry.unit,
      values: bundle.values[i],
      source: source && typeof source.logRunId === 'string' ? { logRunId: source.logRunId, mnemonic: String(source.mnemonic ?? '') } : null,
    };
  });
  return { depth: bundle.values[0], depthUnit: bundle.entries[0].unit, curves };
}

/** GET .../merged-samples (application/octet-stream), decoded. Fetched once; sliders never refetch. */
export async function getMergedSamples(assetId: string, wellId: string, signal?: AbortSignal): Promise<MergedSamples> {
  const buffer = await apiBinary(`${wellPath(assetId, wellId)}/merged-samples`, { signal });
  return toMergedSamples(new Uint8Array(buffer));
}

/**
 * Kept for the session (staleTime Infinity): the samples change only when bindings or log runs
 * change, and those mutations invalidate this key.
 */
export function mergedSamplesQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: ['merged-samples', assetId, wellId] as const,
    queryFn: ({ signal }) => getMergedSamples(assetId, wellId, signal),
    staleTime: Infinity,
    gcTime: 15 * 60_000,
  });
}

export function useMergedSamples(assetId: string, wellId: string) {
  return useQuery(mergedSamplesQueryOptions(assetId, wellId));
}
