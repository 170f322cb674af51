/**
 * Hot loops of the zone summaries (internal, used by zone-summary.ts): the running sums of
 * gross, net reservoir and net pay over one zone's samples, kept in local variables. Two
 * loops: measured depth only (no survey), and MD with TVD and TVT thickness. Each sample
 * stands for its interval between midpoints to its neighbours, clipped to the zone; the
 * flags come from the plain kernels reservoirFlag and payFlag with the zone's cutoffs.
 * Every sum adds its terms in sample order, as a plain running sum would.
 */
import { type CutoffSet, payFlag, reservoirFlag } from './cutoffs.js';
import { QC_PHIE_CLAMPED, QC_PHIT_CLAMPED, QC_SW_CLAMPED, QC_VSH_CLIPPED } from './qc.js';

type Depth = Float64Array | readonly number[];
type Curve = Float64Array | readonly number[];

/**
 * Sums of one interval class. h, hv, ht: MD, TVD, TVT thickness; hPhi, phiH (phiHv, phiHt):
 * thickness with known PHIE and sum(phi h); phiHSw, phiSwH: sum(phi h) and sum(phi Sw h)
 * where Sw is known too; hc (hcv, hct): sum(phi (1 - Sw) h); hVsh, vshH: thickness with
 * known VSH and sum(Vsh h). hv, ht, phiHv, phiHt, hcv, hct are 0 without a survey.
 */
export interface IntervalSums {
  h: number; hv: number; ht: number;
  hPhi: number; phiH: number; phiHv: number; phiHt: number;
  phiHSw: number; phiSwH: number; hc: number; hcv: number; hct: number;
  hVsh: number; vshH: number;
}

export interface ZoneSums {
  gross: IntervalSums;
  res: IntervalSums;
  pay: IntervalSums;
  sampleCount: number;
  nullCount: number;
  nullThickness: number;
  clamped: { vsh: number; phit: number; phie: number; sw: number };
}

/** Vertical geometry of one zone: boundary positions, the zone's top/base positions, TVT dip terms. */
export interface ZoneVertical {
  tvd: Float64Array;
  north: Float64Array;
  east: Float64Array;
  top: { tvd: number; north: number; east: number };
  base: { tvd: number; north: number; east: number };
  /** True when TVT differs from TVD (dip and a survey with north/east). */
  dipping: boolean;
  /** tan(dip) cos(azimuth), tan(dip) sin(azimuth). */
  kN: number;
  kE: number;
}

function sums(h: number, hPhi: number, phiH: number, phiHSw: number, phiSwH: number, hc: number, hVsh: number, vshH: number): IntervalSums {
  return { h, hv: 0, ht: 0, hPhi, phiH, phiHv: 0, phiHt: 0, phiHSw, phiSwH, hc, hcv: 0, hct: 0, hVsh, vshH };
}

