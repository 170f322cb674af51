import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { AssetMember } from '../../../types/admin';

/** GET /api/assets/:assetId/members (any member). */
export function getMembers(assetId: string, signal?: AbortSignal): Promise<AssetMember[]> {
  return apiJson<AssetMember[]>(`/assets/${encodeURIComponent(assetId)}/members`, { signal });
}

export function membersQueryOptions(assetId: string) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'members'] as const,
    queryFn: ({ signal }) => getMembers(assetId, signal),
  });
}

export function useMembers(assetId: string) {
  return useQuery(membersQueryOptions(assetId));
}
