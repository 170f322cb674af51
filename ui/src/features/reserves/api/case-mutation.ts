import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReservesCase } from '../../../types/reserves';
import { reservesCaseQueryOptions } from './get-reserves-case';
import { reservesCasesQueryOptions } from './get-reserves-cases';

/**
 * A mutation that answers with the whole case: the answer replaces the cached case and the
 * list is refetched. Shared by the per-endpoint hooks (update, run, refresh, review).
 */
export function useCaseMutation<TVars>(assetId: string, caseId: string, fn: (vars: TVars) => Promise<ReservesCase>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: async (updated) => {
      queryClient.setQueryData(reservesCaseQueryOptions(assetId, caseId).queryKey, updated);
      await queryClient.invalidateQueries({ queryKey: reservesCasesQueryOptions(assetId).queryKey, exact: true });
    },
  });
}

export function casePath(assetId: string, caseId: string): string {
  return `/assets/${encodeURIComponent(assetId)}/reserves-cases/${encodeURIComponent(caseId)}`;
}
