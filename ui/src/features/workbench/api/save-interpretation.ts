import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { Cutoffs, CutoffsUpdateResult, InterpretationDto } from '../../../types/workbench';
import { assetPath, wellPath } from './paths';

/** POST .../interpretations ("Save"): the server snapshots the inputs and recomputes with core. */
export function saveInterpretation(assetId: string, wellId: string): Promise<InterpretationDto> {
  return apiJson<InterpretationDto>(`${wellPath(assetId, wellId)}/interpretations`, { method: 'POST' });
}

/** PUT /assets/:assetId/formations/:formationId/cutoffs (recomputes the asset's drafts server side). */
export function putFormationCutoffs(assetId: string, formationId: string, cutoffs: Cutoffs): Promise<CutoffsUpdateResult> {
  return apiJson<CutoffsUpdateResult>(`${assetPath(assetId)}/formations/${encodeURIComponent(formationId)}/cutoffs`, {
    method: 'PUT',
    json: cutoffs,
  });
}

export interface SaveInput {
  /** Formations whose cutoffs the user tuned, stored before the version is saved. */
  cutoffs: { formationId: string; cutoffs: Cutoffs }[];
}

/**
 * "Save": stores the tuned cutoffs of each changed formation, then saves the interpretation
 * version. Everything of the asset may change (drafts of other wells, zone tables, audit), so
 * the asset scope is refreshed.
 */
export function useSaveInterpretation(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ cutoffs }: SaveInput) => {
      for (const c of cutoffs) await putFormationCutoffs(assetId, c.formationId, c.cutoffs);
      return saveInterpretation(assetId, wellId);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: assetScope(assetId) }),
  });
}
