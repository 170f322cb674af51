/**
 * Volumes for reading: stock-tank barrels as MSTB / MMSTB, gas as MMscf / Bcf, cubic metres
 * as 10^3 / 10^6 m3, each to four significant digits. Tables keep the unit beside the number.
 */

const sig4 = new Intl.NumberFormat('en', { maximumSignificantDigits: 4 });

function scaled(value: number, steps: [number, string][], base: string): string {
  if (!Number.isFinite(value)) return '–';
  for (const [factor, unit] of steps) if (Math.abs(value) >= factor) return `${sig4.format(value / factor)} ${unit}`;
  return `${sig4.format(value)} ${base}`;
}

/** 18,620,081 STB -> "18.62 MMSTB"; 2.5e10 scf -> "25 Bcf". */
export function formatFieldVolume(value: number, unit: 'STB' | 'scf'): string {
  return unit === 'STB'
    ? scaled(value, [[1e9, 'MMMSTB'], [1e6, 'MMSTB'], [1e3, 'MSTB']], 'STB')
    : scaled(value, [[1e12, 'Tcf'], [1e9, 'Bcf'], [1e6, 'MMscf'], [1e3, 'Mscf']], 'scf');
}

/** 2.96e6 m3 -> "2.96 × 10⁶ m³". */
export function formatMetricVolume(value: number): string {
  return scaled(value, [[1e9, '× 10⁹ m³'], [1e6, '× 10⁶ m³'], [1e3, '× 10³ m³']], 'm³');
}

/** A fraction as a percentage with one decimal: 0.2034 -> "20.3 %". */
export function formatFraction(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '–' : `${(value * 100).toFixed(1)} %`;
}

/** A plain number to four significant digits (en dash when missing). */
export function formatSig(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '–' : sig4.format(value);
}

/** The field unit a fluid's volumes come in. */
export function fieldUnitOf(fluid: 'oil' | 'gas'): 'STB' | 'scf' {
  return fluid === 'oil' ? 'STB' : 'scf';
}
