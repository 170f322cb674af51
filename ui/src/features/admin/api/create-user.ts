import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { UserAccount } from '../../../types/admin';
import { usersQueryOptions } from './get-users';

export interface CreateUserInput {
  email: string;
  name: string;
  /** Initial password, at least 12 characters. */
  password: string;
  isAdmin?: boolean;
}

/** POST /api/users (global admin; 409 when the e-mail is taken). */
export function createUser(input: CreateUserInput): Promise<UserAccount> {
  return apiJson<UserAccount>('/users', { method: 'POST', json: input });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey }),
  });
}
