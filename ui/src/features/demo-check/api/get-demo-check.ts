import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { assetScope } from '../../../lib/query-keys';

/** One compared quantity of one zone (GET /assets/:assetId/demo-check). Thickness in ft (MD). */
export interface DemoZoneRow {
  well: string;
  zone: string;
  zoneKind: 'formation' | 'fluid';
  quantity: 'net reservoir' | 'net pay' | 'mean porosity' | 'mean Sw';
  unit: 'ft' | 'v/v';
  model: number;
  evaluated: number | null;
  difference: number | null;
  tolerance: number;
  pass: boolean;
}

/** In-place volume of one accumulation: the model's and the one from the evaluated fluid zones. */
export interface DemoVolumeRow {
  accumulation: string;
  fluid: 'gas' | 'oil';
  unit: 'scf' | 'STB';
  model: number;
  evaluated: number | null;
  relativeDifference: number | null;
  tolerance: number;
  pass: boolean;
  wells: string[];
  missingWells: string[];
  areaAcres: number;
  fvf: number;
  modelInputs: { netPayFt: number; porosity: number; sw: number };
  evaluatedInputs: { netPayFt: number; porosity: number; sw: number } | null;
}

export interface DemoCheck {
  assetId: string;
  generatedAt: string;
  explanation: string;
  basis: string[];
  tolerances: { thickness: string; porosity: number; sw: number; volumeRelative: number };
  summary: {
    zoneRows: number;
    zoneRowsPassed: number;
    volumeRows: number;
    volumeRowsPassed: number;
    zonesEvaluated: number;
    zonesInModel: number;
    allPass: boolean;
    largest: { netReservoirFt: number; netPayFt: number; porosity: number; sw: number; volumeRelative: number };
  };
  zones: DemoZoneRow[];
  volumes: DemoVolumeRow[];
  notEvaluated: { well: string; zone: string; reason: string }[];
  caution: string;
}

/** GET /api/assets/:assetId/demo-check ("model vs evaluated"; 404 for any asset but the demo one). */
export function getDemoCheck(assetId: string, signal?: AbortSignal): Promise<DemoCheck> {
  return apiJson<DemoCheck>(`/assets/${encodeURIComponent(assetId)}/demo-check`, { signal });
}

export function demoCheckQueryOptions(assetId: string) {
  return queryOptions({
    queryKey: [...assetScope(assetId), 'demo-check'] as const,
    queryFn: ({ signal }) => getDemoCheck(assetId, signal),
    // The check re-evaluates ten wells on the server: keep an answer for five minutes.
    staleTime: 5 * 60_000,
  });
}

export function useDemoCheck(assetId: string) {
  return useQuery(demoCheckQueryOptions(assetId));
}
