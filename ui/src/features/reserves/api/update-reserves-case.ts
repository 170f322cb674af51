import { apiJson } from '../../../lib/api-client';
import type { CaseInputsPatch, ReservesCase } from '../../../types/reserves';
import { casePath, useCaseMutation } from './case-mutation';

export interface UpdateCaseInput {
  name?: string;
  wellIds?: string[];
  inputs?: CaseInputsPatch;
  seed?: number;
  expectedRevision?: number;
}

/** PATCH /assets/:assetId/reserves-cases/:caseId: each inputs key given replaces that key; results are cleared. */
export function updateReservesCase(assetId: string, caseId: string, input: UpdateCaseInput): Promise<ReservesCase> {
  return apiJson<ReservesCase>(casePath(assetId, caseId), { method: 'PATCH', json: input });
}

export function useUpdateReservesCase(assetId: string, caseId: string) {
  return useCaseMutation(assetId, caseId, (input: UpdateCaseInput) => updateReservesCase(assetId, caseId, input));
}
