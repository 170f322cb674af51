import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { DeclineFitDto, DeclineKind } from '../../../types/reserves';
import { productionPath, productionQueryOptions } from './get-production';

/** GET .../production/:seriesId/decline-fit?kind=&economicLimit=: Arps least-squares fit and EUR. */
export function getDeclineFit(assetId: string, wellId: string, seriesId: string, kind: DeclineKind, economicLimit: number, signal?: AbortSignal): Promise<DeclineFitDto> {
  const q = `kind=${encodeURIComponent(kind)}&economicLimit=${encodeURIComponent(String(economicLimit))}`;
  return apiJson<DeclineFitDto>(`${productionPath(assetId, wellId)}/${encodeURIComponent(seriesId)}/decline-fit?${q}`, { signal });
}

export function declineFitQueryOptions(assetId: string, wellId: string, seriesId: string, kind: DeclineKind, economicLimit: number) {
  return queryOptions({
    queryKey: [...productionQueryOptions(assetId, wellId).queryKey, seriesId, 'decline-fit', kind, economicLimit] as const,
    queryFn: ({ signal }) => getDeclineFit(assetId, wellId, seriesId, kind, economicLimit, signal),
    enabled: economicLimit > 0,
    retry: false,
  });
}

export function useDeclineFit(assetId: string, wellId: string, seriesId: string, kind: DeclineKind, economicLimit: number) {
  return useQuery(declineFitQueryOptions(assetId, wellId, seriesId, kind, economicLimit));
}
