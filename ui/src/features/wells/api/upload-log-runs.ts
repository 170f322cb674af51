import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiError, apiUpload } from '../../../lib/api-client';
import type { UploadResponse } from '../../../types/api';
import { wellQueryOptions } from './get-well';
import { wellsQueryOptions } from './get-wells';

/**
 * POST /api/assets/:assetId/wells/:wellId/log-runs, multipart field `files`.
 * A 400 whose body still lists `results` (every file rejected) is returned as results, since the
 * per-file messages are the useful answer; any other failure throws the ApiError.
 */
export async function uploadLogRuns(
  assetId: string,
  wellId: string,
  files: readonly File[],
  onProgress?: (fraction: number) => void,
): Promise<UploadResponse> {
  const form = new FormData();
  for (const file of files) form.append('files', file, file.name);
  const path = `/assets/${encodeURIComponent(assetId)}/wells/${encodeURIComponent(wellId)}/log-runs`;
  try {
    return await apiUpload<UploadResponse>(path, form, { onProgress });
  } catch (error) {
    if (error instanceof ApiError && error.status === 400 && hasResults(error.body)) return error.body;
    throw error;
  }
}

function hasResults(body: unknown): body is UploadResponse {
  return typeof body === 'object' && body !== null && Array.isArray((body as UploadResponse).results);
}

/** Upload mutation with its byte progress (0..1, null when idle); refreshes the well list and the well. */
export function useUploadLogRuns(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const mutation = useMutation({
    mutationFn: (files: readonly File[]) => {
      setProgress(0);
      return uploadLogRuns(assetId, wellId, files, setProgress);
    },
    onSettled: async () => {
      setProgress(null);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: wellsQueryOptions(assetId).queryKey }),
        queryClient.invalidateQueries({ queryKey: wellQueryOptions(assetId, wellId).queryKey }),
      ]);
    },
  });
  return { ...mutation, progress };
}
