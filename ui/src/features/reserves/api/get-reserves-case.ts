import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { reservesCasesQueryOptions } from './get-reserves-cases';

/** GET /assets/:assetId/reserves-cases/:caseId: a case with sources, inputs, combined values and results. */
export function getReservesCase(assetId: string, caseId: string, signal?: AbortSignal): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`/assets/${encodeURIComponent(assetId)}/reserves-cases/${encodeURIComponent(caseId)}`, { signal });
}

export function reservesCaseQueryOptions(assetId: string, caseId: string) {
  return queryOptions({
    queryKey: [...reservesCasesQueryOptions(assetId).queryKey, caseId] as const,
    queryFn: ({ signal }) => getReservesCase(assetId, caseId, signal),
  });
}

export function useReservesCase(assetId: string, caseId: string) {
  return useQuery(reservesCaseQueryOptions(assetId, caseId));
}