/** Sums over samples start..end-1 of one zone, MD only (no survey). */
export function zoneSumsMd(d: Depth, VSH: Curve, PHIE: Curve, SW: Curve, PERM: Curve | undefined, qc: Uint8Array | undefined, c: CutoffSet, top: number, base: number, start: number, end: number): ZoneSums {
  const n = d.length;
  const vshMax = c.vshMax, phiMin = c.phiMin, swMax = c.swMax, permMin = c.permMin ?? -Infinity;
  const usePerm = permMin > -Infinity;
  let gH = 0, gHPhi = 0, gPhiH = 0, gPhiHSw = 0, gPhiSwH = 0, gHc = 0, gHVsh = 0, gVshH = 0;
  let rH = 0, rPhiH = 0, rPhiHSw = 0, rPhiSwH = 0, rHc = 0, rVshH = 0;
  let pH = 0, pPhiH = 0, pPhiSwH = 0, pHc = 0, pVshH = 0;
  let sampleCount = 0, nullCount = 0, nullThickness = 0;
  let cVsh = 0, cPhit = 0, cPhie = 0, cSw = 0;
  let upper = start === 0 ? d[0] - 0.5 * (d[1] - d[0]) : 0.5 * (d[start - 1] + d[start]);
  for (let i = start; i < end; i++) {
    const lower = i < n - 1 ? 0.5 * (d[i] + d[i + 1]) : d[n - 1] + 0.5 * (d[n - 1] - d[n - 2]);
    const h = (lower > base ? base : lower) - (upper < top ? top : upper);
    upper = lower;
    if (!(h > 0)) continue;
    sampleCount++;
    const vsh = VSH[i], phi = PHIE[i], sw = SW[i], perm = usePerm ? (PERM ? PERM[i] : NaN) : 0;
    gH += h;
    if (phi === phi && sw === sw && vsh === vsh && perm === perm) {
      // Every value known (nearly every sample): plain comparisons, reservoir then pay.
      const ph = phi * h, psh = phi * sw * h, hc = phi * (1 - sw) * h, vh = vsh * h;
      gHPhi += h; gPhiH += ph; gPhiHSw += ph; gPhiSwH += psh; gHc += hc; gHVsh += h; gVshH += vh;
      if (vsh <= vshMax && phi >= phiMin && perm >= permMin) {
        rH += h; rPhiH += ph; rPhiHSw += ph; rPhiSwH += psh; rHc += hc; rVshH += vh;
        if (sw <= swMax) {
          pH += h; pPhiH += ph; pPhiSwH += psh; pHc += hc; pVshH += vh;
        }
      }
    } else {
      // A missing value: the flags by their kernels (1, 0 or NaN).
      const ph = phi * h, vh = vsh * h;
      const r = reservoirFlag(vsh, phi, usePerm ? perm : NaN, vshMax, phiMin, permMin);
      const p = payFlag(r, sw, swMax);
      if (r === 1) rH += h;
      if (p === 1) pH += h;
      else if (p !== p) { nullCount++; nullThickness += h; }
      if (phi === phi) {
        gHPhi += h; gPhiH += ph;
        if (r === 1) rPhiH += ph;
        if (p === 1) pPhiH += ph;
        if (sw === sw) {
          const psh = phi * sw * h, hc = phi * (1 - sw) * h;
          gPhiHSw += ph; gPhiSwH += psh; gHc += hc;
          if (r === 1) { rPhiHSw += ph; rPhiSwH += psh; rHc += hc; }
          if (p === 1) { pPhiSwH += psh; pHc += hc; }
        }
      }
      if (vsh === vsh) {
        gHVsh += h; gVshH += vh;
        if (r === 1) rVshH += vh;
        if (p === 1) pVshH += vh;
      }
    }
    if (qc !== undefined) {
      const q = qc[i];
      if (q !== 0) {
        if (q & QC_VSH_CLIPPED) cVsh++;
        if (q & QC_PHIT_CLAMPED) cPhit++;
        if (q & QC_PHIE_CLAMPED) cPhie++;
        if (q & QC_SW_CLAMPED) cSw++;
      }
    }
  }
  // A net reservoir sample has VSH and PHIE known, a net pay sample SW too: the thickness with
  // a known value of those is the class thickness itself (the same terms in the same order).
  return {
    gross: sums(gH, gHPhi, gPhiH, gPhiHSw, gPhiSwH, gHc, gHVsh, gVshH),
    res: sums(rH, rH, rPhiH, rPhiHSw, rPhiSwH, rHc, rH, rVshH),
    pay: sums(pH, pH, pPhiH, pPhiH, pPhiSwH, pHc, pH, pVshH),
    sampleCount, nullCount, nullThickness,
    clamped: { vsh: cVsh, phit: cPhit, phie: cPhie, sw: cSw },
  };
}

