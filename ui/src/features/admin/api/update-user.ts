import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { UserAccount } from '../../../types/admin';
import { usersQueryOptions } from './get-users';

export interface UpdateUserInput {
  name?: string;
  isAdmin?: boolean;
  /** A new password (reset), at least 12 characters. */
  password?: string;
}

/** PATCH /api/users/:userId (global admin; 409 when withdrawing the last admin). */
export function updateUser(userId: string, input: UpdateUserInput): Promise<UserAccount> {
  return apiJson<UserAccount>(`/users/${encodeURIComponent(userId)}`, { method: 'PATCH', json: input });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, ...input }: UpdateUserInput & { userId: string }) => updateUser(userId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey }),
  });
}
