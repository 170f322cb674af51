import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { setToken } from '../../../lib/auth-token';
import type { LoginResponse } from '../../../types/api';
import { meQueryOptions } from './get-me';

export interface LoginInput {
  email: string;
  password: string;
}

/** POST /api/auth/login (no token needed; a 401 here means wrong credentials, not a lapsed session). */
export function login(input: LoginInput): Promise<LoginResponse> {
  return apiJson<LoginResponse>('/auth/login', { method: 'POST', json: input, auth: false });
}

/** Signs in: stores the token and seeds the "me" query with the returned user. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: ({ token, user }) => {
      setToken(token);
      queryClient.setQueryData(meQueryOptions().queryKey, user);
    },
  });
}
