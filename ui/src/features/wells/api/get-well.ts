import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { WellDetail } from '../../../types/api';

/** GET /api/assets/:assetId/wells/:wellId: a well with its log runs, curves and diagnostics. */
export function getWell(assetId: string, wellId: string, signal?: AbortSignal): Promise<WellDetail> {
  return apiJson<WellDetail>(`/assets/${encodeURIComponent(assetId)}/wells/${encodeURIComponent(wellId)}`, { signal });
}

export function wellQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: ['assets', assetId, 'wells', wellId] as const,
    queryFn: ({ signal }) => getWell(assetId, wellId, signal),
  });
}

export function useWell(assetId: string, wellId: string) {
  return useQuery(wellQueryOptions(assetId, wellId));
}
