import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { WorkbenchDepthView } from './workbench-depth-view';

const n = 201;
const depth = Float64Array.from({ length: n }, (_, i) => 5000 + i * 0.5); // 5000 .. 5100 ft
const ramp = (a: number, b: number) => Float64Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));
const curves = {
  GR: ramp(30, 120),
  RT: ramp(2, 200),
  RHOB: ramp(2.2, 2.6),
  NPHI: ramp(0.3, 0.1),
  VSH: ramp(0, 1),
  PHIE: ramp(0.25, 0.02),
  SW: ramp(0.2, 1),
  NET_RES: Float64Array.from({ length: n }, (_, i) => (i < 100 ? 1 : 0)),
  NET_PAY: Float64Array.from({ length: n }, (_, i) => (i < 40 ? 1 : i < 100 ? 0 : NaN)),
};
const zones = [
  { name: 'Upper Sand', formation: 'Upper Sand', colour: '#c9a227', top: 5000, base: 5050 },
  { name: 'Lower Shale', formation: 'Lower Shale', colour: '#6a7fb0', top: 5050, base: 5100 },
];
const cutoffs = {
  'Upper Sand': { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null },
  'Lower Shale': { vshMax: 0.3, phiMin: 0.1, swMax: 0.5, permMin: null },
};

function view(props: Partial<React.ComponentProps<typeof WorkbenchDepthView>> = {}) {
  render(<WorkbenchDepthView wellName="Kite-3" depthUnit="ft" depth={depth} curves={curves} zones={zones} cutoffs={cutoffs} {...props} />);
  return screen.getByRole('img', { name: /Workbench depth view of Kite-3/ });
}

describe('WorkbenchDepthView', () => {
  it('draws every curve present as a path tagged with data-curve, in API RP 31A track order', () => {
    const svg = view();
    const keys = Array.from(svg.querySelectorAll('[data-curve]')).map((p) => p.getAttribute('data-curve'));
    expect(keys).toEqual(['GR', 'RT', 'RHOB', 'NPHI', 'VSH', 'PHIE', 'SW', 'NET_RES', 'NET_PAY']);
    const tracks = Array.from(svg.querySelectorAll('[data-track]')).map((t) => t.getAttribute('data-track'));
    expect(tracks).toEqual(['correlation', 'depth', 'resistivity', 'porosity-logs', 'vsh', 'porosity', 'saturation', 'flags']);
  });

  it('draws one band per run of net pay and a cutoff line per zone on VSH, PHIE and SW', () => {
    const svg = view();
    const pay = svg.querySelector('[data-curve="NET_PAY"]')!.getAttribute('d')!;
    expect(pay.split('M').length - 1).toBe(1); // samples 0..39 only (NaN is not pay)
    const lines = Array.from(svg.querySelectorAll('[data-cutoff]')).map((l) => l.getAttribute('data-cutoff'));
    expect(lines.sort()).toEqual(['PHIE-Lower Shale', 'PHIE-Upper Sand', 'SW-Lower Shale', 'SW-Upper Sand', 'VSH-Lower Shale', 'VSH-Upper Sand']);
    expect(svg.textContent).toContain('Upper Sand');
  });

  it('zooms in with + and back to the whole well with Home, from the keyboard', () => {
    const svg = view();
    const span = () => Number(svg.getAttribute('data-window-base')) - Number(svg.getAttribute('data-window-top'));
    expect(span()).toBeCloseTo(100, 9);
    fireEvent.keyDown(svg, { key: '+' });
    expect(span()).toBeCloseTo(80, 9);
    fireEvent.keyDown(svg, { key: 'ArrowDown' });
    expect(Number(svg.getAttribute('data-window-top'))).toBeCloseTo(5018, 9); // centred zoom leaves 5010, then 10% of 80 down
    fireEvent.keyDown(svg, { key: 'Home' });
    expect(span()).toBeCloseTo(100, 9);
  });

  it('reports the clicked depth while picking a top', () => {
    const onPick = vi.fn();
    view({ onPickDepth: onPick, plotHeight: 500 });
    const plot = screen.getByTestId('depth-view-plot');
    plot.getBoundingClientRect = () => ({ top: 100, left: 0, height: 500, width: 800, bottom: 600, right: 800, x: 0, y: 100, toJSON: () => ({}) });
    fireEvent.pointerDown(plot, { clientY: 350, pointerId: 1 });
    fireEvent.pointerUp(plot, { clientY: 350, pointerId: 1 });
    expect(onPick).toHaveBeenCalledWith(5050); // half way down 5000..5100
  });
});
