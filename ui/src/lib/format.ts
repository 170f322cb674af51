/** Display formatting shared by the screens. */

const numberFormat = new Intl.NumberFormat('en', { maximumFractionDigits: 2 });
const compactFormat = new Intl.NumberFormat('en', { maximumSignificantDigits: 4 });

/** A number for a table cell; an en dash for missing. */
export function formatNumber(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '–' : numberFormat.format(value);
}

/** A sample value (curve min/max) to 4 significant digits. */
export function formatValue(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '–' : compactFormat.format(value);
}

/** "1200 – 1450 ft", or an en dash when either end is missing. */
export function formatDepthRange(top: number | null | undefined, base: number | null | undefined, unit: string | null | undefined): string {
  if (top === null || top === undefined || base === null || base === undefined) return '–';
  return `${formatNumber(top)} – ${formatNumber(base)}${unit ? ` ${unit}` : ''}`;
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : date.toLocaleString('en', { dateStyle: 'medium', timeStyle: 'short' });
}
