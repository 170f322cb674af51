import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { Asset } from '../../../types/api';
import { assetsQueryOptions } from './get-assets';

export interface CreateAssetInput {
  name: string;
  description?: string;
}

/** POST /api/assets (global admin; the creator becomes its admin member; 409 when the name is taken). */
export function createAsset(input: CreateAssetInput): Promise<Asset> {
  return apiJson<Asset>('/assets', { method: 'POST', json: input });
}

export function useCreateAsset() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAsset,
    // exact: the list only, not every query under an asset's scope.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assetsQueryOptions().queryKey, exact: true }),
  });
}
