import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { usersKey } from '../../../lib/query-keys';
import type { UserAccount } from '../../../types/admin';

/** GET /api/users: the accounts of the admin's organisation (global admin). */
export function getUsers(signal?: AbortSignal): Promise<UserAccount[]> {
  return apiJson<UserAccount[]>('/users', { signal });
}

export function usersQueryOptions() {
  return queryOptions({
    queryKey: usersKey,
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}
