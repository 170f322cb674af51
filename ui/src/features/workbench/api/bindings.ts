import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { BindingDto } from '../../../types/workbench';
import { mergedSamplesQueryOptions } from './get-merged-samples';
import { wellPath } from './paths';

export interface BindingInput {
  binding: string;
  logRunId: string;
  mnemonic: string;
}

/** GET .../bindings: stored bindings, or proposals from the recognised curve classes. */
export function getBindings(assetId: string, wellId: string, signal?: AbortSignal): Promise<BindingDto[]> {
  return apiJson<BindingDto[]>(`${wellPath(assetId, wellId)}/bindings`, { signal });
}

/** PUT .../bindings: confirms (or overrides) which curve feeds each input. */
export function putBindings(assetId: string, wellId: string, bindings: readonly BindingInput[]): Promise<BindingDto[]> {
  return apiJson<BindingDto[]>(`${wellPath(assetId, wellId)}/bindings`, { method: 'PUT', json: { bindings } });
}

export function bindingsQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'bindings'] as const,
    queryFn: ({ signal }) => getBindings(assetId, wellId, signal),
  });
}

export function useBindings(assetId: string, wellId: string) {
  return useQuery(bindingsQueryOptions(assetId, wellId));
}

/** New bindings change the merged samples too, so those are dropped and fetched again. */
export function usePutBindings(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (bindings: readonly BindingInput[]) => putBindings(assetId, wellId, bindings),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: wellScope(assetId, wellId) }),
        queryClient.invalidateQueries({ queryKey: mergedSamplesQueryOptions(assetId, wellId).queryKey }),
      ]),
  });
}
