import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { FormationDto } from '../../../types/workbench';

/** GET /assets/:assetId/formations: the asset's formation names in stratigraphic order, with cutoffs. */
export function getFormations(assetId: string, signal?: AbortSignal): Promise<FormationDto[]> {
  return apiJson<FormationDto[]>(`/assets/${encodeURIComponent(assetId)}/formations`, { signal });
}

export function formationsQueryOptions(assetId: string) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'formations'] as const,
    queryFn: ({ signal }) => getFormations(assetId, signal),
  });
}

export function useFormations(assetId: string) {
  return useQuery(formationsQueryOptions(assetId));
}
