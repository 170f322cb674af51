import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { WellRow } from '../../../types/api';

/** GET /api/assets/:assetId/wells: the asset's wells with their log runs. */
export function getWells(assetId: string, signal?: AbortSignal): Promise<WellRow[]> {
  return apiJson<WellRow[]>(`/assets/${encodeURIComponent(assetId)}/wells`, { signal });
}

/** Its key is also the prefix of every well detail key of the asset, so invalidating it refreshes both. */
export function wellsQueryOptions(assetId: string) {
  return queryOptions({
    queryKey: ['assets', assetId, 'wells'] as const,
    queryFn: ({ signal }) => getWells(assetId, signal),
  });
}

export function useWells(assetId: string) {
  return useQuery(wellsQueryOptions(assetId));
}
