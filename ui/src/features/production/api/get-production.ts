import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { SeriesDto } from '../../../types/reserves';

/** GET /assets/:assetId/wells/:wellId/production: the well's pressure and rate series. */
export function getProduction(assetId: string, wellId: string, signal?: AbortSignal): Promise<SeriesDto[]> {
  return apiJson<SeriesDto[]>(`${productionPath(assetId, wellId)}`, { signal });
}

export function productionPath(assetId: string, wellId: string): string {
  return `/assets/${encodeURIComponent(assetId)}/wells/${encodeURIComponent(wellId)}/production`;
}

export function productionQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'production'] as const,
    queryFn: ({ signal }) => getProduction(assetId, wellId, signal),
    enabled: wellId !== '',
  });
}

export function useProduction(assetId: string, wellId: string) {
  return useQuery(productionQueryOptions(assetId, wellId));
}
