import { describe, expect, it } from 'vitest';
import { parseSurveyCsv, SurveyCsvError } from './parse-survey-csv.js';

describe('parseSurveyCsv', () => {
  it('reads md, inclination, azimuth in any column order, skips blank lines and extra columns, and reads the md unit from the header', () => {
    const r = parseSurveyCsv('azi;MD (m);Inc;note\n0;0;0;tie-in\n\n45.5;1000;10.25;x\n');
    expect(r.headerUnit).toBe('m');
    expect(r.stations).toEqual([
      { md: 0, inclination: 0, azimuth: 0 },
      { md: 1000, inclination: 10.25, azimuth: 45.5 },
    ]);
  });

  it('names the line and field of a bad value', () => {
    const text = 'md,inclination,azimuth\n0,0,0\n100,abc,0\n';
    expect(() => parseSurveyCsv(text)).toThrow(SurveyCsvError);
    expect(() => parseSurveyCsv(text)).toThrow('line 3: inclination must be a number, got "abc"');
    expect(() => parseSurveyCsv('md,inclination,azimuth\n0,0,0\n100,181,0\n')).toThrow('line 3: inclination must be between 0 and 180 degrees, got 181');
    expect(() => parseSurveyCsv('md,inclination,azimuth\n0,0,0\n100,5,361\n')).toThrow('line 3: azimuth must be between 0 and 360 degrees, got 361');
    expect(() => parseSurveyCsv('md,inclination,azimuth\n0,0,0\n100,5,10\n100,5,10\n')).toThrow('line 4: md (100) must be greater than the previous station\'s (100)');
  });

  it('refuses a header without the three columns, an unknown md unit and fewer than 2 stations', () => {
    expect(() => parseSurveyCsv('md,dip,azimuth\n0,0,0\n')).toThrow(/line 1: the header must name an inclination column/);
    expect(() => parseSurveyCsv('md (yd),inclination,azimuth\n0,0,0\n1,0,0\n')).toThrow(/md unit "yd" must be ft or m/);
    expect(() => parseSurveyCsv('md,inclination,azimuth\n0,0,0\n')).toThrow(/at least 2 stations, found 1/);
    expect(() => parseSurveyCsv('')).toThrow(/the file is empty/);
  });
});

describe('parseSurveyCsv unit suffixes', () => {
  it('reads md_ft / inclination_deg / azimuth_deg headers (the demo field survey format) with the unit from the md header', () => {
    const r = parseSurveyCsv('md_ft,inclination_deg,azimuth_deg\n0,0,40\n1000,12.5,40\n');
    expect(r.headerUnit).toBe('ft');
    expect(r.stations[1]).toEqual({ md: 1000, inclination: 12.5, azimuth: 40 });
    expect(parseSurveyCsv('md_m,inc_deg,azi_deg\n0,0,0\n300,5,10\n').headerUnit).toBe('m');
  });
});
