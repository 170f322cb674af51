import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { ReservesCaseSummary } from '../../../types/reserves';

/** GET /assets/:assetId/reserves-cases: the asset's cases, newest first. */
export function getReservesCases(assetId: string, signal?: AbortSignal): Promise<ReservesCaseSummary[]> {
  return apiJson<ReservesCaseSummary[]>(`/assets/${encodeURIComponent(assetId)}/reserves-cases`, { signal });
}

export function reservesCasesQueryOptions(assetId: string) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'reserves-cases'] as const,
    queryFn: ({ signal }) => getReservesCases(assetId, signal),
  });
}

export function useReservesCases(assetId: string) {
  return useQuery(reservesCasesQueryOptions(assetId));
}
