import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { meKey } from '../../../lib/query-keys';
import type { UserAccount } from '../../../types/admin';
import { membersQueryOptions } from './get-members';
import { usersQueryOptions } from './get-users';

export interface UpdateUserInput {
  name?: string;
  isAdmin?: boolean;
  /** A new password (reset), at least 12 characters. */
  password?: string;
}

/** PATCH /api/users/:userId (global admin; only the fields sent change; 409 when withdrawing the last admin). */
export function updateUser(userId: string, input: UpdateUserInput): Promise<UserAccount> {
  return apiJson<UserAccount>(`/users/${encodeURIComponent(userId)}`, { method: 'PATCH', json: input });
}

/**
 * Refetches what shows the user's name or admin flag: the accounts list, the members of each
 * asset they belong to, and "me" (the admin may have edited themselves; the header shows the name).
 */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, ...input }: UpdateUserInput & { userId: string }) => updateUser(userId, input),
    onSuccess: (user) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey }),
        queryClient.invalidateQueries({ queryKey: meKey, exact: true }),
        ...user.memberships.map((m) => queryClient.invalidateQueries({ queryKey: membersQueryOptions(m.assetId).queryKey, exact: true })),
      ]),
  });
}
