import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { casePath, useCaseMutation } from './case-mutation';

/** POST .../:caseId/submit (engineer/admin): draft or returned -> submitted; needs a current run. */
export function submitReservesCase(assetId: string, caseId: string): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`${casePath(assetId, caseId)}/submit`, { method: 'POST' });
}

export function useSubmitReservesCase(assetId: string, caseId: string) {
  return useCaseMutation(assetId, caseId, () => submitReservesCase(assetId, caseId));
}
