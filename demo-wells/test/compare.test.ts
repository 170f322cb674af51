import { describe, it, expect } from 'vitest';
import { compareVolumesWithModel, compareWithModel, type EvaluatedWell } from '../src/check/compare.js';
import { modelTruth } from '../src/model/field.js';

/** The model's own truth dressed as an evaluation (metres for the metric well). */
function truthAsEvaluation(fluid: boolean, shift = (_q: string, x: number) => x): EvaluatedWell[] {
  return modelTruth().wells.map((w) => {
    const k = w.column.sampling.unit === 'm' ? 0.3048 : 1;
    const zones = (fluid ? w.fluidZones : w.zones).map((z) => ({
      zone: z.zone,
      netReservoir: { thickness: { md: (z.netReservoir.md * k) }, meanPhi: z.netReservoir.meanPhi, meanSw: z.netReservoir.meanSw },
      netPay: {
        thickness: { md: shift('h', z.netPay.md) * k, tvd: shift('h', z.netPay.tvd) * k },
        meanPhi: z.netPay.meanPhi === null ? null : shift('phi', z.netPay.meanPhi),
        meanSw: z.netPay.meanSw === null ? null : shift('sw', z.netPay.meanSw),
      },
    }));
    return { well: w.name, depthUnit: w.column.sampling.unit, zones };
  });
}

describe('compareWithModel', () => {
  it('passes every row when the evaluation equals the model (metres converted)', () => {
    const rows = compareWithModel(truthAsEvaluation(false));
    expect(rows.length).toBeGreaterThan(140);
    expect(rows.every((r) => r.pass)).toBe(true);
    expect(rows.every((r) => Math.abs((r.evaluated ?? NaN) - r.model) < 1e-9)).toBe(true);
  });

  it('fails net pay off by more than one step, porosity off by more than 0.005, Sw by more than 0.02', () => {
    const rows = compareWithModel(truthAsEvaluation(false, (q, x) => (q === 'h' ? x + 0.6 : q === 'phi' ? x + 0.0051 : x - 0.0201)));
    const pay = rows.filter((r) => r.quantity === 'net pay' && r.model > 0);
    expect(pay.length).toBeGreaterThan(20);
    expect(pay.every((r) => !r.pass)).toBe(true); // 0.6 ft > 0.5 ft and > 0.328 ft (0.1 m)
    expect(rows.filter((r) => r.quantity === 'mean porosity').every((r) => !r.pass)).toBe(true);
    expect(rows.filter((r) => r.quantity === 'mean Sw').every((r) => !r.pass)).toBe(true);
  });

  it('fails a row whose evaluated mean is missing, and skips zones the model does not know', () => {
    const ev = truthAsEvaluation(false);
    const wm1 = ev.find((w) => w.well === 'WM-1')!;
    const zones = wm1.zones.map((z) => (z.zone === 'Wren Sand' ? { ...z, netPay: { ...z.netPay, meanPhi: null } } : z));
    const rows = compareWithModel([{ ...wm1, zones: [...zones, { ...zones[0], zone: 'Not a formation' }] }]);
    expect(rows.find((r) => r.zone === 'Wren Sand' && r.quantity === 'mean porosity')!.pass).toBe(false);
    expect(rows.some((r) => r.zone === 'Not a formation')).toBe(false);
  });
});

describe('compareVolumesWithModel', () => {
  it('gives the model volumes back from the model fluid zones, and flags a 3% pay error', () => {
    expect(compareVolumesWithModel(truthAsEvaluation(true)).every((r) => r.pass && Math.abs(r.relativeDifference!) < 1e-12)).toBe(true);
    // 3% more net pay in every well gives 3% more volume (A h phi (1 - Sw) is linear in h).
    const rows = compareVolumesWithModel(truthAsEvaluation(true, (q, x) => (q === 'h' ? 1.03 * x : x)));
    for (const r of rows) {
      expect(r.relativeDifference!).toBeCloseTo(0.03, 10);
      expect(r.pass).toBe(false);
    }
  });

  it('reports a missing well and fails its accumulation', () => {
    const rows = compareVolumesWithModel(truthAsEvaluation(true).filter((w) => w.well !== 'WM-2'));
    const cap = rows.find((r) => r.accumulation === 'Wren gas cap')!;
    expect(cap.missingWells).toEqual(['WM-2']);
    expect(cap.pass).toBe(false);
  });
});
