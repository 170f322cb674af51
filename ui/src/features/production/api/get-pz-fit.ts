import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { PzFitDto } from '../../../types/reserves';
import { productionPath, productionQueryOptions } from './get-production';

/**
 * GET .../production/:seriesId/pz-fit?caseId=: p/z on cumulative gas with z from the case's gas
 * PVT, the drained gas in place and, with a current gas run, the wells needed.
 */
export function getPzFit(assetId: string, wellId: string, seriesId: string, caseId: string, signal?: AbortSignal): Promise<PzFitDto> {
  return apiJson<PzFitDto>(`${productionPath(assetId, wellId)}/${encodeURIComponent(seriesId)}/pz-fit?caseId=${encodeURIComponent(caseId)}`, { signal });
}

/** `revision` keys the fit to the case revision, so a case edit refits. */
export function pzFitQueryOptions(assetId: string, wellId: string, seriesId: string, caseId: string, revision: number) {
  return queryOptions({
    queryKey: [...productionQueryOptions(assetId, wellId).queryKey, seriesId, 'pz-fit', caseId, revision] as const,
    queryFn: ({ signal }) => getPzFit(assetId, wellId, seriesId, caseId, signal),
    retry: false,
  });
}

export function usePzFit(assetId: string, wellId: string, seriesId: string, caseId: string, revision: number) {
  return useQuery(pzFitQueryOptions(assetId, wellId, seriesId, caseId, revision));
}
