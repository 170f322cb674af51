import { useMutation } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';

export interface ChangePasswordInput {
  currentPassword: string;
  /** At least 12 characters, different from the current one. */
  newPassword: string;
}

/**
 * PATCH /api/users/me/password (any signed-in user; 204). 400 when the current password is wrong,
 * the new one is too short or the same; the messages name the field.
 */
export function changePassword(input: ChangePasswordInput): Promise<void> {
  return apiJson<void>('/users/me/password', { method: 'PATCH', json: input });
}

/** Nothing cached shows the password, so there is nothing to invalidate; the session stays signed in. */
export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
