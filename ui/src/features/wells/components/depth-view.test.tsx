import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DepthView } from './depth-view';

describe('DepthView', () => {
  const depth = new Float64Array([2000, 2000.5, 2001, 2001.5, 2002]);
  const curves = [
    { mnemonic: 'GR', unit: 'gAPI', curveClass: 'gamma_ray', values: new Float64Array([45, 60, NaN, 80, 75]) },
    { mnemonic: 'RDEP', unit: 'ohm.m', curveClass: 'resistivity_deep', values: new Float64Array([2, 20, 200, 20, 2]) },
    { mnemonic: 'RHOB', unit: 'g/cm3', curveClass: 'density', values: new Float64Array([2.31, 2.35, 2.4, 2.45, 2.5]) },
  ];

  it('renders one labelled SVG with one path per curve, tagged with its mnemonic', () => {
    render(<DepthView wellName="Kestrel-2" depthUnit="m" depth={depth} curves={curves} />);
    const svg = screen.getByRole('img', { name: 'Depth view of Kestrel-2' });
    const paths = Array.from(svg.querySelectorAll('path[data-curve]'));
    expect(paths.map((p) => p.getAttribute('data-curve'))).toEqual(['GR', 'RDEP', 'RHOB']);
  });

  it('breaks the GR line at its NaN sample and keeps the complete curves whole', () => {
    render(<DepthView wellName="Kestrel-2" depthUnit="m" depth={depth} curves={curves} />);
    const svg = screen.getByRole('img', { name: 'Depth view of Kestrel-2' });
    const moves = (mnemonic: string) => (svg.querySelector(`path[data-curve="${mnemonic}"]`)?.getAttribute('d') ?? '').split('M').length - 1;
    expect(moves('GR')).toBe(2);
    expect(moves('RDEP')).toBe(1);
    expect(moves('RHOB')).toBe(1);
  });

  it('labels the resistivity track as logarithmic and shows each curve name and unit', () => {
    render(<DepthView wellName="Kestrel-2" depthUnit="m" depth={depth} curves={curves} />);
    const svg = screen.getByRole('img', { name: 'Depth view of Kestrel-2' });
    expect(svg.textContent).toContain('ohm.m · log');
    expect(svg.textContent).toContain('gAPI');
    expect(svg.textContent).not.toContain('gAPI · log');
  });
});
