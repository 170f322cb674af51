import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router-dom';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { ApiError } from '../../lib/api-client';
import { getToken } from '../../lib/auth-token';
import type { Me } from '../../types/api';

/**
 * For loaders of signed-in pages: without a token (or with one the server refuses) throws a
 * redirect to /sign-in that remembers the page; otherwise returns the user. React Router runs a
 * route's loaders in parallel, so each data loader calls this first and fetches nothing signed out
 * (the "me" request is shared through the query cache).
 */
export async function requireUser(queryClient: QueryClient, request: Request): Promise<Me> {
  const url = new URL(request.url);
  const here = url.pathname + url.search;
  const toSignIn = here === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(here)}`;
  if (!getToken()) throw redirect(toSignIn);
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) throw redirect(toSignIn);
    throw error;
  }
}
