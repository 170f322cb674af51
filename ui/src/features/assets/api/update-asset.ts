import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { meKey, usersKey } from '../../../lib/query-keys';
import type { Asset } from '../../../types/api';
import { assetQueryOptions } from './get-asset';
import { assetsQueryOptions } from './get-assets';

export interface UpdateAssetInput {
  name?: string;
  description?: string;
}

/** PATCH /api/assets/:assetId (asset admin; only the fields sent change; 409 when the name is taken). */
export function updateAsset(assetId: string, input: UpdateAssetInput): Promise<Asset> {
  return apiJson<Asset>(`/assets/${encodeURIComponent(assetId)}`, { method: 'PATCH', json: input });
}

/**
 * After a rename the asset's own query takes the answer, and every list that repeats the
 * name refetches: the assets list, the signed-in user's memberships (me) and the accounts'
 * memberships (admin). Exact keys: the asset's wells, tables and cases keep their cache.
 */
export function useUpdateAsset(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateAssetInput) => updateAsset(assetId, input),
    onSuccess: (asset) => {
      queryClient.setQueryData(assetQueryOptions(assetId).queryKey, asset);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: assetsQueryOptions().queryKey, exact: true }),
        queryClient.invalidateQueries({ queryKey: meKey, exact: true }),
        queryClient.invalidateQueries({ queryKey: usersKey, exact: true }),
      ]);
    },
  });
}
