import { describe, expect, it } from 'vitest';
import { tornado } from './tornado.js';

describe('tornado (one-at-a-time, inputs at P90 and P10)', () => {
  it('tornado of y = 2a + b ranks inputs by swing computed by hand', () => {
    const r = tornado({
      inputs: { a: { kind: 'uniform', min: 0, max: 10 }, b: { kind: 'normal', mean: 0, sd: 1 }, c: { kind: 'fixed', value: 3 } },
      model: (v) => 2 * v.a + v.b + v.c,
    });
    expect(r.baseOutput).toBeCloseTo(2 * 5 + 0 + 3, 12); // others at P50
    expect(r.rows.map((x) => x.input)).toEqual(['a', 'b', 'c']);
    expect(r.rows[0].inputP90).toBeCloseTo(1, 12); // 10th percentile of U(0, 10)
    expect(r.rows[0].inputP10).toBeCloseTo(9, 12);
    expect(r.rows[0].swing).toBeCloseTo(16, 12); // 2 x (9 - 1)
    expect(r.rows[1].swing).toBeCloseTo(2 * 1.2815515655446004, 12);
    expect(r.rows[2].swing).toBe(0);
  });

  it('tornado of an inverse input (Bo) gives the lower output at the input P10', () => {
    const r = tornado({
      inputs: { bo: { kind: 'uniform', min: 1.1, max: 1.3 }, phi: { kind: 'fixed', value: 0.2 } },
      model: (v) => v.phi / v.bo,
    });
    const row = r.rows.find((x) => x.input === 'bo')!;
    expect(row.outputAtInputP10).toBeLessThan(row.outputAtInputP90);
    expect(row.low).toBe(row.outputAtInputP10);
    expect(row.high).toBe(row.outputAtInputP90);
  });

  it("tornado with base 'base' holds the other inputs at the given values", () => {
    const r = tornado({
      inputs: { a: { kind: 'uniform', min: 0, max: 10 }, b: { kind: 'uniform', min: 0, max: 10 } },
      model: (v) => v.a * v.b,
      base: 'base',
      baseValues: { a: 2, b: 4 },
    });
    expect(r.baseOutput).toBe(8);
    const a = r.rows.find((x) => x.input === 'a')!;
    expect(a.outputAtInputP10).toBeCloseTo(9 * 4, 12);
    expect(r.method).toMatch(/base/);
    expect(() => tornado({ inputs: { a: { kind: 'fixed', value: 1 } }, model: (v) => v.a, base: 'base' })).toThrow(
      /tornado: baseValues\.a/,
    );
  });
});
