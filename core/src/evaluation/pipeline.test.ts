import { describe, expect, it } from 'vitest';
import { bulkDensityFromPorosity } from '../petro/porosity.js';
import { archieResistivity, indonesiaResistivity, simandouxResistivity } from '../petro/saturation.js';
import { transitTimeRhg, transitTimeWyllie } from '../petro/sonic-porosity.js';
import { resistivityAtTemperature } from '../petro/water-resistivity.js';
import { EVALUATION_CONVENTIONS } from './conventions.js';
import { EvaluationInputError } from './errors.js';
import { type EvaluateWellInput, type EvaluationZone, evaluateWell } from './pipeline.js';
import { QC_PHIT_CLAMPED } from './qc.js';
import { type ZoneParameters, defaultZoneParameters, validateZoneParameters } from './zone-parameters.js';
import { summariseZones } from './zone-summary.js';

/**
 * A layered earth model turned into logs by the forward forms (invented geometry, used only
 * as a round trip: the expected values are the model's own, not published numbers).
 * 5000-5050 shale, 5050-5100 oil sand (phi 0.25, Sw 0.3), 5100-5150 shaly water sand
 * (Vsh 0.1, phi 0.20), 5150-5200 tight sand (phi 0.05). Layer of a sample: by its depth.
 */
interface Layer { top: number; vsh: number; phi: number; sw: number }
const LAYERS: Layer[] = [
  { top: 5000, vsh: 1, phi: 0.1, sw: 1 },
  { top: 5050, vsh: 0, phi: 0.25, sw: 0.3 },
  { top: 5100, vsh: 0.1, phi: 0.2, sw: 1 },
  { top: 5150, vsh: 0, phi: 0.05, sw: 1 },
];
const layerAt = (d: number) => [...LAYERS].reverse().find((l) => d >= l.top)!;

function syntheticWell(params: ZoneParameters, opts: { tvd?: (md: number) => number; phiAt?: (d: number, l: Layer) => number } = {}) {
  const depth: number[] = [];
  for (let d = 5000; d <= 5200; d += 0.5) depth.push(d);
  const tvd = opts.tvd ?? ((md: number) => md);
  const grClean = 20, grShale = 120;
  const gr: number[] = [], rhob: number[] = [], nphi: number[] = [], dt: number[] = [], rt: number[] = [];
  const t = params.temperature;
  const temp = t.kind === 'gradient' ? t : t.kind === 'constant' ? { surfaceTemperature: t.temperature, gradientPer100: 0 } : { surfaceTemperature: NaN, gradientPer100: NaN };
  for (const d of depth) {
    const l = layerAt(d);
    const phi = opts.phiAt ? opts.phiAt(d, l) : l.phi;
    gr.push(grClean + l.vsh * (grShale - grClean)); // linear index
    rhob.push(bulkDensityFromPorosity(phi, params.rhoMatrix, params.rhoFluid));
    nphi.push(phi);
    dt.push(params.porosityMethod === 'sonic_rhg' ? transitTimeRhg(phi, params.dtMatrix, params.dtFluid) : transitTimeWyllie(phi, params.dtMatrix, params.dtFluid));
    const T = temp.surfaceTemperature + (temp.gradientPer100 / 100) * tvd(d);
    const rwSpec = params.rw.kind === 'at_temperature' ? params.rw : { rw: 0.05, temperature: 75 };
    const rw = resistivityAtTemperature(rwSpec.rw, rwSpec.temperature, T, params.temperatureUnit);
    const { a, m, n } = params;
    const rsh = params.rsh ?? 1;
    rt.push(
      params.swModel === 'archie'
        ? archieResistivity(phi, l.sw, rw, a, m, n)
        : params.swModel === 'simandoux'
          ? simandouxResistivity(phi, l.sw, l.vsh, rw, rsh, a, m, n)
          : indonesiaResistivity(phi, l.sw, l.vsh, rw, rsh, a, m, n),
    );
  }
  return { depth: Float64Array.from(depth), gr, rhob, nphi, dt, rt };
}

