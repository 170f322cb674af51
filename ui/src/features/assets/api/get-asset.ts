import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { Asset } from '../../../types/api';

/** GET /api/assets/:assetId (404 when the user is not a member). */
export function getAsset(assetId: string, signal?: AbortSignal): Promise<Asset> {
  return apiJson<Asset>(`/assets/${encodeURIComponent(assetId)}`, { signal });
}

export function assetQueryOptions(assetId: string) {
  return queryOptions({
    queryKey: ['assets', assetId] as const,
    queryFn: ({ signal }) => getAsset(assetId, signal),
  });
}

export function useAsset(assetId: string) {
  return useQuery(assetQueryOptions(assetId));
}
