import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { AssetMember } from '../../../types/admin';
import { membersQueryOptions } from './get-members';
import { usersQueryOptions } from './get-users';

/** DELETE /api/assets/:assetId/members/:userId (asset admin; 409 for the last admin). */
export function removeMember(assetId: string, userId: string): Promise<AssetMember[]> {
  return apiJson<AssetMember[]>(`/assets/${encodeURIComponent(assetId)}/members/${encodeURIComponent(userId)}`, { method: 'DELETE' });
}

export function useRemoveMember(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(assetId, userId),
    onSuccess: (members) => {
      queryClient.setQueryData(membersQueryOptions(assetId).queryKey, members);
      return queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey });
    },
  });
}
