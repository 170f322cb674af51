import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { FormationDto } from '../../../types/workbench';
import { formationsQueryOptions } from './get-formations';

export interface FormationInput {
  name: string;
  colour?: string;
  lithology?: string;
  ordinal?: number;
}

/** POST /assets/:assetId/formations (409 when the name is taken). */
export function createFormation(assetId: string, input: FormationInput): Promise<FormationDto> {
  return apiJson<FormationDto>(`/assets/${encodeURIComponent(assetId)}/formations`, { method: 'POST', json: input });
}

export function useCreateFormation(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: FormationInput) => createFormation(assetId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: formationsQueryOptions(assetId).queryKey }),
  });
}
