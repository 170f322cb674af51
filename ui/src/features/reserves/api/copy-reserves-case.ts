import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { casePath } from './case-mutation';
import { reservesCasesQueryOptions } from './get-reserves-cases';

/** POST .../:caseId/copy (engineer/admin): a new draft with the same sources, inputs and seed. */
export function copyReservesCase(assetId: string, caseId: string): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`${casePath(assetId, caseId)}/copy`, { method: 'POST' });
}

export function useCopyReservesCase(assetId: string, caseId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => copyReservesCase(assetId, caseId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reservesCasesQueryOptions(assetId).queryKey, exact: true }),
  });
}
