import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { Cutoffs, CutoffsUpdateResult } from '../../../types/workbench';

/** PUT /assets/:assetId/formations/:formationId/cutoffs: stores them and recomputes the asset's drafts. */
export function putCutoffs(assetId: string, formationId: string, cutoffs: Cutoffs): Promise<CutoffsUpdateResult> {
  return apiJson<CutoffsUpdateResult>(`/assets/${encodeURIComponent(assetId)}/formations/${encodeURIComponent(formationId)}/cutoffs`, {
    method: 'PUT',
    json: cutoffs,
  });
}

export function usePutCutoffs(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ formationId, cutoffs }: { formationId: string; cutoffs: Cutoffs }) => putCutoffs(assetId, formationId, cutoffs),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assetScope(assetId) }),
  });
}
