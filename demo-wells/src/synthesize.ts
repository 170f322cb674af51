/**
 * Synthetic logs of a model well: the forward responses of forward/ sampled on the well's
 * depth grid, plus measurement noise, washouts and null runs.
 *
 * Model simplifications (stated so nobody mistakes them for tool physics): each sample reads
 * the layer at its own depth (no vertical averaging or shoulder-bed effect); the density and
 * neutron tools read a fully flushed zone (see model/constants.ts); the deep resistivity reads
 * the uninvaded zone exactly as the formation's saturation relation says.
 *
 * Noise (model choices, in the range of published tool repeatabilities // common practice):
 * GR sd 0.25 sqrt(GR) gAPI (counting statistics scale with the square root of the count);
 * RHOB sd 0.008 g/cm3; DRHO sd 0.004 g/cm3; NPHI sd 0.008 v/v; DT sd 0.8 us/ft; RT
 * multiplicative, log-normal sd 0.03; SP sd 0.4 mV plus a baseline drift of 1.2 mV per 100 ft;
 * CALI sd 0.03 in.
 */
import { gammaRayFromVsh } from './forward/gamma-ray.js';
import { bulkDensity, neutronPorosity, sonicTransitTime } from './forward/porosity-logs.js';
import { archieRt, simandouxRt } from './forward/resistivity.js';
import { shalySp, staticSp } from './forward/spontaneous-potential.js';
import { arpsForward } from './forward/water-resistivity.js';
import { type WellColumn, sampleDepth, stateAt } from './model/column.js';
import {
  BIT_SIZE_IN,
  DT_FLUID,
  DT_MATRIX,
  DT_SHALE,
  FIELD_SEED,
  GR_CLEAN,
  GR_SHALE,
  NPHI_MATRIX,
  NPHI_SHALE,
  RHO_FLUID,
  RHO_MATRIX,
  RHO_SHALE,
  RMF_REFERENCE,
} from './model/constants.js';
import { FORMATIONS, OVERBURDEN } from './model/formations.js';
import { createRandom } from './random.js';

/** Canonical curve keys, in file column order. Units: gAPI, mV, in, g/cm3, g/cm3, v/v, us/ft, ohm.m. */
export const CURVE_KEYS = ['GR', 'SP', 'CALI', 'RHOB', 'DRHO', 'NPHI', 'DT', 'RT'] as const;
export type CurveKey = (typeof CURVE_KEYS)[number];

export interface SyntheticLogs {
  well: string;
  /** Depth of each sample in the sampling unit, and MD in feet. */
  depth: Float64Array;
  md: Float64Array;
  unit: 'ft' | 'm';
  /** Curves in canonical units; NaN in null runs. */
  curves: Record<CurveKey, Float64Array>;
}

export interface SynthesizeOptions {
  /** Sample index range [from, to) of the well's sampling; default the whole log. */
  from?: number;
  to?: number;
  /** Label of the logging run, mixed into the noise streams (default 'run1'). */
  run?: string;
  /** Add noise, washouts and null runs (default true). */
  noise?: boolean;
  /** Seed of the noise streams (default FIELD_SEED). */
  seed?: number;
}

/** Mudcake on permeable rock, inches of hole-diameter reduction (model choice: 1/8 in each side). */
const MUDCAKE_IN = 0.25;

