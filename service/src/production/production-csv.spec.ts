import { readDemoText } from '@poreline/demo-wells';
import { describe, expect, it } from 'vitest';
import { parsePressureCsv, parseRateCsv } from './production-csv.js';

describe('production CSV reader', () => {
  it('parseRateCsv turns monthly volumes into a rate per producing day at mid producing time', () => {
    // By hand: 3000 STB in 30 days = 100 STB/d at t = 15; then 2900 in 29 days = 100 at 30 + 14.5.
    const r = parseRateCsv('month,days_on,oil_stb,gas_mscf\n2020-01,30,3000,900\n2020-02,29,2900,870\n2020-03,0,0,0\n', 'oil');
    expect(r.problems).toEqual([]);
    expect(r.points).toEqual([
      { t: 15, rate: 100 },
      { t: 44.5, rate: 100 },
    ]);
    expect(parseRateCsv('month,days_on,oil_stb,gas_mscf\n2020-01,30,3000,900\n2020-02,29,2900,870\n', 'gas').points[0].rate).toBe(30);
  });

  it('parseRateCsv names the line of a bad monthly value', () => {
    const r = parseRateCsv('month,days_on,oil_stb\n2020-01,30,3000\n2020-02,45,100\n2020-03,30,x\n', 'oil');
    expect(r.problems).toEqual(
      expect.arrayContaining([
        { line: 3, message: 'days on must be between 0 and 31 (got 45)' },
        { line: 4, message: 'oil must be a number (got "x")' },
      ]),
    );
  });

  it('parsePressureCsv reads unit-suffixed headers (cum_gas_mmscf, static_pressure_psia)', () => {
    const r = parsePressureCsv('date,cum_gas_mmscf,static_pressure_psia\n2019-07-01,0,2328\n2020-01-01,1367.1,2221\n');
    expect(r.problems).toEqual([]);
    expect(r.points[1]).toEqual({ cumGas: 1367.1, pressure: 2221 });
  });

  it('the demo field production files are read by the upload reader without a problem', () => {
    expect(parsePressureCsv(readDemoText('production/WM-1_static_pressures.csv')).problems).toEqual([]);
    expect(parseRateCsv(readDemoText('production/WM-1_monthly.csv'), 'gas').problems).toEqual([]);
    expect(parseRateCsv(readDemoText('production/WM-4_monthly.csv'), 'oil').problems).toEqual([]);
  });
});
