import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { Asset } from '../../../types/api';

/** GET /api/assets: the assets the user is a member of. */
export function getAssets(signal?: AbortSignal): Promise<Asset[]> {
  return apiJson<Asset[]>('/assets', { signal });
}

export function assetsQueryOptions() {
  return queryOptions({
    queryKey: ['assets'] as const,
    queryFn: ({ signal }) => getAssets(signal),
  });
}

export function useAssets() {
  return useQuery(assetsQueryOptions());
}