function sandParams(over: Partial<ZoneParameters> = {}): ZoneParameters {
  return { ...defaultZoneParameters('sandstone'), grClean: 20, grShale: 120, ...over };
}

function input(params: ZoneParameters, over: Partial<EvaluateWellInput> = {}, wellOpts = {}): EvaluateWellInput {
  const w = syntheticWell(params, wellOpts);
  return {
    depth: w.depth,
    depthUnit: 'ft',
    curves: { gr: w.gr, rhob: w.rhob, nphi: w.nphi, dt: w.dt, rt: w.rt },
    zones: [{ name: 'Res', top: 5000, base: 5200, params }],
    cutoffs: { Res: { vshMax: 0.5, phiMin: 0.08, swMax: 0.6 } },
    ...over,
  };
}

describe('evaluateWell: round trip through the forward forms', () => {
  it('recovers PHIT and SW of a density/Archie model and net pay of exactly the oil sand (50 ft)', () => {
    const p = sandParams();
    const r = evaluateWell(input(p));
    const i = 150; // 5075 ft, oil sand
    expect(r.curves.PHIT[i]).toBeCloseTo(0.25, 12);
    expect(r.curves.SW[i]).toBeCloseTo(0.3, 10);
    expect(r.curves.BVW[i]).toBeCloseTo(0.075, 10);
    expect(r.curves.SW[250]).toBeCloseTo(1, 10); // water sand at 5125 ft, Rw corrected by Arps per sample
    const z = r.zones[0];
    expect(z.gross.thickness.md).toBe(200);
    expect(z.netPay.thickness.md).toBeCloseTo(50, 9);
    expect(z.netReservoir.thickness.md).toBeCloseTo(100, 9);
    expect(z.netPay.meanPhi).toBeCloseTo(0.25, 10);
    expect(z.netPay.meanSw).toBeCloseTo(0.3, 9);
    expect(z.netPay.phiH.md).toBeCloseTo(12.5, 8);
    expect(z.netPay.hcpt.md).toBeCloseTo(50 * 0.25 * 0.7, 8);
    expect(r.resolved[0]).toMatchObject({ grClean: 20, grShale: 120, rwReference: 0.05, m: 2 });
  });

  it.each([
    ['neutron_density', 'simandoux', 2],
    ['neutron_density_gas', 'indonesia', 2],
    ['sonic_wyllie', 'simandoux', 2.5],
    ['sonic_rhg', 'indonesia', 1.8],
  ] as const)('recovers SW with %s porosity and %s (n = %s) in the shaly water sand and the oil sand', (por, sw, n) => {
    const p = sandParams({ porosityMethod: por, swModel: sw, n, rsh: 2.5 });
    const r = evaluateWell(input(p));
    expect(r.curves.PHIE[150]).toBeCloseTo(0.25, 10);
    expect(r.curves.SW[150]).toBeCloseTo(0.3, 8);
    expect(r.curves.VSH[250]).toBeCloseTo(0.1, 12);
    expect(r.curves.SW[250]).toBeCloseTo(1, 8);
    expect(r.zones[0].netPay.thickness.md).toBeCloseTo(50, 9);
  });

  it('uses TVD from the survey for temperature: a 60-degree hole halves the depth the gradient sees', () => {
    const p = sandParams();
    const survey = [{ md: 0, inc: 0, azi: 0 }, { md: 1000, inc: 60, azi: 45 }, { md: 8000, inc: 60, azi: 45 }];
    const plain = evaluateWell(input(p));
    // Build logs with the TVD the survey gives (straight 60 deg below 1000 ft MD, after a constant-dogleg build).
    const r0 = evaluateWell(input(p, { survey }));
    const tvd = (md: number) => {
      const R = 1000 / (Math.PI / 3);
      return R * Math.sin(Math.PI / 3) + (md - 1000) * 0.5;
    };
    const r1 = evaluateWell(input(p, { survey }, { tvd }));
    expect(r1.curves.SW[150]).toBeCloseTo(0.3, 9);
    expect(Math.abs(r0.curves.SW[150] - 0.3)).toBeGreaterThan(1e-3); // logs made with MD temperature do not fit
    expect(plain.zones[0].gross.thickness.tvd).toBeNull();
    expect(r1.zones[0].gross.thickness.tvd).toBeCloseTo(100, 6);
  });

  it('fits Rw and m by Pickett on a water interval of the zone', () => {
    // Water sand 5100-5150 with porosity varying 0.12-0.28; logs from Archie with m = 2.2, a = 1, Rw 0.05 at 75 F,
    // constant temperature so the fitted a*Rw is Rw itself.
    const truth = sandParams({ m: 2.2, temperature: { kind: 'constant', temperature: 75 }, phiShale: 0 });
    const phiAt = (d: number, l: Layer) => (d >= 5100 && d < 5150 ? 0.12 + (0.16 * (d - 5100)) / 50 : l.phi);
    const base = input(truth, {}, { phiAt });
    const fitted = { ...truth, m: 2, rw: { kind: 'pickett' as const, top: 5110, base: 5140, fitM: true } };
    const r = evaluateWell({ ...base, zones: [{ name: 'Res', top: 5000, base: 5200, params: fitted }] });
    // The GR in the water sand reads Vsh 0.1 but phiShale = 0, so PHIE = PHIT: the fit sees Archie exactly.
    expect(r.resolved[0].m).toBeCloseTo(2.2, 9);
    expect(r.resolved[0].rwReference).toBeCloseTo(0.05, 9);
    expect(r.resolved[0].pickett!.r2).toBeCloseTo(1, 9);
    expect(r.curves.SW[150]).toBeCloseTo(0.3, 8);
  });

  it('re-running summariseZones on the pipeline curves with new cutoffs matches a full re-run', () => {
    const p = sandParams();
    const inp = input(p);
    const r = evaluateWell(inp);
    const tighter = { Res: { vshMax: 0.05, phiMin: 0.08, swMax: 0.6 } };
    const quick = summariseZones({ depth: inp.depth, curves: r.curves as never, qc: r.qc, zones: inp.zones, cutoffs: tighter });
    const full = evaluateWell({ ...inp, cutoffs: tighter }).zones;
    expect(quick[0].netReservoir.thickness.md).toBeCloseTo(50, 9); // shaly water sand drops out
    expect(quick).toEqual(full);
  });

  it('options.output: writing into a previous result\'s arrays gives the same curves, qc and summaries as fresh arrays', () => {
    const p = sandParams();
    const inp = input(p);
    // A first run with different inputs leaves other values (and qc bits) in the arrays.
    const rhob = (inp.curves.rhob as number[]).map(() => 2.8);
    const first = evaluateWell({ ...inp, curves: { ...inp.curves, rhob }, zones: [{ name: 'Res', top: 5050, base: 5150, params: p }] });
    const reused = evaluateWell({ ...inp, options: { output: { ...first.curves, qc: first.qc } } });
    const fresh = evaluateWell(inp);
    expect(reused.curves.PHIT).toBe(first.curves.PHIT); // same memory
    expect(Array.from(reused.curves.PHIE)).toEqual(Array.from(fresh.curves.PHIE));
    expect(Array.from(reused.curves.NET_PAY)).toEqual(Array.from(fresh.curves.NET_PAY));
    expect(Array.from(reused.qc)).toEqual(Array.from(fresh.qc));
    expect(reused.zones).toEqual(fresh.zones);
  });

  it('clamps porosity to [0, phiMax], counts it and warns when more than 5% of a zone is clamped', () => {
    const p = sandParams();
    const inp = input(p);
    const rhob = [...(inp.curves.rhob as number[])];
    for (let i = 0; i < 40; i++) rhob[i] = 2.8; // denser than the matrix: negative porosity
    const r = evaluateWell({ ...inp, curves: { ...inp.curves, rhob } });
    expect(r.curves.PHIT[0]).toBe(0);
    expect(r.qc[0] & QC_PHIT_CLAMPED).toBe(QC_PHIT_CLAMPED);
    expect(r.zones[0].clamped.phit).toBe(40);
    expect(r.warnings).toContainEqual(expect.objectContaining({ zone: 'Res', field: 'phiMax' }));
  });

  it('leaves samples outside every zone NaN and reports NaN input as null samples', () => {
    const p = sandParams();
    const inp = input(p);
    const rt = [...(inp.curves.rt as number[])];
    rt[150] = NaN;
    const r = evaluateWell({ ...inp, curves: { ...inp.curves, rt }, zones: [{ name: 'Res', top: 5050, base: 5150, params: p }] });
    expect(r.curves.VSH[0]).toBeNaN();
    expect(r.curves.NET_PAY[399]).toBeNaN();
    expect(r.curves.NET_PAY[150]).toBeNaN();
    expect(r.zones[0].nullCount).toBe(1);
    // Oil sand samples 5050-5099.5 cover [5049.75, 5099.75], clipped at the zone top 5050: 49.75 ft,
    // less the null sample's 0.5 ft.
    expect(r.zones[0].netPay.thickness.md).toBeCloseTo(49.25, 9);
    expect(r.zones[0].nullThickness).toBeCloseTo(0.5, 12);
    expect(r.warnings.some((w) => w.zone === 'Res' && /no net pay flag/.test(w.message))).toBe(true);
  });
});

