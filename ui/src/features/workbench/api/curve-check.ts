import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { CurveCheckRow } from '../../../types/workbench';
import { wellPath } from './paths';

/** GET .../curve-check: coverage, null runs and range violations of every curve of every log run. */
export function getCurveCheck(assetId: string, wellId: string, signal?: AbortSignal): Promise<CurveCheckRow[]> {
  return apiJson<CurveCheckRow[]>(`${wellPath(assetId, wellId)}/curve-check`, { signal });
}

export function curveCheckQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'curve-check'] as const,
    queryFn: ({ signal }) => getCurveCheck(assetId, wellId, signal),
  });
}

export function useCurveCheck(assetId: string, wellId: string) {
  return useQuery(curveCheckQueryOptions(assetId, wellId));
}
