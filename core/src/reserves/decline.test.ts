import { describe, expect, it } from 'vitest';
import {
  arpsCumulative,
  arpsEur,
  arpsRate,
  arpsRates,
  arpsTimeToRate,
  effectiveToNominal,
  nominalToEffective,
} from './decline.js';

const Y = 365.25;

/** Composite Simpson integration of the rate: an independent route to the cumulative. */
function simpson(f: (t: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe('arpsRate / arpsCumulative (Arps 1945, Trans. AIME 160)', () => {
  it('arpsRate exponential after one 1/D period is qi/e (by hand)', () => {
    expect(arpsRate({ qi: 1000, diNominalPerYear: 0.5, b: 0 }, 2 * Y)).toBeCloseTo(1000 / Math.E, 10);
  });

  it('arpsRate follows the Arps loss-ratio definition: d/dt [q / (-dq/dt)] = b', () => {
    // Arps (1945) defines exponential decline by a constant loss ratio a = -q/(dq/dt) and
    // hyperbolic decline by a constant derivative of the loss ratio, b. Numerical check.
    for (const b of [0, 0.3, 0.5, 1, 1.4]) {
      const p = { qi: 800, diNominalPerYear: 0.9, b };
      const loss = (t: number) => {
        const h = 1e-3;
        return -arpsRate(p, t) / ((arpsRate(p, t + h) - arpsRate(p, t - h)) / (2 * h));
      };
      const dadt = (loss(600) - loss(400)) / 200;
      expect(Math.abs(dadt - b), `b ${b}`).toBeLessThan(1e-4);
    }
  });

  it('arpsCumulative exponential equals (qi - q)/D exactly', () => {
    const p = { qi: 1000, diNominalPerYear: 0.4, b: 0 };
    const t = 1000;
    expect(arpsCumulative(p, t)).toBeCloseTo((1000 - arpsRate(p, t)) / (0.4 / Y), 6);
  });

  it('arpsCumulative harmonic equals (qi/D) ln(qi/q) exactly', () => {
    const p = { qi: 1000, diNominalPerYear: 0.4, b: 1 };
    const t = 1500;
    expect(arpsCumulative(p, t)).toBeCloseTo((1000 / (0.4 / Y)) * Math.log(1000 / arpsRate(p, t)), 6);
  });

  it('arpsCumulative hyperbolic equals the Simpson integral of arpsRate (independent route)', () => {
    for (const b of [0.2, 0.5, 0.8, 1.3]) {
      const p = { qi: 500, diNominalPerYear: 1.2, b };
      const num = simpson((t) => arpsRate(p, t), 0, 3000);
      expect(Math.abs(arpsCumulative(p, 3000) / num - 1), `b ${b}`).toBeLessThan(1e-9);
    }
  });

  it('arpsCumulative and arpsRate are continuous near b = 0 and b = 1', () => {
    const t = 2000;
    const base = { qi: 1000, diNominalPerYear: 0.7 };
    const rel = (a: number, b: number) => Math.abs(a / b - 1);
    expect(rel(arpsRate({ ...base, b: 1e-9 }, t), arpsRate({ ...base, b: 0 }, t))).toBeLessThan(1e-7);
    expect(rel(arpsCumulative({ ...base, b: 1e-9 }, t), arpsCumulative({ ...base, b: 0 }, t))).toBeLessThan(1e-7);
    expect(rel(arpsCumulative({ ...base, b: 1 - 1e-9 }, t), arpsCumulative({ ...base, b: 1 }, t))).toBeLessThan(1e-7);
    expect(rel(arpsCumulative({ ...base, b: 1 + 1e-9 }, t), arpsCumulative({ ...base, b: 1 }, t))).toBeLessThan(1e-7);
  });

  it('arpsRates maps an array and rejects negative time; bad params name the field', () => {
    const r = arpsRates({ qi: 100, diNominalPerYear: 0.3, b: 0.5 }, [0, 100]);
    expect(r[0]).toBe(100);
    expect(r[1]).toBeCloseTo(arpsRate({ qi: 100, diNominalPerYear: 0.3, b: 0.5 }, 100), 12);
    expect(() => arpsRate({ qi: 0, diNominalPerYear: 0.3, b: 0.5 }, 1)).toThrow(/arpsRate: qi/);
    expect(() => arpsRate({ qi: 1, diNominalPerYear: 0.3, b: 3 }, 1)).toThrow(/arpsRate: b/);
    expect(() => arpsRates({ qi: 1, diNominalPerYear: 0.3, b: 0 }, [-1])).toThrow(/arpsRates: tDays\[0\]/);
  });
});

describe('arpsEur and decline-rate conversions', () => {
  it('arpsEur exponential to an economic limit is (qi - qlim)/D and t = ln(qi/qlim)/D', () => {
    const p = { qi: 1000, diNominalPerYear: 0.5, b: 0 };
    const r = arpsEur(p, 50, 1e5);
    expect(r.remaining).toBeCloseTo(950 / (0.5 / Y), 4);
    expect(r.eur).toBeCloseTo(1e5 + 950 / (0.5 / Y), 4);
    expect(r.tLimitDays).toBeCloseTo(Math.log(20) / (0.5 / Y), 8);
    expect(arpsRate(p, r.tLimitDays)).toBeCloseTo(50, 9);
  });

  it('arpsTimeToRate hyperbolic is ((qi/q)^b - 1)/(b D) and inverts arpsRate', () => {
    const p = { qi: 1000, diNominalPerYear: 0.8, b: 0.6 };
    const t = arpsTimeToRate(p, 200);
    expect(t).toBeCloseTo((5 ** 0.6 - 1) / (0.6 * (0.8 / Y)), 8);
    expect(arpsRate(p, t)).toBeCloseTo(200, 9);
    expect(arpsEur(p, 2000).remaining).toBe(0); // limit above qi
  });

  it('nominalToEffective exponential: De = 1 - exp(-Di), 0.5 -> 0.393469 (by hand)', () => {
    expect(nominalToEffective(0.5, 0)).toBeCloseTo(1 - Math.exp(-0.5), 14);
    // harmonic: De = Di / (1 + Di), by hand 0.5/1.5
    expect(nominalToEffective(0.5, 1)).toBeCloseTo(1 / 3, 14);
  });

  it('effectiveToNominal inverts nominalToEffective for b in [0, 2]', () => {
    for (const b of [0, 0.25, 0.5, 1, 1.5, 2]) {
      for (const d of [0.05, 0.5, 3]) expect(effectiveToNominal(nominalToEffective(d, b), b)).toBeCloseTo(d, 10);
    }
    expect(() => effectiveToNominal(1.2, 0)).toThrow(/effectiveToNominal: effectivePerYear/);
  });
});
