import { StreamableFile } from '@nestjs/common';

/** A file to send: bytes, media type and a download name. */
export interface ExportFile {
  bytes: Uint8Array;
  contentType: string;
  fileName: string;
}

export const CONTENT_TYPES = {
  csv: 'text/csv; charset=utf-8',
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  las: 'text/plain; charset=utf-8',
} as const;

/** A file name safe in a Content-Disposition header (letters, digits, - _ . only). */
export function safeFileName(name: string): string {
  return name.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'export';
}

/** Flattens nested parameters to [path, value] rows ('rw.kind', 'at_temperature'). */
export function flattenParameters(value: unknown, prefix = ''): [string, string | number | null][] {
  if (value === null || typeof value !== 'object') return [[prefix, typeof value === 'number' || typeof value === 'string' || value === null ? value : String(value)]];
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => flattenParameters(v, prefix ? `${prefix}.${k}` : k));
}

/** The file as a download (Content-Disposition: attachment). */
export function toStreamable(file: ExportFile): StreamableFile {
  return new StreamableFile(file.bytes, { type: file.contentType, length: file.bytes.length, disposition: `attachment; filename="${file.fileName}"` });
}