describe('evaluateWell: Rw from SP, GR picks, permeability cutoff', () => {
  it('Rw from a given SSP matches the SSP equation worked by hand (-80 mV, Rmf 0.5 at 75 F, 150 F)', () => {
    // Asquith & Krygowski (2004) ch. 2 form // from memory; hand-computed Rw = 0.221677 / 9.73341 = 0.022775.
    const p = sandParams({ temperature: { kind: 'constant', temperature: 150 }, rw: { kind: 'ssp', ssp: -80, rmf: 0.5, rmfTemperature: 75 } });
    const r = evaluateWell(input(sandParams()));
    const inp = input(sandParams());
    const rs = evaluateWell({ ...inp, zones: [{ name: 'Res', top: 5000, base: 5200, params: p }] });
    expect(rs.resolved[0].rwReference).toBeCloseTo(0.022775, 5);
    expect(rs.resolved[0].rwReferenceTemperature).toBe(150);
    expect(rs.warnings.some((w) => w.field === 'rw.ssp')).toBe(true); // below 0.1 ohm.m
    expect(r.resolved[0].ssp).toBeNull();
  });

  it('picks SSP from the SP curve as P5 - P95 over the zone when ssp is null', () => {
    const p = sandParams({ temperature: { kind: 'constant', temperature: 150 }, rw: { kind: 'ssp', ssp: null, rmf: 0.5, rmfTemperature: 75 } });
    const inp = input(sandParams());
    const sp = Array.from(inp.depth as Float64Array, (d) => (d < 5050 ? 0 : -80)); // shale baseline 0 mV, sands -80 mV
    const r = evaluateWell({ ...inp, curves: { ...inp.curves, sp }, zones: [{ name: 'Res', top: 5000, base: 5200, params: p }] });
    expect(r.resolved[0].ssp).toBeCloseTo(-80, 10);
    expect(r.resolved[0].rwReference).toBeCloseTo(0.022775, 5);
    expect(() => evaluateWell({ ...inp, zones: [{ name: 'Res', top: 5000, base: 5200, params: p }] })).toThrow("zone 'Res': curves.sp is required");
  });

  it('picks GR clean and shale as P5 and P95 of the zone when they are null', () => {
    const p = { ...sandParams(), grClean: null, grShale: null };
    const r = evaluateWell(input(p));
    // The model GR is 20 (clean and tight sands: 50% of samples), 30 (25%) and 120 (shale: 25%, less the last sample).
    expect(r.resolved[0].grClean).toBe(20);
    expect(r.resolved[0].grShale).toBe(120);
  });

  it('a permeability cutoff (Timur, Swirr 0.2) removes the water sand from net reservoir', () => {
    // Timur (1968) // from memory: phi 0.25 -> 480 mD, phi 0.20 -> 180 mD (hand-computed 8581 phi^4.4 / 0.04).
    const p = sandParams({ permeability: { method: 'timur', swIrr: 0.2 } });
    const inp = input(p, { cutoffs: { Res: { vshMax: 0.5, phiMin: 0.08, swMax: 0.6, permMin: 200 } } });
    const r = evaluateWell(inp);
    expect(r.curves.PERM![150]).toBeCloseTo((0.136 * 25 ** 4.4) / 400, 6);
    expect(r.zones[0].netReservoir.thickness.md).toBeCloseTo(50, 9);
    const missing = { ...inp, zones: [{ name: 'Res', top: 5000, base: 5200, params: sandParams() }] };
    expect(() => evaluateWell(missing)).toThrow("zone 'Res': permeability must be set: formation 'Res' has a permMin cutoff");
  });
});

