/**
 * A well's column through the earth model: where the path crosses each formation top, layer
 * boundary and fluid contact (in MD), the intervals of uniform rock and fluid between them,
 * the logged interval and its sampling, and each formation's temperature and Rw.
 */
import {
  GEOTHERMAL_GRADIENT_F_PER_100FT,
  M_PER_FT,
  RW_REFERENCE,
  STEP_FT,
  STEP_M,
  SURFACE_TEMPERATURE_F,
} from './constants.js';
import { COMPARTMENTS, FORMATIONS, OVERBURDEN, compartmentByName, formationTopsTvdss, layerBoundaries } from './formations.js';
import { pathAt } from './trajectory.js';
import type { Fluid, Layer, WellSpec } from './types.js';
import { kbElevationFt } from './wells.js';
import { arpsForward, formationTemperatureF } from '../forward/water-resistivity.js';

/** Logs start this far (MD, ft) above the Greyling Shale top and end this far below the Pellow Shale top. */
export const LOG_ABOVE_FIRST_TOP_FT = 140;
export const LOG_BELOW_LAST_TOP_FT = 35;

/** What the model holds at one point of a well. */
export interface PointState {
  md: number;
  tvd: number;
  tvdss: number;
  x: number;
  y: number;
  /** Formation index into FORMATIONS, or -1 for the overburden above the first top. */
  formation: number;
  layer: Layer;
  fluid: Fluid;
}

/** An interval of uniform rock and fluid along the well (MD and TVD below KB, ft). */
export interface Interval {
  topMd: number;
  baseMd: number;
  topTvd: number;
  baseTvd: number;
  formation: number;
  layer: Layer;
  fluid: Fluid;
}

/** Depth sampling of a well's LAS files: depth(i) = (firstIndex + i) * step in `unit`. */
export interface Sampling {
  unit: 'ft' | 'm';
  step: number;
  firstIndex: number;
  count: number;
}

export interface WellColumn {
  well: WellSpec;
  kbElevationFt: number;
  /** MD (ft) of each formation top, FORMATIONS order. */
  topsMd: number[];
  topsTvd: number[];
  logTopMd: number;
  logBaseMd: number;
  sampling: Sampling;
  intervals: Interval[];
  /** Per formation: temperature (F) at the formation's mid-depth in this well, and Rw there (ohm.m). */
  temperatureF: number[];
  rw: number[];
  /** Same for the overburden (at the top of the logs). */
  overburden: { temperatureF: number; rw: number };
}

function fluidAt(layer: Layer, tvdss: number): Fluid {
  if (layer.compartment === null) return 'water';
  const c = compartmentByName(layer.compartment);
  return tvdss < c.goc ? 'gas' : tvdss < c.owc ? 'oil' : 'water';
}

/** The model at measured depth `md` (ft) of well `w`. */
export function stateAt(w: WellSpec, md: number): PointState {
  const p = pathAt(w.trajectory, md);
  const x = w.x + p.east;
  const y = w.y + p.north;
  const tvdss = p.tvd - kbElevationFt(w);
  const tops = formationTopsTvdss(x, y);
  let formation = -1;
  for (let k = 0; k < FORMATIONS.length; k++) if (tops[k] <= tvdss) formation = k;
  let layer: Layer;
  if (formation < 0) layer = OVERBURDEN.layers[0];
  else {
    const f = FORMATIONS[formation];
    const b = layerBoundaries(f, tops[formation], tops[formation + 1] - tops[formation]);
    let j = 0;
    for (let i = 0; i < f.layers.length; i++) if (b[i] <= tvdss) j = i;
    layer = f.layers[j];
  }
  return { md, tvd: p.tvd, tvdss, x, y, formation, layer, fluid: fluidAt(layer, tvdss) };
}

