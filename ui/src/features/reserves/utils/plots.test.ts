import { describe, expect, it } from 'vitest';
import type { TornadoRowDto } from '../../../types/reserves';
import { exceedanceLayout, histogramLayout, tornadoLayout } from './plots';

describe('reserves chart layouts', () => {
  it('histogramLayout: one bar per bin, the tallest bar reaches the top of a nice axis', () => {
    const { bars, y } = histogramLayout([0, 1, 2, 3], [5, 10, 2], { width: 300, height: 100 });
    expect(bars).toHaveLength(3);
    expect(bars[1].height).toBeCloseTo(100 * (10 / y.domain()[1]), 9);
    expect(bars[0].x).toBe(0);
    expect(bars[2].x + bars[2].width).toBeCloseTo(299, 9); // 1 px gap between bars
  });

  it('exceedanceLayout: probability 1 at the top (y = 0), 0 at the bottom', () => {
    const { path, y } = exceedanceLayout([10, 20, 30], [1, 0.5, 0], { width: 200, height: 100 });
    expect(y(1)).toBe(0);
    expect(y(0)).toBe(100);
    expect(path.startsWith('M')).toBe(true);
    expect(path.split('L')).toHaveLength(3);
  });

  it('tornadoLayout: bars start at the base output and reach each output, in the given order', () => {
    const row = (input: TornadoRowDto['input'], p90: number, p10: number): TornadoRowDto => ({
      input,
      inputP90: 0,
      inputP10: 0,
      outputAtInputP90: p90,
      outputAtInputP10: p10,
      low: Math.min(p90, p10),
      high: Math.max(p90, p10),
      swing: Math.abs(p10 - p90),
    });
    const { bars, x, baseX } = tornadoLayout([row('area', 60, 150), row('sw', 110, 90)], 100, { width: 400, height: 120 });
    expect(bars.map((b) => b.input)).toEqual(['area', 'sw']);
    expect(bars[0].atP90.x).toBeCloseTo(x(60), 9);
    expect(bars[0].atP90.x + bars[0].atP90.width).toBeCloseTo(baseX, 9);
    expect(bars[0].atP10.x).toBeCloseTo(baseX, 9);
    expect(bars[0].y).toBeLessThan(bars[1].y);
    // an input whose high value lowers the output (Sw) puts its P10 bar left of the base
    expect(bars[1].atP10.x).toBeCloseTo(x(90), 9);
  });
});
