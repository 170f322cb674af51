import { describe, it, expect } from 'vitest';
import { evaluateWell, minimumCurvature, positionAtMd } from '@poreline/core';
import { wellColumn, stateAt } from '../src/model/column.js';
import { FORMATIONS, formationTopsTvdss, layerBoundaries } from '../src/model/formations.js';
import { MODEL_CUTOFFS, wellZoneParameters } from '../src/model/parameters.js';
import { buildRadiusFt, endOfBuildMd, pathAt, surveyStations } from '../src/model/trajectory.js';
import { zoneRangeMd, zoneTruths } from '../src/model/truth.js';
import { WELLS, kbElevationFt, wellByName } from '../src/model/wells.js';
import { synthesizeLogs } from '../src/synthesize.js';

const DEG = Math.PI / 180;

describe('well paths', () => {
  it('pathAt at the end of build of WM-7 is on the circular arc R = 18000 / (pi * 3)', () => {
    const t = wellByName('WM-7').trajectory;
    if (t.kind !== 'build_hold') throw new Error('WM-7 must be deviated');
    // Hand: R = 1909.859 ft; EOB at 3000 + 35 / 3 * 100 = 4166.667 ft MD;
    // TVD = 3000 + R sin 35 = 4095.45 ft; horizontal = R (1 - cos 35) = 345.40 ft.
    expect(buildRadiusFt(3)).toBeCloseTo(1909.859, 3);
    expect(endOfBuildMd(t)).toBeCloseTo(4166.667, 3);
    const p = pathAt(t, endOfBuildMd(t));
    expect(p.tvd).toBeCloseTo(3000 + 1909.859 * Math.sin(35 * DEG), 2);
    expect(Math.hypot(p.east, p.north)).toBeCloseTo(1909.859 * (1 - Math.cos(35 * DEG)), 2);
  });

  it("core's minimum curvature on the survey stations reproduces the model path", () => {
    // Independent implementation: core's minimumCurvature (Sawaryn & Thorogood 2005 form) on
    // the stations; the model path is an exact arc plus tangent, so they must agree.
    const t = wellByName('WM-7').trajectory;
    const stations = surveyStations(t, 6000).map((s) => ({ md: s.md, inc: s.inclinationDeg, azi: s.azimuthDeg }));
    const path = minimumCurvature(stations);
    for (const md of [3050, 3500, 4166.6667, 5000, 5600.25]) {
      const a = positionAtMd(path, md);
      const b = pathAt(t, md);
      expect(Math.abs(a.tvd - b.tvd)).toBeLessThan(1e-6);
      expect(Math.abs(a.north - b.north)).toBeLessThan(1e-6);
      expect(Math.abs(a.east - b.east)).toBeLessThan(1e-6);
    }
  });
});

describe('well columns', () => {
  it('a vertical well crosses each formation top at TVDSS + KB and its zone gross equals the isochore', () => {
    const w = wellByName('WM-3');
    const col = wellColumn(w);
    const tops = formationTopsTvdss(w.x, w.y);
    FORMATIONS.forEach((_, k) => expect(col.topsMd[k]).toBeCloseTo(tops[k] + kbElevationFt(w), 6));
    const wren = FORMATIONS.findIndex((f) => f.name === 'Wren Sand');
    const [top, base] = zoneRangeMd(col, wren);
    // Isochore formula of the Wren Sand (formations.ts), evaluated by hand at (2400, 1200).
    expect(base - top).toBeCloseTo(92 - 0.0012 * 2400 + 0.001 * 1200 + 3 * Math.cos(2400 / 5000), 6);
  });

  it('the deviated well sees a formation thickened by 1 / cos 35 in MD (near-flat beds)', () => {
    const col = wellColumn(wellByName('WM-7'));
    const wren = zoneTruths(col).find((z) => z.zone === 'Wren Sand')!;
    expect(wren.gross.tvd / wren.gross.md).toBeCloseTo(Math.cos(35 * DEG), 6);
  });

  it('the fixed layers keep their thickness: the thin bed is 5 ft and the tight streak 3.5 ft true vertical', () => {
    const f = FORMATIONS.find((k) => k.name === 'Marrow Shale')!;
    const b = layerBoundaries(f, 5000, 60);
    expect(b[2] - b[1]).toBeCloseTo(5, 12);
    // Shares split the remaining 55 ft 0.42 : 0.58.
    expect(b[1] - b[0]).toBeCloseTo(0.42 * 55, 12);
    const wren = FORMATIONS.find((k) => k.name === 'Wren Sand')!;
    const bw = layerBoundaries(wren, 5000, 90);
    expect(bw[1] - bw[0]).toBeCloseTo(3.5, 12);
  });

  it('zone truth of a single pay layer carries the layer values (WM-4 Wren Sand: oil leg in the upper sand)', () => {
    const z = zoneTruths(wellColumn(wellByName('WM-4'))).find((k) => k.zone === 'Wren Sand')!;
    // The Wren upper sand holds phi 0.245, Sw(oil) 0.21 (formations.ts); the water leg and the
    // tight streak are not pay.
    expect(z.netPay.meanPhi).toBeCloseTo(0.245, 12);
    expect(z.netPay.meanSw).toBeCloseTo(0.21, 12);
    expect(z.netPay.md).toBeGreaterThan(30);
  });
});

describe('forward synthesis inverts exactly', () => {
  it("noise-free logs evaluated by core's evaluateWell give back the layer Vsh, porosity and Sw at every sample", () => {
    // Checks forward/ (our forms of the published relations) against core's inverse kernels,
    // sample by sample, in every well and zone: differences are rounding only.
    let checked = 0;
    for (const w of WELLS) {
      const col = wellColumn(w);
      const logs = synthesizeLogs(col, { noise: false });
      const params = Object.fromEntries(wellZoneParameters(col).map((z) => [z.formation, z.params]));
      const zones = FORMATIONS.map((f, k) => {
        const [top, base] = zoneRangeMd(col, k);
        return { name: f.name, top, base, params: params[f.name] };
      });
      const c = logs.curves;
      const r = evaluateWell({ depth: logs.md, depthUnit: 'ft', curves: { gr: c.GR, rhob: c.RHOB, rt: c.RT }, zones, cutoffs: MODEL_CUTOFFS });
      for (let i = 0; i < logs.md.length; i++) {
        const s = stateAt(w, logs.md[i]);
        if (s.formation < 0 || !(r.curves.SW[i] === r.curves.SW[i])) continue;
        expect(Math.abs(r.curves.VSH[i] - s.layer.vsh)).toBeLessThan(1e-9);
        expect(Math.abs(r.curves.PHIE[i] - s.layer.porosity)).toBeLessThan(1e-9);
        const sw = s.layer.sw[s.fluid];
        if (sw < 1) expect(Math.abs(r.curves.SW[i] - sw)).toBeLessThan(1e-9);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(10000);
  });
});