describe('evaluateWell: parameter errors name the zone and the field', () => {
  const p = sandParams();
  const run = (params: ZoneParameters, zone: Partial<EvaluationZone> = {}) => () =>
    evaluateWell({ ...input(p), zones: [{ name: 'Res', top: 5000, base: 5200, params, ...zone }] });

  it('matrix density equal to fluid density', () => {
    expect(run({ ...p, rhoMatrix: 1, rhoFluid: 1 })).toThrow("evaluateWell: zone 'Res': rhoMatrix must differ from rhoFluid");
  });
  it('m <= 0 and Rw <= 0', () => {
    expect(run({ ...p, m: 0 })).toThrow("zone 'Res': m must be > 0");
    expect(run({ ...p, rw: { kind: 'at_temperature', rw: -0.1, temperature: 75 } })).toThrow("zone 'Res': rw.rw must be > 0");
  });
  it('a zone outside the logged interval', () => {
    expect(run(p, { base: 5300 })).toThrow("zone 'Res': base (5300) is below the logged interval, which ends at 5200.25");
  });
  it('a curve the zone method needs, and missing rsh for Simandoux', () => {
    const inp = input(p);
    expect(() => evaluateWell({ ...inp, curves: { gr: inp.curves.gr, rt: inp.curves.rt } })).toThrow("zone 'Res': curves.rhob is required");
    expect(run({ ...p, swModel: 'simandoux', rsh: null })).toThrow("zone 'Res': rsh must be > 0");
  });
  it('reports every problem at once as EvaluationInputError issues', () => {
    try {
      run({ ...p, m: -1, n: 0, rhoMatrix: 1, rhoFluid: 1 })();
      throw new Error('expected an error');
    } catch (e) {
      expect(e).toBeInstanceOf(EvaluationInputError);
      expect((e as EvaluationInputError).issues.map((i) => i.field).sort()).toEqual(['m', 'n', 'rhoMatrix']);
    }
  });
});

