import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';
import type { AuditEntry } from '../../../types/workbench';

export interface AuditFilter {
  entity?: string;
  limit?: number;
}

/** GET /assets/:assetId/audit?entity=&limit= (admins and reviewers). */
export function getAuditLog(assetId: string, filter: AuditFilter, signal?: AbortSignal): Promise<AuditEntry[]> {
  const q = new URLSearchParams();
  if (filter.entity) q.set('entity', filter.entity);
  if (filter.limit) q.set('limit', String(filter.limit));
  const qs = q.toString();
  return apiJson<AuditEntry[]>(`/assets/${encodeURIComponent(assetId)}/audit${qs ? `?${qs}` : ''}`, { signal });
}

export function auditLogQueryOptions(assetId: string, filter: AuditFilter = {}) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'audit', filter.entity ?? '', filter.limit ?? 0] as const,
    queryFn: ({ signal }) => getAuditLog(assetId, filter, signal),
    // Showing older entries keeps the current ones on screen while the longer list loads.
    placeholderData: keepPreviousData,
  });
}

export function useAuditLog(assetId: string, filter: AuditFilter = {}) {
  return useQuery(auditLogQueryOptions(assetId, filter));
}
