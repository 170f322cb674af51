import { describe, expect, it } from 'vitest';
import { formatFieldVolume, formatFraction, formatMetricVolume } from './format-volume';

describe('formatFieldVolume', () => {
  it('scales barrels to MMSTB and gas to Bcf, four significant digits', () => {
    expect(formatFieldVolume(18_620_081, 'STB')).toBe('18.62 MMSTB');
    expect(formatFieldVolume(25_100_000_000, 'scf')).toBe('25.1 Bcf');
    expect(formatFieldVolume(950, 'STB')).toBe('950 STB');
    expect(formatFieldVolume(NaN, 'scf')).toBe('–');
  });
  it('formatMetricVolume writes powers of ten; formatFraction writes percent', () => {
    expect(formatMetricVolume(2_960_000)).toBe('2.96 × 10⁶ m³');
    expect(formatFraction(0.2034)).toBe('20.3 %');
    expect(formatFraction(null)).toBe('–');
  });
});
