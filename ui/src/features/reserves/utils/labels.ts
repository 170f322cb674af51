import type { InputName } from '../../../types/reserves';

/** Display names of the case inputs (units come from the case). */
export function inputLabel(name: InputName, fluid: 'oil' | 'gas'): string {
  switch (name) {
    case 'area':
      return 'Area';
    case 'netPay':
      return 'Net pay';
    case 'porosity':
      return 'Porosity';
    case 'sw':
      return 'Sw';
    case 'bo':
      return fluid === 'oil' ? 'Bo' : 'Bg';
    case 'recoveryFactor':
      return 'Recovery factor';
  }
}

/** The unit of each input in a case with these settings. */
export function inputUnit(name: InputName, c: { fluid: 'oil' | 'gas'; areaUnit: 'acre' | 'km2'; lengthUnit: 'ft' | 'm' }): string {
  switch (name) {
    case 'area':
      return c.areaUnit === 'acre' ? 'acres' : 'km²';
    case 'netPay':
      return c.lengthUnit;
    case 'bo':
      return c.fluid === 'oil' ? 'rb/STB' : 'rcf/scf';
    default:
      return 'v/v';
  }
}

/** A scale for volume axes: the unit and divisor that keep tick labels short. */
export function volumeAxis(unit: 'STB' | 'scf', largest: number): { factor: number; label: string } {
  if (unit === 'STB') {
    if (largest >= 1e6) return { factor: 1e6, label: 'MMSTB' };
    if (largest >= 1e3) return { factor: 1e3, label: 'MSTB' };
    return { factor: 1, label: 'STB' };
  }
  if (largest >= 1e9) return { factor: 1e9, label: 'Bcf' };
  if (largest >= 1e6) return { factor: 1e6, label: 'MMscf' };
  return { factor: 1, label: 'scf' };
}

/** Poreline's own colours for the reserves charts. */
export const RESERVES_COLOURS = {
  bar: '#7fa893', // sea-glass
  barEdge: '#4e7a66',
  curve: '#2f5f7a', // harbour
  p90: '#b5653f', // ember: the low estimate
  p50: '#5a5f8f', // heron
  p10: '#4c8a5a', // kelp: the high estimate
  mean: '#7a6a4f', // umber
  lowSide: '#c98f6d', // input at its P90
  highSide: '#6f9cc0', // input at its P10
  fit: '#b5653f',
} as const;
