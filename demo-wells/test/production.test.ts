import { describe, it, expect } from 'vitest';
import { fitArpsDecline, fitPZ, pseudoCriticalSutton, zFactorDak } from '@poreline/core';
import { arpsHyperbolicCumulative } from '../src/production/oil-well.js';
import { modelTruth } from '../src/model/field.js';
import { readDemoText } from '../src/load.js';

function csv(path: string): Record<string, string>[] {
  const [head, ...lines] = readDemoText(path).trim().split('\n');
  const keys = head.split(',');
  return lines.map((l) => Object.fromEntries(l.split(',').map((v, i) => [keys[i], v])));
}

describe('demo production data', () => {
  it("WM-1 static pressures on p/z vs cumulative gas give the model's Fenna gas in place within 2%", () => {
    // Craft & Hawkins (1991) ch. 2: p/z = (pi/zi)(1 - Gp/G); z recomputed here from the file's
    // pressures with the model's gas gravity and temperature (core's Sutton + DAK).
    const t = modelTruth();
    const g = t.gasWell.input;
    const { tpcR, ppcPsia } = pseudoCriticalSutton(g.gasGravity);
    const rows = csv('production/WM-1_static_pressures.csv');
    const p = rows.map((r) => Number(r.static_pressure_psia));
    const z = p.map((x) => zFactorDak((g.temperatureF + 459.67) / tpcR, x / ppcPsia));
    const fit = fitPZ({ gp: rows.map((r) => Number(r.cum_gas_mmscf) * 1e6), pressurePsia: p, z });
    const model = t.volumes.find((v) => v.accumulation === 'Fenna gas')!.inPlace;
    expect(Math.abs(fit.gasInPlace / model - 1)).toBeLessThan(0.02);
    expect(fit.rSquared).toBeGreaterThan(0.99);
  });

  it('WM-1 monthly gas sums to the cumulative of the last pressure survey', () => {
    const rows = csv('production/WM-1_monthly.csv');
    const surveys = csv('production/WM-1_static_pressures.csv');
    const last = surveys[surveys.length - 1];
    const before = rows.filter((r) => `${r.month}-01` < last.date).reduce((s, r) => s + Number(r.gas_mscf), 0);
    expect(before / 1000).toBeCloseTo(Number(last.cum_gas_mmscf), 3);
  });

  it('WM-4 monthly oil follows the Arps hyperbolic decline whose EUR is 25% of the drained oil in place', () => {
    const t = modelTruth();
    const d = t.oilWell.decline;
    // Arps (1945): EUR to the economic limit = qi^b / ((1 - b) D) (qi^(1-b) - q_el^(1-b)), by hand here.
    const eur = (Math.pow(d.qiStbd, d.b) * (Math.pow(d.qiStbd, 1 - d.b) - Math.pow(d.economicLimitStbd, 1 - d.b))) / ((1 - d.b) * d.diPerDay);
    expect(eur / (0.25 * t.oilWell.input.drainedOilInPlaceStb)).toBeCloseTo(1, 10);
    const rows = csv('production/WM-4_monthly.csv');
    const days = rows.reduce((s, r) => s + Number(r.days_on), 0);
    const np = rows.reduce((s, r) => s + Number(r.oil_stb), 0);
    expect(Math.abs(np - arpsHyperbolicCumulative(d.qiStbd, d.diPerDay, d.b, days))).toBeLessThan(rows.length); // rounding: <= 0.5 STB a month
    // A hyperbolic fit of the monthly rates recovers the decline (core's fitArpsDecline).
    let tDays = 0;
    const tt: number[] = [];
    const q: number[] = [];
    for (const r of rows) {
      tt.push(tDays + Number(r.days_on) / 2);
      q.push(Number(r.oil_stb) / Number(r.days_on));
      tDays += Number(r.days_on);
    }
    const fit = fitArpsDecline(tt, q, { kind: 'hyperbolic', economicLimitRate: d.economicLimitStbd });
    expect(Math.abs(fit.params.b - d.b)).toBeLessThan(0.1);
    expect(Math.abs(fit.params.qi / d.qiStbd - 1)).toBeLessThan(0.02);
  });
});