describe('defaultZoneParameters, validateZoneParameters, EVALUATION_CONVENTIONS', () => {
  it('every default lithology validates, with matrix constants of the lithology', () => {
    for (const lith of ['sandstone', 'shaly_sand', 'limestone', 'dolomite'] as const) {
      expect(validateZoneParameters(defaultZoneParameters(lith), lith)).toEqual([]);
      expect(validateZoneParameters(defaultZoneParameters(lith, 'm'), lith)).toEqual([]);
    }
    expect(defaultZoneParameters('limestone').rhoMatrix).toBe(2.71);
    expect(defaultZoneParameters('dolomite').rhoMatrix).toBe(2.87);
    expect(defaultZoneParameters('shaly_sand').swModel).toBe('simandoux');
  });

  it('validateZoneParameters returns issues naming the zone and field', () => {
    const issues = validateZoneParameters({ ...defaultZoneParameters('sandstone'), grClean: 100, grShale: 50, phiMax: 0 }, 'B Sand');
    expect(issues).toEqual([
      { zone: 'B Sand', field: 'grShale', message: 'grShale must be greater than grClean (100 gAPI)' },
      { zone: 'B Sand', field: 'phiMax', message: 'phiMax must be in (0, 1]' },
    ]);
  });

  it('EVALUATION_CONVENTIONS states each convention once', () => {
    const keys = EVALUATION_CONVENTIONS.map((c) => c.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const k of ['cutoffs-inclusive', 'sample-thickness', 'averaging', 'gr-index-clipped', 'simandoux-form', 'arps', 'temperature']) {
      expect(keys).toContain(k);
    }
  });
});
