import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { meKey } from '../../../lib/query-keys';
import type { Me } from '../../../types/api';

/** GET /api/auth/me: the signed-in user and their asset memberships. */
export function getMe(signal?: AbortSignal): Promise<Me> {
  return apiJson<Me>('/auth/me', { signal });
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: meKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
