import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { ZoneParams, ZoneParamsDto } from '../../../types/workbench';
import { wellPath } from './paths';

const zonePath = (assetId: string, wellId: string, formationId: string) =>
  `${wellPath(assetId, wellId)}/zones/${encodeURIComponent(formationId)}/parameters`;

/** GET .../zones/:formationId/parameters: the zone's parameters (isDefault when none are stored). */
export function getZoneParameters(assetId: string, wellId: string, formationId: string, signal?: AbortSignal): Promise<ZoneParamsDto> {
  return apiJson<ZoneParamsDto>(zonePath(assetId, wellId, formationId), { signal });
}

/** PUT .../zones/:formationId/parameters: the server validates with core (400 names zone and field). */
export function putZoneParameters(assetId: string, wellId: string, formationId: string, params: ZoneParams): Promise<ZoneParamsDto> {
  return apiJson<ZoneParamsDto>(zonePath(assetId, wellId, formationId), { method: 'PUT', json: { params } });
}

export function zoneParametersQueryOptions(assetId: string, wellId: string, formationId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'zone-parameters', formationId] as const,
    queryFn: ({ signal }) => getZoneParameters(assetId, wellId, formationId, signal),
  });
}

export function useZoneParameters(assetId: string, wellId: string, formationId: string) {
  return useQuery(zoneParametersQueryOptions(assetId, wellId, formationId));
}

export function usePutZoneParameters(assetId: string, wellId: string, formationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (params: ZoneParams) => putZoneParameters(assetId, wellId, formationId, params),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: wellScope(assetId, wellId) }),
  });
}
