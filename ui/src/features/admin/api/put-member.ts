import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { Role } from '../../../types/api';
import type { AssetMember } from '../../../types/admin';
import { membersQueryOptions } from './get-members';
import { usersQueryOptions } from './get-users';

export interface PutMemberInput {
  email: string;
  role: Role;
}

/**
 * PUT /api/assets/:assetId/members (asset admin): adds the user with that e-mail or changes
 * their role; 404 when no account of the organisation has it, 409 when demoting the last admin.
 */
export function putMember(assetId: string, input: PutMemberInput): Promise<AssetMember[]> {
  return apiJson<AssetMember[]>(`/assets/${encodeURIComponent(assetId)}/members`, { method: 'PUT', json: input });
}

export function usePutMember(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PutMemberInput) => putMember(assetId, input),
    onSuccess: (members) => {
      queryClient.setQueryData(membersQueryOptions(assetId).queryKey, members);
      return queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey });
    },
  });
}
