import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import { productionPath, productionQueryOptions } from './get-production';

/** DELETE .../production/:seriesId (engineer/admin). */
export function deleteSeries(assetId: string, wellId: string, seriesId: string): Promise<void> {
  return apiJson<void>(`${productionPath(assetId, wellId)}/${encodeURIComponent(seriesId)}`, { method: 'DELETE' });
}

export function useDeleteSeries(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (seriesId: string) => deleteSeries(assetId, wellId, seriesId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productionQueryOptions(assetId, wellId).queryKey }),
  });
}
