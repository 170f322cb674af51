import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { FormationDto } from '../../../types/workbench';
import type { FormationInput } from './create-formation';

/** PATCH /assets/:assetId/formations/:formationId (name, colour, lithology, ordinal). */
export function updateFormation(assetId: string, formationId: string, input: Partial<FormationInput>): Promise<FormationDto> {
  return apiJson<FormationDto>(`/assets/${encodeURIComponent(assetId)}/formations/${encodeURIComponent(formationId)}`, {
    method: 'PATCH',
    json: input,
  });
}

/** A renamed or recoloured formation shows in every well: refresh the asset scope. */
export function useUpdateFormation(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ formationId, input }: { formationId: string; input: Partial<FormationInput> }) => updateFormation(assetId, formationId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assetScope(assetId) }),
  });
}
