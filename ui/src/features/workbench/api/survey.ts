import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiError, apiJson, apiUpload } from '../../../lib/api-client';
import { wellScope } from '../../../lib/query-keys';
import type { SurveyDto } from '../../../types/workbench';
import { wellPath } from './paths';

/** GET .../survey: the stored deviation survey, or null when the well has none (404). */
export async function getSurvey(assetId: string, wellId: string, signal?: AbortSignal): Promise<SurveyDto | null> {
  try {
    return await apiJson<SurveyDto>(`${wellPath(assetId, wellId)}/survey`, { signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null;
    throw error;
  }
}

/**
 * POST .../survey, multipart field `file`: a CSV with header md, inclination (inc, incl), azimuth
 * (azi, az). `depthUnit` says the unit of md when the header does not (else the well's log unit).
 */
export function uploadSurvey(assetId: string, wellId: string, file: File, depthUnit?: 'ft' | 'm'): Promise<SurveyDto> {
  const form = new FormData();
  form.append('file', file, file.name);
  if (depthUnit) form.append('depthUnit', depthUnit);
  return apiUpload<SurveyDto>(`${wellPath(assetId, wellId)}/survey`, form);
}

export function surveyQueryOptions(assetId: string, wellId: string) {
  return queryOptions({
    queryKey: [...wellScope(assetId, wellId), 'survey'] as const,
    queryFn: ({ signal }) => getSurvey(assetId, wellId, signal),
  });
}

export function useSurvey(assetId: string, wellId: string) {
  return useQuery(surveyQueryOptions(assetId, wellId));
}

export function useUploadSurvey(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, depthUnit }: { file: File; depthUnit?: 'ft' | 'm' }) => uploadSurvey(assetId, wellId, file, depthUnit),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: wellScope(assetId, wellId) }),
  });
}
