/**
 * The model's own answer per well and zone: gross, net reservoir and net pay thickness (MD
 * and TVD), thickness-weighted mean porosity and Vsh, pore-volume-weighted mean Sw, phi-h and
 * hydrocarbon pore thickness, from the layers' true properties and the model cutoffs
 * (inclusive), integrated exactly over the layer intervals (no sampling).
 *
 * Zones are the formations (top to next top; the last to the base of the logs). Fluid zones
 * split a formation at the contacts of one hydrocarbon accumulation (see accumulations.ts);
 * the in-place volumes are computed from them.
 */
import { M_PER_FT } from './constants.js';
import type { Interval, WellColumn } from './column.js';
import { mdAtLevel } from './column.js';
import { FORMATIONS, compartmentByName } from './formations.js';
import { MODEL_CUTOFFS } from './parameters.js';
import { pathAt } from './trajectory.js';
import type { Fluid } from './types.js';
import { ACCUMULATIONS, type Accumulation } from './accumulations.js';

export interface IntervalTruth {
  /** Thickness, ft, measured along hole and true vertical. */
  md: number;
  tvd: number;
  /** Thickness-weighted mean effective porosity (null when the thickness is 0). */
  meanPhi: number | null;
  /** Pore-volume-weighted mean Sw: sum(phi Sw h) / sum(phi h). */
  meanSw: number | null;
  /** Thickness-weighted mean Vsh. */
  meanVsh: number | null;
  /** sum(phi h), ft (MD h). */
  phiH: number;
  /** Hydrocarbon pore thickness sum(phi (1 - Sw) h), ft, MD and TVD h. */
  hcptMd: number;
  hcptTvd: number;
}

export interface ZoneTruth {
  well: string;
  /** Zone name: the formation name, or "<formation> <fluid>" for a fluid zone. */
  zone: string;
  formation: string;
  /** MD of the zone's top and base, ft. */
  topMd: number;
  baseMd: number;
  /** Top and base in the well's depth unit (what the tops file and the LAS files use). */
  top: number;
  base: number;
  depthUnit: 'ft' | 'm';
  gross: { md: number; tvd: number };
  netReservoir: IntervalTruth;
  netPay: IntervalTruth;
}

export interface FluidZoneTruth extends ZoneTruth {
  accumulation: string;
  fluid: Fluid;
}

class Acc {
  md = 0; tvd = 0; phiH = 0; phiSwH = 0; vshH = 0; hcMd = 0; hcTvd = 0;
  add(md: number, tvd: number, phi: number, sw: number, vsh: number): void {
    this.md += md; this.tvd += tvd; this.phiH += phi * md; this.phiSwH += phi * sw * md; this.vshH += vsh * md;
    this.hcMd += phi * (1 - sw) * md; this.hcTvd += phi * (1 - sw) * tvd;
  }
  result(): IntervalTruth {
    return {
      md: this.md,
      tvd: this.tvd,
      meanPhi: this.md > 0 ? this.phiH / this.md : null,
      meanSw: this.phiH > 0 ? this.phiSwH / this.phiH : null,
      meanVsh: this.md > 0 ? this.vshH / this.md : null,
      phiH: this.phiH,
      hcptMd: this.hcMd,
      hcptTvd: this.hcTvd,
    };
  }
}

/** Truth of the interval [topMd, baseMd) of a well, judged with `formation`'s cutoffs. */
function intervalTruth(col: WellColumn, zone: string, formation: string, topMd: number, baseMd: number): ZoneTruth {
  const c = MODEL_CUTOFFS[formation];
  const res = new Acc();
  const pay = new Acc();
  const tvdAt = (md: number) => pathAt(col.well.trajectory, md).tvd;
  for (const iv of col.intervals as Interval[]) {
    const a = Math.max(iv.topMd, topMd);
    const b = Math.min(iv.baseMd, baseMd);
    if (!(b > a)) continue;
    const { porosity: phi, vsh } = iv.layer;
    const sw = iv.layer.sw[iv.fluid];
    const h = b - a;
    const hv = tvdAt(b) - tvdAt(a);
    const isRes = vsh <= c.vshMax && phi >= c.phiMin;
    if (isRes) res.add(h, hv, phi, sw, vsh);
    if (isRes && sw <= c.swMax) pay.add(h, hv, phi, sw, vsh);
  }
  const k = col.sampling.unit === 'm' ? M_PER_FT : 1;
  return {
    well: col.well.name,
    zone,
    formation,
    topMd,
    baseMd,
    top: topMd * k,
    base: baseMd * k,
    depthUnit: col.sampling.unit,
    gross: { md: baseMd - topMd, tvd: tvdAt(baseMd) - tvdAt(topMd) },
    netReservoir: res.result(),
    netPay: pay.result(),
  };
}

/** MD range (ft) of formation k's zone in a well: its top to the next top (the last: to the base of the logs). */
export function zoneRangeMd(col: WellColumn, k: number): [number, number] {
  return [col.topsMd[k], k + 1 < FORMATIONS.length ? col.topsMd[k + 1] : col.logBaseMd];
}

/** Truth of every formation zone of a well (FORMATIONS order). */
export function zoneTruths(col: WellColumn): ZoneTruth[] {
  return FORMATIONS.map((f, k) => {
    const [top, base] = zoneRangeMd(col, k);
    return intervalTruth(col, f.name, f.name, top, base);
  });
}

/**
 * MD range (ft) of an accumulation's fluid leg inside its formation's zone in a well, or null
 * when the well does not penetrate that leg: the zone clipped to [upper contact, lower
 * contact) of the fluid (gas: above the goc; oil: goc to owc).
 */
export function fluidZoneRangeMd(col: WellColumn, acc: Accumulation): [number, number] | null {
  const k = FORMATIONS.findIndex((f) => f.name === acc.formation);
  const [zTop, zBase] = zoneRangeMd(col, k);
  const c = compartmentByName(acc.compartment);
  const kb = col.kbElevationFt;
  const levelMd = (tvdss: number): number => {
    // Above the logs or below them: clip to the zone.
    const topSs = pathAt(col.well.trajectory, zTop).tvd - kb;
    const baseSs = pathAt(col.well.trajectory, zBase).tvd - kb;
    if (tvdss <= topSs) return zTop;
    if (tvdss >= baseSs) return zBase;
    return mdAtLevel(col.well, tvdss);
  };
  const top = acc.fluid === 'gas' ? zTop : levelMd(c.goc);
  const base = acc.fluid === 'gas' ? levelMd(c.goc) : levelMd(c.owc);
  return base > top ? [top, base] : null;
}

/** Truth of every fluid zone of a well (accumulations the well penetrates). */
export function fluidZoneTruths(col: WellColumn): FluidZoneTruth[] {
  const out: FluidZoneTruth[] = [];
  for (const acc of ACCUMULATIONS) {
    const r = fluidZoneRangeMd(col, acc);
    if (!r) continue;
    const t = intervalTruth(col, acc.zoneName, acc.formation, r[0], r[1]);
    out.push({ ...t, accumulation: acc.name, fluid: acc.fluid });
  }
  return out;
}
