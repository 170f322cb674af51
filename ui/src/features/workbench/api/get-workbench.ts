import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { WorkbenchDto } from '../../../types/workbench';
import { wellPath } from './paths';

/** GET .../wells/:wellId/workbench: zones with their parameters, cutoffs, bindings, survey, conventions, latest version. */
export function getWorkbench(assetId: string, wellId: string, signal?: AbortSignal): Promise<WorkbenchDto> {
  return apiJson<WorkbenchDto>(`${wellPath(assetId, wellId)}/workbench`, { signal });
}

/** Keyed under the well, so invalidating the well's key refreshes it too. */
export function workbenchQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: ['assets', assetId, 'wells', wellId, 'workbench'] as const,
    queryFn: ({ signal }) => getWorkbench(assetId, wellId, signal),
  });
}

export function useWorkbench(assetId: string, wellId: string) {
  return useQuery(workbenchQueryOptions(assetId, wellId));
}