/** MD (ft) where `h(md)` changes sign from negative to positive, by bisection to 1e-9 ft on [lo, hi]. */
function crossing(h: (md: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  if (!(h(a) < 0 && h(b) >= 0)) throw new RangeError('crossing: the surface is not crossed inside the search interval');
  while (b - a > 1e-9) {
    const m = 0.5 * (a + b);
    if (h(m) < 0) a = m;
    else b = m;
  }
  return b;
}

const MAX_MD = 12000;

function positionAt(w: WellSpec, md: number): { x: number; y: number; tvdss: number } {
  const p = pathAt(w.trajectory, md);
  return { x: w.x + p.east, y: w.y + p.north, tvdss: p.tvd - kbElevationFt(w) };
}

/** MD (ft) where the well crosses the surface `surface(x, y)` (TVDSS ft). */
export function mdAtSurface(w: WellSpec, surface: (x: number, y: number) => number): number {
  return crossing((md) => {
    const q = positionAt(w, md);
    return q.tvdss - surface(q.x, q.y);
  }, 0, MAX_MD);
}

/** MD (ft) where the well reaches a flat level (TVDSS ft). */
export function mdAtLevel(w: WellSpec, tvdss: number): number {
  return mdAtSurface(w, () => tvdss);
}

function layerSurface(k: number, j: number): (x: number, y: number) => number {
  return (x, y) => {
    const tops = formationTopsTvdss(x, y);
    return layerBoundaries(FORMATIONS[k], tops[k], tops[k + 1] - tops[k])[j];
  };
}

/** Sampling grid of a well: 0.5 ft, or 0.1 m for the metric well, covering [topMd, baseMd]. */
export function samplingFor(w: WellSpec, topMd: number, baseMd: number): Sampling {
  const unit = w.delivery.kind === 'las2_metric' ? 'm' : 'ft';
  const step = unit === 'm' ? STEP_M : STEP_FT;
  const toUnit = unit === 'm' ? M_PER_FT : 1;
  const first = Math.floor((topMd * toUnit) / step);
  const last = Math.ceil((baseMd * toUnit) / step);
  return { unit, step, firstIndex: first, count: last - first + 1 };
}

/** Depth of sample i in the sampling's unit, and in feet. */
export function sampleDepth(s: Sampling, i: number): { depth: number; md: number } {
  const depth = (s.firstIndex + i) * s.step;
  return { depth, md: s.unit === 'm' ? depth / M_PER_FT : depth };
}

function temperatureAndRw(w: WellSpec, tvdss: number): { temperatureF: number; rw: number } {
  // Rounded to 0.1 F: the model states its temperatures as a user would read them.
  const t = Math.round(10 * formationTemperatureF(SURFACE_TEMPERATURE_F, GEOTHERMAL_GRADIENT_F_PER_100FT, tvdss + w.groundElevationFt)) / 10;
  return { temperatureF: t, rw: arpsForward(RW_REFERENCE.rw, RW_REFERENCE.temperatureF, t) };
}

/** Builds the column of well `w`. */
export function wellColumn(w: WellSpec): WellColumn {
  const kb = kbElevationFt(w);
  const nF = FORMATIONS.length;
  const topsMd = FORMATIONS.map((_, k) => mdAtSurface(w, layerSurface(k, 0)));
  const topsTvd = topsMd.map((md) => pathAt(w.trajectory, md).tvd);
  const rawTop = topsMd[0] - LOG_ABOVE_FIRST_TOP_FT;
  const rawBase = topsMd[nF - 1] + LOG_BELOW_LAST_TOP_FT;
  const sampling = samplingFor(w, rawTop, rawBase);
  const logTopMd = sampleDepth(sampling, 0).md;
  const logBaseMd = sampleDepth(sampling, sampling.count - 1).md;

  // Breakpoints: every layer boundary and every contact the logged interval crosses.
  const breaks = new Set<number>([logTopMd, logBaseMd]);
  const add = (md: number) => {
    if (md > logTopMd && md < logBaseMd) breaks.add(md);
  };
  for (let k = 0; k < nF; k++) for (let j = 0; j < FORMATIONS[k].layers.length; j++) add(mdAtSurface(w, layerSurface(k, j)));
  const topTvdss = positionAt(w, logTopMd).tvdss;
  const baseTvdss = positionAt(w, logBaseMd).tvdss;
  for (const c of COMPARTMENTS) {
    for (const level of [c.goc, c.owc]) if (level > topTvdss && level < baseTvdss) add(mdAtLevel(w, level));
  }
  const mds = [...breaks].sort((a, b) => a - b);
  const intervals: Interval[] = [];
  for (let i = 0; i + 1 < mds.length; i++) {
    const s = stateAt(w, 0.5 * (mds[i] + mds[i + 1]));
    const prev = intervals[intervals.length - 1];
    if (prev && prev.formation === s.formation && prev.layer === s.layer && prev.fluid === s.fluid) {
      prev.baseMd = mds[i + 1];
      prev.baseTvd = pathAt(w.trajectory, mds[i + 1]).tvd;
    } else {
      intervals.push({
        topMd: mds[i],
        baseMd: mds[i + 1],
        topTvd: pathAt(w.trajectory, mds[i]).tvd,
        baseTvd: pathAt(w.trajectory, mds[i + 1]).tvd,
        formation: s.formation,
        layer: s.layer,
        fluid: s.fluid,
      });
    }
  }

  // Temperature and Rw per formation at its mid-depth where the well crosses its top.
  const temperatureF: number[] = [];
  const rw: number[] = [];
  for (let k = 0; k < nF; k++) {
    const q = positionAt(w, topsMd[k]);
    const mid = q.tvdss + 0.5 * FORMATIONS[k].isochore(q.x, q.y);
    const tr = temperatureAndRw(w, mid);
    temperatureF.push(tr.temperatureF);
    rw.push(tr.rw);
  }
  const overburden = temperatureAndRw(w, topTvdss);
  return { well: w, kbElevationFt: kb, topsMd, topsTvd, logTopMd, logBaseMd, sampling, intervals, temperatureF, rw, overburden };
}
