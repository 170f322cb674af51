import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { casePath, useCaseMutation } from './case-mutation';

/** POST .../:caseId/run: deterministic and Monte Carlo (stored seed), results stored with the case. */
export function runReservesCase(assetId: string, caseId: string): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`${casePath(assetId, caseId)}/run`, { method: 'POST' });
}

export function useRunReservesCase(assetId: string, caseId: string) {
  return useCaseMutation(assetId, caseId, () => runReservesCase(assetId, caseId));
}