/** Sums over samples start..end-1 of one zone, with TVD and TVT thickness (survey). */
export function zoneSumsGeo(d: Depth, VSH: Curve, PHIE: Curve, SW: Curve, PERM: Curve | undefined, qc: Uint8Array | undefined, c: CutoffSet, top: number, base: number, start: number, end: number, v: ZoneVertical): ZoneSums {
  const n = d.length;
  const vshMax = c.vshMax, phiMin = c.phiMin, swMax = c.swMax, permMin = c.permMin ?? -Infinity;
  const usePerm = permMin > -Infinity;
  const { tvd, north, east, dipping, kN, kE } = v;
  const tvTop = v.top.tvd, nTop = v.top.north, eTop = v.top.east;
  const tvBase = v.base.tvd, nBase = v.base.north, eBase = v.base.east;
  const g = sums(0, 0, 0, 0, 0, 0, 0, 0), r1 = sums(0, 0, 0, 0, 0, 0, 0, 0), p1 = sums(0, 0, 0, 0, 0, 0, 0, 0);
  let sampleCount = 0, nullCount = 0, nullThickness = 0;
  let cVsh = 0, cPhit = 0, cPhie = 0, cSw = 0;
  let upper = start === 0 ? d[0] - 0.5 * (d[1] - d[0]) : 0.5 * (d[start - 1] + d[start]);
  for (let i = start; i < end; i++) {
    const lower = i < n - 1 ? 0.5 * (d[i] + d[i + 1]) : d[n - 1] + 0.5 * (d[n - 1] - d[n - 2]);
    const clipTop = upper < top, clipBase = lower > base;
    const h = (clipBase ? base : lower) - (clipTop ? top : upper);
    upper = lower;
    if (!(h > 0)) continue;
    const hv = (clipBase ? tvBase : tvd[i + 1]) - (clipTop ? tvTop : tvd[i]);
    let ht = hv;
    if (dipping) {
      const dN = (clipBase ? nBase : north[i + 1]) - (clipTop ? nTop : north[i]);
      const dE = (clipBase ? eBase : east[i + 1]) - (clipTop ? eTop : east[i]);
      ht = hv - (kN * dN + kE * dE);
    }
    sampleCount++;
    const vsh = VSH[i], phi = PHIE[i], sw = SW[i], perm = usePerm ? (PERM ? PERM[i] : NaN) : 0;
    add(g, h, hv, ht, vsh, phi, sw);
    if (phi === phi && sw === sw && vsh === vsh && perm === perm) {
      // Every value known (nearly every sample): plain comparisons, reservoir then pay.
      if (vsh <= vshMax && phi >= phiMin && perm >= permMin) {
        add(r1, h, hv, ht, vsh, phi, sw);
        if (sw <= swMax) add(p1, h, hv, ht, vsh, phi, sw);
      }
    } else {
      // A missing value: the flags by their kernels (1, 0 or NaN).
      const r = reservoirFlag(vsh, phi, usePerm ? perm : NaN, vshMax, phiMin, permMin);
      const p = payFlag(r, sw, swMax);
      if (r === 1) add(r1, h, hv, ht, vsh, phi, sw);
      if (p === 1) add(p1, h, hv, ht, vsh, phi, sw);
      else if (p !== p) { nullCount++; nullThickness += h; }
    }
    if (qc !== undefined) {
      const q = qc[i];
      if (q !== 0) {
        if (q & QC_VSH_CLIPPED) cVsh++;
        if (q & QC_PHIT_CLAMPED) cPhit++;
        if (q & QC_PHIE_CLAMPED) cPhie++;
        if (q & QC_SW_CLAMPED) cSw++;
      }
    }
  }
  return { gross: g, res: r1, pay: p1, sampleCount, nullCount, nullThickness, clamped: { vsh: cVsh, phit: cPhit, phie: cPhie, sw: cSw } };
}

/** Adds one sample (MD, TVD, TVT thickness h, hv, ht) to the sums s. */
function add(s: IntervalSums, h: number, hv: number, ht: number, vsh: number, phi: number, sw: number): void {
  s.h += h; s.hv += hv; s.ht += ht;
  if (phi === phi) {
    s.hPhi += h; s.phiH += phi * h; s.phiHv += phi * hv; s.phiHt += phi * ht;
    if (sw === sw) {
      s.phiHSw += phi * h; s.phiSwH += phi * sw * h;
      const so = phi * (1 - sw);
      s.hc += so * h; s.hcv += so * hv; s.hct += so * ht;
    }
  }
  if (vsh === vsh) { s.hVsh += h; s.vshH += vsh * h; }
}
