import { useMutation } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { setToken } from '../../../lib/auth-token';

export interface ChangePasswordInput {
  currentPassword: string;
  /** At least 12 characters, different from the current one. */
  newPassword: string;
}

/**
 * PATCH /api/users/me/password (any signed-in user). 400 when the current password is wrong,
 * the new one is too short or the same; the messages name the field. The service ends every
 * session opened with the old password and answers with a new token for this one, kept here
 * so this session stays signed in.
 */
export async function changePassword(input: ChangePasswordInput): Promise<void> {
  const { token } = await apiJson<{ token: string }>('/users/me/password', { method: 'PATCH', json: input });
  setToken(token);
}

/** Nothing cached shows the password, so there is nothing to invalidate. */
export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
