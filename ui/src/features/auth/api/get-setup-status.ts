import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { SetupStatus } from '../../../types/admin';

/** GET /api/setup (no token): true only on a real deployment before its first admin exists. */
export function getSetupStatus(signal?: AbortSignal): Promise<SetupStatus> {
  return apiJson<SetupStatus>('/setup', { signal, auth: false });
}

export function setupStatusQueryOptions() {
  return queryOptions({
    queryKey: ['setup'] as const,
    queryFn: ({ signal }) => getSetupStatus(signal),
    // It changes once in an installation's life; ask again on each visit of the pages that use it.
    staleTime: 0,
  });
}

export function useSetupStatus() {
  return useQuery(setupStatusQueryOptions());
}
