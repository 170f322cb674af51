import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { WellRow } from '../../../types/api';
import { wellsQueryOptions } from './get-wells';

export interface CreateWellInput {
  name: string;
  uwi?: string;
}

/** POST /api/assets/:assetId/wells (petrophysicist/admin; 409 when the name is taken). */
export function createWell(assetId: string, input: CreateWellInput): Promise<WellRow> {
  return apiJson<WellRow>(`/assets/${encodeURIComponent(assetId)}/wells`, { method: 'POST', json: input });
}

export function useCreateWell(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateWellInput) => createWell(assetId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: wellsQueryOptions(assetId).queryKey }),
  });
}
