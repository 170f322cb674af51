import { apiBinary } from '../../../lib/api-client';

export type TableFormat = 'csv' | 'xlsx';
export type InterpretationFormat = 'csv' | 'xlsx' | 'las';

/** GET /assets/:assetId/zone-table/export?format=&formationId=&approvedOnly= : the file's bytes. */
export function exportZoneTable(assetId: string, format: TableFormat, formationId: string | null, approvedOnly = false): Promise<ArrayBuffer> {
  const q = new URLSearchParams({ format });
  if (formationId) q.set('formationId', formationId);
  if (approvedOnly) q.set('approvedOnly', 'true');
  return apiBinary(`/assets/${encodeURIComponent(assetId)}/zone-table/export?${q}`);
}

/** GET .../interpretations/:id/export?format=csv|xlsx|las : the file's bytes. */
export function exportInterpretation(assetId: string, wellId: string, id: string, format: InterpretationFormat): Promise<ArrayBuffer> {
  return apiBinary(
    `/assets/${encodeURIComponent(assetId)}/wells/${encodeURIComponent(wellId)}/interpretations/${encodeURIComponent(id)}/export?format=${format}`,
  );
}

export const MIME: Record<InterpretationFormat, string> = {
  csv: 'text/csv',
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  las: 'text/plain',
};
