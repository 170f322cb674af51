import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { TopDto, TopSource } from '../../../types/workbench';
import { wellPath } from './paths';

export interface TopInput {
  formationId: string;
  md: number;
  source?: TopSource;
}

/** GET .../tops: the well's formation tops by MD. */
export function getTops(assetId: string, wellId: string, signal?: AbortSignal): Promise<TopDto[]> {
  return apiJson<TopDto[]>(`${wellPath(assetId, wellId)}/tops`, { signal });
}

/** PUT .../tops: replaces the well's tops (they must deepen in formation order). */
export function putTops(assetId: string, wellId: string, tops: readonly TopInput[]): Promise<TopDto[]> {
  return apiJson<TopDto[]>(`${wellPath(assetId, wellId)}/tops`, { method: 'PUT', json: { tops } });
}

export function topsQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'tops'] as const,
    queryFn: ({ signal }) => getTops(assetId, wellId, signal),
  });
}

export function useTops(assetId: string, wellId: string) {
  return useQuery(topsQueryOptions(assetId, wellId));
}

/** Saving tops changes the zones, the workbench and the curves' zoning: refresh the well scope. */
export function usePutTops(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tops: readonly TopInput[]) => putTops(assetId, wellId, tops),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: wellScope(assetId, wellId) }),
  });
}
