import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { casePath, useCaseMutation } from './case-mutation';

/** POST .../:caseId/return (reviewer/admin): submitted -> returned, with the comment the author must read. */
export function returnReservesCase(assetId: string, caseId: string, comment: string): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`${casePath(assetId, caseId)}/return`, { method: 'POST', json: { comment } });
}

export function useReturnReservesCase(assetId: string, caseId: string) {
  return useCaseMutation(assetId, caseId, (comment: string) => returnReservesCase(assetId, caseId, comment));
}
