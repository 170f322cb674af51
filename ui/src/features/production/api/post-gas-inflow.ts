import { useMutation } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { GasInflowInput, GasInflowResultDto } from '../../../types/reserves';

/** POST /assets/:assetId/inflow/gas: a gas well's pseudo-steady-state rate, z at the average pressure (pure calculation). */
export function postGasInflow(assetId: string, input: GasInflowInput): Promise<GasInflowResultDto> {
  return apiJson<GasInflowResultDto>(`/assets/${encodeURIComponent(assetId)}/inflow/gas`, { method: 'POST', json: input });
}

export function useGasInflow(assetId: string) {
  return useMutation({ mutationFn: (input: GasInflowInput) => postGasInflow(assetId, input) });
}
