import { describe, expect, it } from 'vitest';
import { arpsEur, arpsRates } from './decline.js';
import { fitArpsDecline } from './decline-fit.js';
import { fillUniform } from './random.js';

const T = Float64Array.from({ length: 36 }, (_, i) => i * 30.4375); // monthly, 3 years

describe('fitArpsDecline (least squares on rate)', () => {
  it('fitArpsDecline recovers exact exponential, harmonic and hyperbolic parameters from noise-free rates', () => {
    const cases = [
      { kind: 'exponential' as const, params: { qi: 1200, diNominalPerYear: 0.35, b: 0 } },
      { kind: 'harmonic' as const, params: { qi: 900, diNominalPerYear: 0.8, b: 1 } },
      { kind: 'hyperbolic' as const, params: { qi: 1500, diNominalPerYear: 1.1, b: 0.55 } },
    ];
    for (const c of cases) {
      const fit = fitArpsDecline(T, arpsRates(c.params, T), { kind: c.kind });
      expect(Math.abs(fit.params.qi / c.params.qi - 1), c.kind).toBeLessThan(1e-5);
      expect(Math.abs(fit.params.diNominalPerYear / c.params.diNominalPerYear - 1), c.kind).toBeLessThan(1e-4);
      expect(Math.abs(fit.params.b - c.params.b), c.kind).toBeLessThan(1e-4);
      expect(fit.rSquared).toBeGreaterThan(0.999999);
    }
  });

  it('fitArpsDecline exponential matches the closed-form log-linear fit on noise-free data (independent route)', () => {
    // For exact exponential data, ln q = ln qi - D t exactly; slope by simple least squares on (t, ln q).
    const q = arpsRates({ qi: 700, diNominalPerYear: 0.6, b: 0 }, T);
    const n = T.length;
    const mt = T.reduce((s, v) => s + v, 0) / n;
    const ml = q.reduce((s, v) => s + Math.log(v), 0) / n;
    let sxy = 0;
    let sxx = 0;
    for (let i = 0; i < n; i++) {
      sxy += (T[i] - mt) * (Math.log(q[i]) - ml);
      sxx += (T[i] - mt) ** 2;
    }
    const fit = fitArpsDecline(T, q, { kind: 'exponential' });
    expect(fit.diNominalPerDay / (-sxy / sxx)).toBeCloseTo(1, 5);
  });

  it('fitArpsDecline with 3% noise keeps b and Di close and reports fit quality', () => {
    const u = fillUniform(77, new Float64Array(T.length));
    const truth = { qi: 1500, diNominalPerYear: 1.1, b: 0.55 };
    const q = arpsRates(truth, T).map((v, i) => v * (1 + 0.06 * (u[i] - 0.5)));
    const fit = fitArpsDecline(T, q, { kind: 'hyperbolic' });
    expect(Math.abs(fit.params.b - 0.55)).toBeLessThan(0.2);
    expect(Math.abs(fit.params.diNominalPerYear / 1.1 - 1)).toBeLessThan(0.15);
    expect(fit.rSquared).toBeGreaterThan(0.98);
    expect(fit.rmse).toBeGreaterThan(0);
    expect(fit.diEffectivePerYear).toBeLessThan(fit.params.diNominalPerYear);
    expect(fit.eur).toBeNull();
  });

  it('fitArpsDecline with an economic limit returns the EUR of the fitted curve', () => {
    const q = arpsRates({ qi: 1200, diNominalPerYear: 0.35, b: 0 }, T);
    const fit = fitArpsDecline(T, q, { kind: 'exponential', economicLimitRate: 20 });
    expect(fit.eur!.remaining).toBeCloseTo(arpsEur(fit.params, 20).remaining, 6);
    // Independent: exponential EUR = (qi - qlim)/D with the true parameters, to the fit's precision
    expect(fit.eur!.remaining / (1180 / (0.35 / 365.25))).toBeCloseTo(1, 4);
  });

  it('fitArpsDecline skips NaN pairs and rejects bad input naming the field', () => {
    const q = Array.from(arpsRates({ qi: 100, diNominalPerYear: 0.5, b: 0 }, T));
    q[3] = Number.NaN;
    const fit = fitArpsDecline(T, q, { kind: 'exponential' });
    expect(fit.skipped).toBe(1);
    expect(fit.n).toBe(35);
    expect(() => fitArpsDecline([0, 1], [1, -1], { kind: 'exponential' })).toThrow(/fitArpsDecline: rates\[1\]/);
    expect(() => fitArpsDecline([0, 1], [2, 1], { kind: 'hyperbolic' })).toThrow(/at least 3 points/);
    expect(() => fitArpsDecline([0, 1], [2], { kind: 'harmonic' })).toThrow(/same length/);
    expect(() => fitArpsDecline([0, 1], [2, 1], { kind: 'linear' as 'harmonic' })).toThrow(/fitArpsDecline: kind/);
  });
});
