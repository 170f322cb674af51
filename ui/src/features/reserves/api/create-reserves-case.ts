import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { CaseInputsPatch, ReservesCase } from '../../../types/reserves';
import { reservesCasesQueryOptions } from './get-reserves-cases';

export interface CreateCaseInput {
  name: string;
  formationId: string;
  wellIds: string[];
  inputs?: CaseInputsPatch;
  seed?: number;
}

/** POST /assets/:assetId/reserves-cases (engineer/admin): a draft pulling the wells' approved values. */
export function createReservesCase(assetId: string, input: CreateCaseInput): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`/assets/${encodeURIComponent(assetId)}/reserves-cases`, { method: 'POST', json: input });
}

export function useCreateReservesCase(assetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCaseInput) => createReservesCase(assetId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reservesCasesQueryOptions(assetId).queryKey }),
  });
}
