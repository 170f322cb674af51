import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { ZoneTableRow } from '../../../types/workbench';

/** GET /assets/:assetId/zone-table?formationId=: the latest interpretation of each well, one row per zone. */
export function getZoneTable(assetId: string, formationId: string | null, signal?: AbortSignal): Promise<ZoneTableRow[]> {
  const qs = formationId ? `?formationId=${encodeURIComponent(formationId)}` : '';
  return apiJson<ZoneTableRow[]>(`/assets/${encodeURIComponent(assetId)}/zone-table${qs}`, { signal });
}

export function zoneTableQueryOptions(assetId: string, formationId: string | null) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'zone-table', formationId ?? 'all'] as const,
    queryFn: ({ signal }) => getZoneTable(assetId, formationId, signal),
  });
}

export function useZoneTable(assetId: string, formationId: string | null) {
  return useQuery(zoneTableQueryOptions(assetId, formationId));
}
