import { describe, expect, it } from 'vitest';
import { buildDepthView, DEFAULT_LAYOUT, isResistivityClass } from './depth-tracks';

/** Number of subpaths in SVG path data: each starts with a moveto. */
const subpaths = (d: string | null) => (d ?? '').split('M').length - 1;

/** First point "M x,y" of the path data. */
function firstPoint(d: string | null): [number, number] {
  const match = /^M([-\d.e]+),([-\d.e]+)/.exec(d ?? '');
  if (!match) throw new Error(`no moveto in ${d}`);
  return [Number(match[1]), Number(match[2])];
}

describe('buildDepthView', () => {
  const depth = new Float64Array([1000, 1001, 1002, 1003, 1004]);

  it('buildDepthView puts the shallowest depth at the top and the deepest at the bottom of the plot', () => {
    const view = buildDepthView(depth, [{ mnemonic: 'GR', unit: 'gAPI', curveClass: 'gamma_ray', values: [10, 20, 30, 40, 50] }]);
    expect(view.depthDomain).toEqual([1000, 1004]);
    // The first sample (1000) is drawn at y = 0; the y of each later point grows with depth.
    expect(firstPoint(view.tracks[0].path)[1]).toBeCloseTo(0, 6);
    const ticks = view.depthTicks.map((t) => t.position);
    expect([...ticks].sort((a, b) => a - b)).toEqual(ticks);
    const deepest = view.depthTicks.find((t) => t.value === 1004);
    expect(deepest?.position).toBeCloseTo(DEFAULT_LAYOUT.plotHeight, 6);
  });

  it('buildDepthView breaks the line at a NaN sample instead of joining across it', () => {
    const view = buildDepthView(depth, [{ mnemonic: 'GR', unit: 'gAPI', curveClass: null, values: [10, 20, NaN, 40, 50] }]);
    expect(subpaths(view.tracks[0].path)).toBe(2);
  });

  it('buildDepthView keeps one unbroken line when no sample is missing', () => {
    const view = buildDepthView(depth, [{ mnemonic: 'GR', unit: 'gAPI', curveClass: null, values: [10, 20, 30, 40, 50] }]);
    expect(subpaths(view.tracks[0].path)).toBe(1);
  });

  it('buildDepthView draws a resistivity-class curve on a log scale: 10 sits halfway between 1 and 100', () => {
    // On a log10 axis from 1 to 100, log10(10) = 1 is the midpoint of 0..2 (independent of the code).
    const view = buildDepthView(depth.subarray(0, 3), [{ mnemonic: 'RT', unit: 'ohm.m', curveClass: 'resistivity_deep', values: [10, 1, 100] }]);
    const track = view.tracks[0];
    expect(track.scaleType).toBe('log');
    expect(track.domain).toEqual([1, 100]);
    expect(firstPoint(track.path)[0]).toBeCloseTo(DEFAULT_LAYOUT.trackWidth / 2, 6);
    expect(track.ticks.map((t) => t.value)).toEqual([1, 10, 100]);
  });

  it('buildDepthView treats values <= 0 on a log scale as gaps', () => {
    const view = buildDepthView(depth, [{ mnemonic: 'RT', unit: 'ohm.m', curveClass: 'resistivity', values: [2, 3, 0, 5, 6] }]);
    expect(subpaths(view.tracks[0].path)).toBe(2);
  });

  it('buildDepthView places tracks side by side with one shared depth scale', () => {
    const view = buildDepthView(depth, [
      { mnemonic: 'GR', unit: 'gAPI', curveClass: null, values: [10, 20, 30, 40, 50] },
      { mnemonic: 'RHOB', unit: 'g/cm3', curveClass: 'density', values: [2.3, 2.4, 2.5, 2.4, 2.3] },
    ]);
    const [a, b] = view.tracks;
    expect(b.left - a.left).toBe(DEFAULT_LAYOUT.trackWidth + DEFAULT_LAYOUT.trackGap);
    // Both first samples sit at the same depth, so at the same y.
    expect(firstPoint(a.path)[1]).toBeCloseTo(firstPoint(b.path)[1], 9);
  });

  it('buildDepthView refuses a curve whose length differs from the depth index, naming the curve', () => {
    expect(() => buildDepthView(depth, [{ mnemonic: 'NPHI', unit: 'v/v', curveClass: null, values: [0.2, 0.3] }])).toThrow(
      /buildDepthView: curve NPHI has 2 samples, depth has 5/,
    );
  });

  it('buildDepthView refuses a depth index with no finite value', () => {
    expect(() => buildDepthView([NaN, NaN], [])).toThrow(/buildDepthView: depth has no finite value/);
  });
});

describe('isResistivityClass', () => {
  it('isResistivityClass accepts the resistivity classes core recognises, and nothing else', () => {
    expect(isResistivityClass('deep_resistivity')).toBe(true);
    expect(isResistivityClass('shallow_resistivity')).toBe(true);
    expect(isResistivityClass('resistivity_deep')).toBe(true);
    expect(isResistivityClass('Resistivity')).toBe(true);
    expect(isResistivityClass('gamma_ray')).toBe(false);
    expect(isResistivityClass(null)).toBe(false);
  });
});
