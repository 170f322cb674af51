import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { CandidateDto } from '../../../types/reserves';
import { reservesCasesQueryOptions } from './get-reserves-cases';

/** GET /assets/:assetId/reserves-cases/candidates?formationId=: wells with an approved interpretation of the formation. */
export function getCaseCandidates(assetId: string, formationId: string, signal?: AbortSignal): Promise<CandidateDto[]> {
  return apiJson<CandidateDto[]>(`/assets/${encodeURIComponent(assetId)}/reserves-cases/candidates?formationId=${encodeURIComponent(formationId)}`, { signal });
}

export function caseCandidatesQueryOptions(assetId: string, formationId: string) {
  return queryOptions({
    queryKey: [...reservesCasesQueryOptions(assetId).queryKey, 'candidates', formationId] as const,
    queryFn: ({ signal }) => getCaseCandidates(assetId, formationId, signal),
    enabled: formationId !== '',
  });
}

export function useCaseCandidates(assetId: string, formationId: string) {
  return useQuery(caseCandidatesQueryOptions(assetId, formationId));
}
