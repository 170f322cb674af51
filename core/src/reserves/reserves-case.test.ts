import { describe, expect, it } from 'vitest';
import { gasPvt } from './gas-fvf.js';
import { type ReservesCaseInput, evaluateReservesCase } from './reserves-case.js';
import { gasInPlace, oilInPlace } from './volumetrics.js';

const OIL: ReservesCaseInput = {
  fluid: 'oil',
  area: 640,
  areaUnit: 'acre',
  netPay: 30,
  porosity: 0.2,
  sw: 0.25,
  recoveryFactor: 0.3,
  bo: 1.2,
};

const DISTS: ReservesCaseInput['distributions'] = {
  area: { kind: 'triangular', min: 400, mode: 640, max: 900 },
  netPay: { kind: 'lognormal', p90: 20, p10: 45 },
  porosity: { kind: 'normal', mean: 0.2, sd: 0.03, truncate: { min: 0.05, max: 0.35 } },
  sw: { kind: 'uniform', min: 0.2, max: 0.4 },
  bo: { kind: 'triangular', min: 1.1, mode: 1.2, max: 1.35 },
  recoveryFactor: { kind: 'lognormal', mean: 0.3, sd: 0.05, truncate: { max: 0.7 } },
};

describe('evaluateReservesCase', () => {
  it('evaluateReservesCase (oil, deterministic) equals oilInPlace x RF, metric by 0.158987294928 m3/bbl', () => {
    const r = evaluateReservesCase(OIL);
    const n = oilInPlace({ areaAcres: 640, netPayFt: 30, porosity: 0.2, sw: 0.25, bo: 1.2 });
    expect(r.deterministic.inPlace.field).toBe(n);
    expect(r.deterministic.inPlace.fieldUnit).toBe('STB');
    expect(r.deterministic.recoverable.field).toBeCloseTo(n * 0.3, 6);
    expect(r.deterministic.inPlace.metric).toBeCloseTo(n * 0.158987294928, 4);
    expect(r.probabilistic).toBeNull();
    expect(r.notes.join(' ')).toMatch(/PRMS/);
  });

  it('evaluateReservesCase converts km2 and m: 1 km2 x 10 m equals 247.105 acres x 32.808 ft', () => {
    const r = evaluateReservesCase({ ...OIL, area: 1, areaUnit: 'km2', netPay: 10, netPayUnit: 'm' });
    const n = oilInPlace({ areaAcres: 1e6 / 4046.8564224, netPayFt: 10 / 0.3048, porosity: 0.2, sw: 0.25, bo: 1.2 });
    expect(r.deterministic.inPlace.field / n).toBeCloseTo(1, 12);
    // Metric check by hand: 1e6 m2 x 10 m x 0.2 x 0.75 / 1.2 = 1.25e6 m3 (to the 5.614583 rounding)
    expect(r.deterministic.inPlace.metric / 1.25e6).toBeCloseTo(1, 6);
  });

  it('evaluateReservesCase (gas) uses Bg from gasPvt and gasInPlace in scf', () => {
    const gas = { pressurePsia: 3000, temperatureF: 180, gasGravity: 0.7, zMethod: 'hall-yarborough' as const };
    const r = evaluateReservesCase({ ...OIL, fluid: 'gas', bo: undefined, gas, recoveryFactor: 0.8 });
    const bg = gasPvt(gas).bgRcfPerScf;
    expect(r.deterministic.fvf).toBe(bg);
    expect(r.deterministic.fvfUnit).toBe('rcf/scf');
    expect(r.deterministic.inPlace.field).toBeCloseTo(gasInPlace({ areaAcres: 640, netPayFt: 30, porosity: 0.2, sw: 0.25, bg }), 0);
    expect(r.deterministic.inPlace.metric / r.deterministic.inPlace.field).toBeCloseTo(0.028316846592, 14);
  });

  it('evaluateReservesCase Monte Carlo with no distributions gives P90 = P50 = P10 = deterministic', () => {
    const r = evaluateReservesCase({ ...OIL, monteCarlo: { trials: 1000, seed: 3 } });
    const p = r.probabilistic!.recoverable.field;
    const det = r.deterministic.recoverable.field;
    expect(Math.abs(p.p90 / det - 1)).toBeLessThan(1e-12);
    expect(Math.abs(p.p10 / det - 1)).toBeLessThan(1e-12);
  });

  it('evaluateReservesCase Monte Carlo is reproducible, ordered P90 <= P50 <= P10, metric scaled', () => {
    const input = { ...OIL, distributions: DISTS, monteCarlo: { trials: 20_000, seed: 11 } };
    const a = evaluateReservesCase(input).probabilistic!;
    const b = evaluateReservesCase(input).probabilistic!;
    expect(a.recoverable.field).toEqual(b.recoverable.field);
    const f = a.inPlace.field;
    expect(f.p90).toBeLessThan(f.p50);
    expect(f.p50).toBeLessThan(f.p10);
    expect(a.inPlace.metric.p50 / f.p50).toBeCloseTo(0.158987294928, 12);
    expect(a.inPlace.histogram.counts.reduce((s, c) => s + c, 0)).toBe(20_000);
    expect(a.inputSummaries.sw.p90).toBeCloseTo(0.22, 12); // 10th percentile of U(0.2, 0.4)
  });

  it('evaluateReservesCase tornado: recovery factor has no swing on in place, all six inputs listed', () => {
    const r = evaluateReservesCase({ ...OIL, distributions: DISTS, monteCarlo: { trials: 1000, seed: 1 } }).probabilistic!;
    expect(r.inPlace.tornado.rows).toHaveLength(6);
    expect(r.inPlace.tornado.rows.find((x) => x.input === 'recoveryFactor')!.swing).toBe(0);
    expect(r.recoverable.tornado.rows.find((x) => x.input === 'recoveryFactor')!.swing).toBeGreaterThan(0);
  });

  it('evaluateReservesCase rejects inputs naming the field', () => {
    expect(() => evaluateReservesCase({ ...OIL, bo: undefined })).toThrow(/evaluateReservesCase: bo must be > 0/);
    expect(() => evaluateReservesCase({ ...OIL, porosity: 1.5 })).toThrow(/evaluateReservesCase: porosity/);
    expect(() =>
      evaluateReservesCase({
        ...OIL,
        distributions: { porosity: { kind: 'normal', mean: 0.2, sd: 0.05 } },
        monteCarlo: { trials: 10, seed: 1 },
      }),
    ).toThrow(/distributions\.porosity reaches .*truncate/);
    expect(() =>
      evaluateReservesCase({
        ...OIL,
        fluid: 'gas',
        gas: { pressurePsia: 3000, temperatureF: 180, gasGravity: 0.7 },
        distributions: { bo: { kind: 'uniform', min: 1, max: 2 } },
      }),
    ).toThrow(/distributions\.bo applies to oil cases only/);
  });
});
