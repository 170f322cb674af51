import { useMutation } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { InflowInput, InflowResultDto } from '../../../types/reserves';

/** POST /assets/:assetId/inflow: radial pseudo-steady-state and Joshi (1988) horizontal rates (pure calculation). */
export function postInflow(assetId: string, input: InflowInput): Promise<InflowResultDto> {
  return apiJson<InflowResultDto>(`/assets/${encodeURIComponent(assetId)}/inflow`, { method: 'POST', json: input });
}

export function useInflow(assetId: string) {
  return useMutation({ mutationFn: (input: InflowInput) => postInflow(assetId, input) });
}
