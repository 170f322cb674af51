import { describe, expect, it } from 'vitest';
import { clampWindow, nearestIndex, panWindow, visibleRange, windowForKey, zoomWindow } from './depth-window';

const limits = { top: 1000, base: 2000 };

describe('depth window', () => {
  it('zoomWindow(0.5) about an anchor halves the span and keeps the anchor at the same fraction', () => {
    const w = zoomWindow({ top: 1000, base: 2000 }, 0.5, 1200, limits);
    expect(w.base - w.top).toBeCloseTo(500, 9);
    // 1200 sat 20% down the window before; it must still sit 20% down.
    expect((1200 - w.top) / (w.base - w.top)).toBeCloseTo(0.2, 9);
  });

  it('panWindow stops at the ends of the logged interval and keeps the span', () => {
    const w = panWindow({ top: 1800, base: 1900 }, 500, limits);
    expect(w).toEqual({ top: 1900, base: 2000 });
    const up = panWindow({ top: 1050, base: 1150 }, -500, limits);
    expect(up).toEqual({ top: 1000, base: 1100 });
  });

  it('clampWindow never zooms out past the whole well nor in below the minimum span', () => {
    expect(clampWindow({ top: 500, base: 2500 }, limits)).toEqual(limits);
    const tiny = clampWindow({ top: 1500, base: 1500.1 }, limits);
    expect(tiny.base - tiny.top).toBeCloseTo(2, 9);
  });

  it('windowForKey: arrows pan a tenth, + and - zoom about the middle, Home shows everything, other keys are ignored', () => {
    const w = { top: 1400, base: 1600 };
    expect(windowForKey('ArrowDown', w, limits)).toEqual({ top: 1420, base: 1620 });
    const zin = windowForKey('+', w, limits)!;
    expect(zin.base - zin.top).toBeCloseTo(160, 9);
    expect((zin.top + zin.base) / 2).toBeCloseTo(1500, 9);
    expect(windowForKey('Home', w, limits)).toEqual(limits);
    expect(windowForKey('x', w, limits)).toBeNull();
  });

  it('visibleRange and nearestIndex find samples by binary search on increasing depth', () => {
    const depth = Float64Array.from({ length: 11 }, (_, i) => 1000 + i * 0.5); // 1000 .. 1005
    expect(visibleRange(depth, { top: 1001.2, base: 1002.2 })).toEqual([2, 7]);
    expect(nearestIndex(depth, 1001.2)).toBe(2);
    expect(nearestIndex(depth, 1001.3)).toBe(3);
    expect(nearestIndex(depth, 900)).toBe(0);
    expect(nearestIndex(depth, 9000)).toBe(10);
    expect(nearestIndex(new Float64Array(0), 1)).toBe(-1);
  });
});
