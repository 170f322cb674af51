import { decodeCurveBundle } from '@poreline/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiBinary } from '../../../lib/api-client';

export interface SampleCurve {
  mnemonic: string;
  unit: string;
  curveClass: string | null;
  description: string;
  values: Float64Array;
}

/** A log run's samples: the index (depth) and every curve in file order. NaN marks a missing sample. */
export interface LogRunSamples {
  index: SampleCurve;
  curves: SampleCurve[];
}

/** Turns a curve bundle (binary frame from the samples endpoint) into the index and its curves. */
export function toLogRunSamples(bytes: Uint8Array): LogRunSamples {
  const bundle = decodeCurveBundle(bytes);
  if (!bundle.entries.length) throw new RangeError('toLogRunSamples: the bundle holds no index curve');
  const all = bundle.entries.map<SampleCurve>((entry, i) => ({
    mnemonic: entry.mnemonic,
    unit: entry.unit,
    curveClass: typeof entry.curveClass === 'string' ? entry.curveClass : null,
    description: typeof entry.description === 'string' ? entry.description : '',
    values: bundle.values[i],
  }));
  return { index: all[0], curves: all.slice(1) };
}

/** GET .../log-runs/:runId/samples (application/octet-stream), decoded. */
export async function getLogRunSamples(assetId: string, wellId: string, runId: string, signal?: AbortSignal): Promise<LogRunSamples> {
  const path = `/assets/${encodeURIComponent(assetId)}/wells/${encodeURIComponent(wellId)}/log-runs/${encodeURIComponent(runId)}/samples`;
  const buffer = await apiBinary(path, { signal });
  return toLogRunSamples(new Uint8Array(buffer));
}

/** A stored log run never changes, so its samples stay fresh for the session. */
export function logRunSamplesQueryOptions(assetId: string, wellId: string, runId: string) {
  return queryOptions({
    queryKey: ['log-run-samples', assetId, wellId, runId] as const,
    queryFn: ({ signal }) => getLogRunSamples(assetId, wellId, runId, signal),
    staleTime: Infinity,
    gcTime: 10 * 60_000,
  });
}

export function useLogRunSamples(assetId: string, wellId: string, runId: string) {
  return useQuery(logRunSamplesQueryOptions(assetId, wellId, runId));
}
