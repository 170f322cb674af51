import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiUpload } from '../../../lib/api-client';
import type { SeriesDto, SeriesKind } from '../../../types/reserves';
import { productionPath, productionQueryOptions } from './get-production';

export interface UploadSeriesInput {
  kind: SeriesKind;
  fluid: 'gas' | 'oil';
  /** The CSV: a chosen file, or text typed into the page (sent as a file). */
  file: File | Blob;
  fileName: string;
  units: { cumGasUnit?: string; pressureUnit?: string; timeUnit?: string; rateUnit?: string };
  label?: string;
}

/** A line-numbered problem of a refused CSV. */
export interface CsvProblem {
  line: number | null;
  message: string;
}

/**
 * POST .../production/upload (multipart; engineer/admin). A refused file answers 400 with
 * `errors: [{ line, message }]` and nothing stored; the ApiError carries that body.
 */
export function uploadSeries(assetId: string, wellId: string, input: UploadSeriesInput): Promise<SeriesDto> {
  const form = new FormData();
  form.append('kind', input.kind);
  form.append('fluid', input.fluid);
  for (const [k, v] of Object.entries(input.units)) if (v) form.append(k, v);
  if (input.label) form.append('label', input.label);
  form.append('file', input.file, input.fileName);
  return apiUpload<SeriesDto>(`${productionPath(assetId, wellId)}/upload`, form);
}

/** The line problems in an upload error body, if it has them. */
export function csvProblems(body: unknown): CsvProblem[] {
  if (body && typeof body === 'object' && Array.isArray((body as { errors?: unknown }).errors)) return (body as { errors: CsvProblem[] }).errors;
  return [];
}

export function useUploadSeries(assetId: string, wellId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadSeriesInput) => uploadSeries(assetId, wellId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productionQueryOptions(assetId, wellId).queryKey }),
  });
}
