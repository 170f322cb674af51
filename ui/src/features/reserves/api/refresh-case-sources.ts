import { apiJson } from '../../../lib/api-client';
import type { ReservesCase } from '../../../types/reserves';
import { casePath, useCaseMutation } from './case-mutation';

/** POST .../:caseId/refresh-sources: stale sources move to the newest approved interpretation. */
export function refreshCaseSources(assetId: string, caseId: string, wellIds?: string[]): Promise<ReservesCase> {
  return apiJson<ReservesCase>(`${casePath(assetId, caseId)}/refresh-sources`, { method: 'POST', json: wellIds ? { wellIds } : {} });
}

export function useRefreshCaseSources(assetId: string, caseId: string) {
  return useCaseMutation(assetId, caseId, (wellIds?: string[]) => refreshCaseSources(assetId, caseId, wellIds));
}
