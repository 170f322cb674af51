import { FORMATIONS, WELLS } from '@poreline/demo-wells';
import { describe, expect, it } from 'vitest';
import { FORMATION_PALETTE } from '../formations/formation-palette.js';
import { LITHOLOGIES } from '../formations/lithologies.js';
import { REVIEW_PLAN, demoFormationPlan, demoProductionSeries, demoWellPlan } from './demo-field-plan.js';

describe('demo field plan', () => {
  it('demoFormationPlan() lists the model formations in order, each with its own Poreline palette colour and a Poreline lithology', () => {
    const plan = demoFormationPlan();
    expect(plan.map((f) => f.name)).toEqual(FORMATIONS.map((f) => f.name));
    for (const f of plan) {
      expect(FORMATION_PALETTE).toContain(f.colour);
      expect(LITHOLOGIES).toContain(f.lithology);
    }
    expect(new Set(plan.map((f) => f.colour)).size).toBe(plan.length);
  });

  it('demoWellPlan() gives KB = ground + KB height, in metres for the metric well', () => {
    const plan = demoWellPlan();
    // wells.csv: WM-1 ground 318.7 ft, KB 343.3 ft; WM-5 ground 352.9 ft, KB 380.0 ft
    expect(plan.find((w) => w.name === 'WM-1')).toMatchObject({ uwi: 'WRN-0001', depthUnit: 'ft', groundElevation: 318.7, kbElevation: 343.3 });
    const wm5 = plan.find((w) => w.name === 'WM-5')!;
    expect(wm5.depthUnit).toBe('m');
    // 380.0 ft x 0.3048 m/ft = 115.824 m, kept to the centimetre (by hand)
    expect(wm5.kbElevation).toBeCloseTo(115.82, 6);
    expect(Object.keys(REVIEW_PLAN).sort()).toEqual(WELLS.map((w) => w.name).sort());
  });

  it('demoProductionSeries() turns monthly volumes into rates per producing day at mid-month producing time', () => {
    const series = demoProductionSeries({
      wm1Pressures: 'date,cum_gas_mmscf,static_pressure_psia,datum_tvdss_ft\n2019-07-01,0.000,2328,4838\n2020-01-01,1367.104,2221,4838\n',
      wm1Monthly: 'month,days_on,gas_mscf,water_bbl\n2019-07,31,246260,493\n2019-08,30,240000,485\n',
      wm4Monthly: 'month,days_on,oil_stb,gas_mscf,water_bbl\n2020-05,30,32548,15623,1203\n2020-06,0,0,0,0\n2020-07,28,28000,1,1\n',
    });
    expect(series.map((s) => [s.well, s.kind, s.fluid])).toEqual([
      ['WM-1', 'pressure', 'gas'],
      ['WM-1', 'rate', 'gas'],
      ['WM-4', 'rate', 'oil'],
    ]);
    expect(series[0].points).toEqual([
      { cumGas: 0, pressure: 2328 },
      { cumGas: 1367.104, pressure: 2221 },
    ]);
    // by hand: 246260 / 31 = 7943.87 Mscf/d at t = 15.5 d; 240000 / 30 = 8000 at t = 31 + 15 = 46 d
    expect(series[1].points[0].t).toBe(15.5);
    expect(series[1].points[0].rate).toBeCloseTo(7943.871, 3);
    expect(series[1].points[1]).toEqual({ t: 46, rate: 8000 });
    // a month with no producing days is left out; the next starts after 30 producing days: t = 30 + 14
    expect(series[2].points).toEqual([
      { t: 15, rate: 32548 / 30 },
      { t: 44, rate: 1000 },
    ]);
  });

  it('demoProductionSeries() names the file, line and field of a value that is not a number', () => {
    expect(() => demoProductionSeries({ wm1Pressures: 'cum_gas_mmscf,static_pressure_psia\nx,1\n', wm1Monthly: '', wm4Monthly: '' })).toThrow(
      /WM-1_static_pressures.csv: line 2: cumulative gas must be a number/,
    );
  });
});
