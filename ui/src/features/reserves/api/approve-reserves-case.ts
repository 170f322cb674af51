import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { casePath, useCaseMutation } from './case-mutation';

/** POST .../:caseId/approve (reviewer/admin): submitted -> approved, immutable from then on. */
export function approveReservesCase(assetId: string, caseId: string, comment?: string): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`${casePath(assetId, caseId)}/approve`, { method: 'POST', json: comment ? { comment } : {} });
}

export function useApproveReservesCase(assetId: string, caseId: string) {
  return useCaseMutation(assetId, caseId, (comment?: string) => approveReservesCase(assetId, caseId, comment));
}
