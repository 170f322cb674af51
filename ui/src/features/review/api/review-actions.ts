import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { InterpretationDto } from '../../../types/workbench';
import { interpretationPath } from './interpretations';

export type ReviewAction = 'submit' | 'approve' | 'return';

/**
 * POST .../interpretations/:id/submit | approve | return. Submit: petrophysicist/admin,
 * draft|returned -> submitted. Approve (comment optional) and return (comment required):
 * reviewer/admin, submitted -> approved|returned.
 */
export function reviewInterpretation(assetId: string, wellId: string, id: string, action: ReviewAction, comment?: string): Promise<InterpretationDto> {
  const json = action === 'submit' ? undefined : { comment: comment?.trim() ? comment.trim() : undefined };
  return apiJson<InterpretationDto>(`${interpretationPath(assetId, wellId, id)}/${action}`, { method: 'POST', json });
}

/** A status change shows in versions, the workbench, zone tables and the audit log: refresh the asset. */
export function useReviewAction(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, action, comment }: { id: string; action: ReviewAction; comment?: string }) =>
      reviewInterpretation(assetId, wellId, id, action, comment),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assetScope(assetId) }),
  });
}
