/** Gas volumes on an axis: scf shown as MMscf or Bcf so tick labels stay short. */
export function gasAxis(largestScf: number): { factor: number; label: string } {
  if (largestScf >= 1e9) return { factor: 1e9, label: 'Bcf' };
  if (largestScf >= 1e6) return { factor: 1e6, label: 'MMscf' };
  return { factor: 1, label: 'scf' };
}

const sig4 = new Intl.NumberFormat('en', { maximumSignificantDigits: 4 });

/** A number to four significant digits (en dash when missing). */
export function sig(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '–' : sig4.format(value);
}

/** Gas volume for reading: 2.5e10 -> "25 Bcf". */
export function formatGas(scf: number): string {
  const a = gasAxis(Math.abs(scf));
  return `${sig(scf / a.factor)} ${a.label}`;
}

/** Poreline's own colours for the cross-check plots. */
export const CROSS_CHECK_COLOURS = { point: '#2f5f7a', fit: '#b5653f', forecast: '#b5653f', limit: '#7a6a4f' } as const;