/** Synthesizes the logs of a well column. */
export function synthesizeLogs(col: WellColumn, options: SynthesizeOptions = {}): SyntheticLogs {
  const w = col.well;
  const from = options.from ?? 0;
  const to = options.to ?? col.sampling.count;
  const noisy = options.noise ?? true;
  const run = options.run ?? 'run1';
  const n = to - from;
  const depth = new Float64Array(n);
  const md = new Float64Array(n);
  const curves = Object.fromEntries(CURVE_KEYS.map((k) => [k, new Float64Array(n)])) as Record<CurveKey, Float64Array>;
  const rng = Object.fromEntries(CURVE_KEYS.map((k) => [k, createRandom(options.seed ?? FIELD_SEED, `${w.name}/${run}/${k}`)])) as Record<
    CurveKey,
    ReturnType<typeof createRandom>
  >;
  const anchorMd = (anchor: string): number => {
    if (anchor === 'log_top') return col.logTopMd;
    const k = FORMATIONS.findIndex((f) => f.name === anchor);
    if (k < 0) throw new RangeError(`synthesizeLogs: unknown anchor '${anchor}' in well ${w.name}`);
    return col.topsMd[k];
  };

  for (let i = 0; i < n; i++) {
    const s = sampleDepth(col.sampling, from + i);
    depth[i] = s.depth;
    md[i] = s.md;
    const st = stateAt(w, s.md);
    const f = st.formation < 0 ? OVERBURDEN : FORMATIONS[st.formation];
    const { temperatureF, rw } = st.formation < 0 ? col.overburden : { temperatureF: col.temperatureF[st.formation], rw: col.rw[st.formation] };
    const { porosity: phi, vsh } = st.layer;
    const sw = st.layer.sw[st.fluid];
    const rc = f.resistivity;

    let gr = gammaRayFromVsh(vsh, f.vshTransform, GR_CLEAN, GR_SHALE);
    let rhob = bulkDensity(phi, vsh, RHO_MATRIX[f.matrix], RHO_SHALE, RHO_FLUID);
    let nphi = neutronPorosity(phi, vsh, NPHI_MATRIX[f.matrix], NPHI_SHALE);
    let dt = sonicTransitTime(phi, vsh, DT_MATRIX[f.matrix], DT_SHALE, DT_FLUID);
    let rt = rc.relation === 'archie' ? archieRt(phi, sw, rw, rc.a, rc.m, rc.n) : simandouxRt(phi, sw, vsh, rw, rc.rsh ?? NaN, rc.a, rc.m, rc.n);
    const rmf = arpsForward(RMF_REFERENCE.rmf, RMF_REFERENCE.temperatureF, temperatureF);
    let sp = shalySp(staticSp(rmf, rw, temperatureF), vsh);
    const permeable = phi >= 0.1 && vsh <= 0.3;
    let cali = BIT_SIZE_IN - (permeable ? MUDCAKE_IN : 0);
    let drho = 0.01;

    if (noisy) {
      for (const wo of w.washouts) {
        const d = s.md - (anchorMd(wo.anchor) + wo.offsetFt);
        if (Math.abs(d) < wo.halfWidthFt) {
          // Enlarged hole (model choice): raised-cosine profile; the density pad loses contact
          // (RHOB low, DRHO high) and the neutron reads more hole fluid.
          const e = (wo.peakIn - BIT_SIZE_IN) * 0.5 * (1 + Math.cos((Math.PI * d) / wo.halfWidthFt));
          cali += e;
          rhob -= 0.05 * e;
          drho += 0.03 * e;
          nphi += 0.015 * e;
        }
      }
      gr += rng.GR.normal(0, 0.25 * Math.sqrt(Math.max(gr, 1)));
      rhob += rng.RHOB.normal(0, 0.008);
      drho += rng.DRHO.normal(0, 0.004);
      nphi += rng.NPHI.normal(0, 0.008);
      dt += rng.DT.normal(0, 0.8);
      rt *= Math.exp(rng.RT.normal(0, 0.03));
      sp += rng.SP.normal(0, 0.4) + 0.012 * (s.md - col.logTopMd);
      cali += rng.CALI.normal(0, 0.03);
    }
    curves.GR[i] = gr;
    curves.SP[i] = sp;
    curves.CALI[i] = cali;
    curves.RHOB[i] = rhob;
    curves.DRHO[i] = drho;
    curves.NPHI[i] = nphi;
    curves.DT[i] = dt;
    curves.RT[i] = rt;
  }

  if (noisy) {
    for (const nr of w.nullRuns) {
      const key = nr.curve as CurveKey;
      if (!CURVE_KEYS.includes(key)) throw new RangeError(`synthesizeLogs: unknown null-run curve '${nr.curve}' in well ${w.name}`);
      const top = anchorMd(nr.anchor) + nr.offsetFt;
      for (let i = 0; i < n; i++) if (md[i] >= top && md[i] < top + nr.lengthFt) curves[key][i] = NaN;
    }
  }
  return { well: w.name, depth, md, unit: col.sampling.unit, curves };
}
