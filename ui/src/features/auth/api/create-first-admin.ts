import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { setToken } from '../../../lib/auth-token';
import type { LoginResponse } from '../../../types/api';
import { setupStatusQueryOptions } from './get-setup-status';
import { meQueryOptions } from './get-me';

export interface FirstAdminInput {
  organisation: string;
  name: string;
  email: string;
  password: string;
}

/** POST /api/setup (no token): creates the organisation and its first admin, and signs them in (409 once done). */
export function createFirstAdmin(input: FirstAdminInput): Promise<LoginResponse> {
  return apiJson<LoginResponse>('/setup', { method: 'POST', json: input, auth: false });
}

/** Creates the first admin, stores the token and seeds the "me" query, like signing in. */
export function useCreateFirstAdmin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFirstAdmin,
    onSuccess: ({ token, user }) => {
      setToken(token);
      queryClient.setQueryData(meQueryOptions().queryKey, user);
      queryClient.setQueryData(setupStatusQueryOptions().queryKey, { needsFirstAdmin: false });
    },
  });
}
