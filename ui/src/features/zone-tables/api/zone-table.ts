import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { ZoneTableRow } from '../../../types/workbench';

/**
 * GET /assets/:assetId/zone-table?formationId=&approvedOnly=: one row per well and zone, from the
 * newest version of each well (or its newest approved one).
 */
export function getZoneTable(assetId: string, formationId: string | null, approvedOnly = false, signal?: AbortSignal): Promise<ZoneTableRow[]> {
  const q = new URLSearchParams();
  if (formationId) q.set('formationId', formationId);
  if (approvedOnly) q.set('approvedOnly', 'true');
  const qs = q.toString();
  return apiJson<ZoneTableRow[]>(`/assets/${encodeURIComponent(assetId)}/zone-table${qs ? `?${qs}` : ''}`, { signal });
}

export function zoneTableQueryOptions(assetId: string, formationId: string | null, approvedOnly = false) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'zone-table', formationId ?? 'all', approvedOnly] as const,
    queryFn: ({ signal }) => getZoneTable(assetId, formationId, approvedOnly, signal),
  });
}

export function useZoneTable(assetId: string, formationId: string | null, approvedOnly = false) {
  return useQuery(zoneTableQueryOptions(assetId, formationId, approvedOnly));
}
