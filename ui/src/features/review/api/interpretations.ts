import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { InterpretationDto } from '../../../types/workbench';

const base = (assetId: string, wellId: string) => `/assets/${encodeURIComponent(assetId)}/wells/${encodeURIComponent(wellId)}/interpretations`;

/** GET .../interpretations: the well's versions, newest first. */
export function getInterpretations(assetId: string, wellId: string, signal?: AbortSignal): Promise<InterpretationDto[]> {
  return apiJson<InterpretationDto[]>(base(assetId, wellId), { signal });
}

export function interpretationsQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'interpretations'] as const,
    queryFn: ({ signal }) => getInterpretations(assetId, wellId, signal),
  });
}

export function useInterpretations(assetId: string, wellId: string) {
  return useQuery(interpretationsQueryOptions(assetId, wellId));
}

export const interpretationPath = (assetId: string, wellId: string, id: string) => `${base(assetId, wellId)}/${encodeURIComponent(id)}`;
