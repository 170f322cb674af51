import { describe, expect, it } from 'vitest';
import {
  minimumCurvature,
  positionAtMd,
  positionsAtMd,
  ratioFactor,
  surveyPathFromTable,
  trueVerticalThickness,
} from './minimum-curvature.js';

describe('minimumCurvature', () => {
  it('matches the worked example 3500 ft (15 deg, 20 deg) -> 3600 ft (25 deg, 45 deg)', () => {
    // Lapeyrouse, N.J. (2002) Formulas and Calculations for Drilling, Production and Workover,
    // 2nd ed., minimum curvature example (read as reproduced on drillingformulas.com):
    // dogleg 12.95 deg, RF 1.00408, north 27.22 ft, east 19.45 ft, TVD 94.01 ft.
    const p = minimumCurvature([
      { md: 3500, inc: 15, azi: 20 },
      { md: 3600, inc: 25, azi: 45 },
    ], { tvd: 0, north: 0, east: 0 });
    expect(p.dogleg[1]).toBeCloseTo(12.95, 2);
    // The source prints RF 1.00408; (2/beta) tan(beta/2) at beta = 0.22605 rad is 1.00428 (series
    // 1 + beta^2/12 = 1.00426), so we take the printed RF as a rounding slip: its effect on the
    // printed coordinates (0.0002 * 27 ft) is below their 0.01 ft rounding, and those match.
    expect(ratioFactor((p.dogleg[1] * Math.PI) / 180)).toBeCloseTo(1.00428, 5);
    expect(p.north[1]).toBeCloseTo(27.22, 2);
    expect(p.east[1]).toBeCloseTo(19.45, 2);
    expect(p.tvd[1]).toBeCloseTo(94.01, 2);
  });

  it('vertical well: TVD = MD, no horizontal displacement', () => {
    // Property check: a vertical hole.
    const p = minimumCurvature([0, 500, 1000, 2500].map((md) => ({ md, inc: 0, azi: 123 })));
    expect(Array.from(p.tvd)).toEqual([0, 500, 1000, 2500]);
    expect(Math.max(...p.north.map(Math.abs), ...p.east.map(Math.abs))).toBeLessThan(1e-12);
  });

  it('straight hole at constant inclination: TVD = MD cos(inc), departure = MD sin(inc)', () => {
    // Property check: minimum curvature is exact on a straight line (RF = 1).
    const p = minimumCurvature([0, 1000, 3000].map((md) => ({ md, inc: 30, azi: 90 })));
    expect(p.tvd[2]).toBeCloseTo(3000 * Math.cos(Math.PI / 6), 9);
    expect(p.east[2]).toBeCloseTo(3000 * Math.sin(Math.PI / 6), 9);
    expect(p.north[2]).toBeCloseTo(0, 9);
  });

  it('constant build 3 deg/100 ft reproduces the circular arc TVD = R sin(I), departure = R (1 - cos I)', () => {
    // Independent analytic check: a constant-build section is a circular arc of radius
    // R = 18000 / (pi * BUR) ft, and minimum curvature fits circular arcs exactly.
    const stations = [];
    for (let k = 0; k <= 30; k++) stations.push({ md: 1000 + 100 * k, inc: 3 * k, azi: 0 });
    const p = minimumCurvature(stations);
    const R = 18000 / (Math.PI * 3);
    expect(p.tvd[30] - 1000).toBeCloseTo(R * Math.sin(Math.PI / 2), 8);
    expect(p.north[30]).toBeCloseTo(R * (1 - Math.cos(Math.PI / 2)), 8);
    // Between stations, positionsAtMd stays on the arc: MD 1150 is 4.5 deg into the build.
    const q = positionsAtMd(p, [1150]);
    const inc = (4.5 * Math.PI) / 180;
    expect(q.tvd[0] - 1000).toBeCloseTo(R * Math.sin(inc), 8);
    expect(q.north[0]).toBeCloseTo(R * (1 - Math.cos(inc)), 8);
    expect(positionAtMd(p, 1150).tvd).toBeCloseTo(q.tvd[0], 10);
  });

  it('positionsAtMd inside a turning (3D) segment equals minimum curvature to a station on the same arc', () => {
    // Independent route: the direction part-way along the arc by spherical interpolation of the
    // station directions, then minimumCurvature over the shorter segment.
    const s1 = { md: 2000, inc: 20, azi: 30 }, s2 = { md: 2100, inc: 35, azi: 70 };
    const p = minimumCurvature([s1, s2]);
    const dir = (inc: number, azi: number) => {
      const i = (inc * Math.PI) / 180, a = (azi * Math.PI) / 180;
      return [Math.sin(i) * Math.cos(a), Math.sin(i) * Math.sin(a), Math.cos(i)];
    };
    const t1 = dir(s1.inc, s1.azi), t2 = dir(s2.inc, s2.azi);
    const beta = Math.acos(t1[0] * t2[0] + t1[1] * t2[1] + t1[2] * t2[2]);
    const f = 0.37;
    const t = t1.map((x, k) => (Math.sin((1 - f) * beta) * x + Math.sin(f * beta) * t2[k]) / Math.sin(beta));
    const mid = { md: 2000 + 100 * f, inc: (Math.acos(t[2]) * 180) / Math.PI, azi: (Math.atan2(t[1], t[0]) * 180) / Math.PI };
    const q = minimumCurvature([s1, mid]);
    const got = positionsAtMd(p, [2000, mid.md, 2100]);
    expect(got.tvd[1]).toBeCloseTo(q.tvd[1], 9);
    expect(got.north[1]).toBeCloseTo(q.north[1], 9);
    expect(got.east[1]).toBeCloseTo(q.east[1], 9);
    expect(got.tvd[2]).toBeCloseTo(p.tvd[1], 9);
    expect(got.east[0]).toBe(0);
  });

  it('refuses MD that does not increase and an inclination outside [0, 180], naming the station', () => {
    expect(() => minimumCurvature([{ md: 100, inc: 0, azi: 0 }, { md: 100, inc: 1, azi: 0 }])).toThrow(
      'minimumCurvature: station 1 md must be greater',
    );
    expect(() => minimumCurvature([{ md: 100, inc: -2, azi: 0 }])).toThrow('minimumCurvature: station 0 inc must be in [0, 180]');
  });

  it('a TVD table interpolates linearly and extends along the end chord', () => {
    const p = surveyPathFromTable({ md: [0, 1000, 2000], tvd: [0, 1000, 1900] });
    const q = positionsAtMd(p, [500, 1500, 2100]);
    expect(Array.from(q.tvd)).toEqual([500, 1450, 1990]);
    expect(p.hasHorizontal).toBe(false);
  });
});

describe('trueVerticalThickness', () => {
  it('vertical well through a dipping bed: TVT equals the TVD thickness', () => {
    expect(trueVerticalThickness(100, 0, 0, 20, 45)).toBe(100);
  });

  it('straight hole: equals dMD (cos I - sin I cos(A - dipAz) tan dip)', () => {
    // Textbook TVT form // from memory; the code uses positions, the check uses angles.
    const dmd = 120, I = (40 * Math.PI) / 180, A = (70 * Math.PI) / 180, dip = (12 * Math.PI) / 180, dipAz = (100 * Math.PI) / 180;
    const expected = dmd * (Math.cos(I) - Math.sin(I) * Math.cos(A - dipAz) * Math.tan(dip));
    const got = trueVerticalThickness(dmd * Math.cos(I), dmd * Math.sin(I) * Math.cos(A), dmd * Math.sin(I) * Math.sin(A), 12, 100);
    expect(got).toBeCloseTo(expected, 10);
  });
});
