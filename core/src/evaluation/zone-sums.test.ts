import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type CutoffSet, payFlag, reservoirFlag } from './cutoffs.js';
import { QC_PHIE_CLAMPED, QC_PHIT_CLAMPED, QC_SW_CLAMPED, QC_VSH_CLIPPED } from './qc.js';
import { type IntervalSums, type ZoneSums, type ZoneVertical, zoneSumsGeo, zoneSumsMd } from './zone-sums.js';

// The summary loops are written for speed (sums in locals, flags without branches). This file
// holds the plain form of the same rules, written for reading: each sample's interval between
// midpoints to its neighbours, clipped to the zone; flags from reservoirFlag / payFlag; each
// class summed in sample order. The fast loop must give the very same doubles.

function emptySums(): IntervalSums {
  return { h: 0, hv: 0, ht: 0, hPhi: 0, phiH: 0, phiHv: 0, phiHt: 0, phiHSw: 0, phiSwH: 0, hc: 0, hcv: 0, hct: 0, hVsh: 0, vshH: 0 };
}

/** h, hv, ht: MD, TVD and TVT thickness of the sample (hv = ht = 0 without a survey). */
function addSample(s: IntervalSums, h: number, hv: number, ht: number, vsh: number, phi: number, sw: number, geo: boolean): void {
  s.h += h;
  if (geo) {
    s.hv += hv;
    s.ht += ht;
  }
  if (!Number.isNaN(phi)) {
    s.hPhi += h;
    s.phiH += phi * h;
    if (geo) {
      s.phiHv += phi * hv;
      s.phiHt += phi * ht;
    }
    if (!Number.isNaN(sw)) {
      s.phiHSw += phi * h;
      s.phiSwH += phi * sw * h;
      s.hc += phi * (1 - sw) * h;
      if (geo) {
        s.hcv += phi * (1 - sw) * hv;
        s.hct += phi * (1 - sw) * ht;
      }
    }
  }
  if (!Number.isNaN(vsh)) {
    s.hVsh += h;
    s.vshH += vsh * h;
  }
}

function plainSums(d: number[], vsh: number[], phi: number[], sw: number[], perm: number[] | undefined, qc: Uint8Array, c: CutoffSet, top: number, base: number, v?: ZoneVertical): ZoneSums {
  const out: ZoneSums = { gross: emptySums(), res: emptySums(), pay: emptySums(), sampleCount: 0, nullCount: 0, nullThickness: 0, clamped: { vsh: 0, phit: 0, phie: 0, sw: 0 } };
  const n = d.length;
  for (let i = 0; i < n; i++) {
    const upper = i === 0 ? d[0] - (d[1] - d[0]) / 2 : (d[i - 1] + d[i]) / 2;
    const lower = i === n - 1 ? d[n - 1] + (d[n - 1] - d[n - 2]) / 2 : (d[i] + d[i + 1]) / 2;
    const h = Math.min(lower, base) - Math.max(upper, top);
    if (!(h > 0)) continue;
    // TVD and TVT thickness between the sample's (clipped) boundaries: positions at the
    // boundaries (v.tvd[i], v.tvd[i + 1]) or at the zone's top / base where clipped.
    let hv = 0, ht = 0;
    if (v) {
      const at = (k: number, clip: boolean, end: 'top' | 'base') => (clip ? v[end] : { tvd: v.tvd[k], north: v.north[k], east: v.east[k] });
      const a = at(i, upper < top, 'top'), b = at(i + 1, lower > base, 'base');
      hv = b.tvd - a.tvd;
      ht = v.dipping ? hv - (v.kN * (b.north - a.north) + v.kE * (b.east - a.east)) : hv;
    }
    out.sampleCount++;
    const r = reservoirFlag(vsh[i], phi[i], perm ? perm[i] : NaN, c.vshMax, c.phiMin, c.permMin ?? -Infinity);
    const p = payFlag(r, sw[i], c.swMax);
    addSample(out.gross, h, hv, ht, vsh[i], phi[i], sw[i], v !== undefined);
    if (r === 1) addSample(out.res, h, hv, ht, vsh[i], phi[i], sw[i], v !== undefined);
    if (p === 1) addSample(out.pay, h, hv, ht, vsh[i], phi[i], sw[i], v !== undefined);
    if (Number.isNaN(p)) {
      out.nullCount++;
      out.nullThickness += h;
    }
    if (qc[i] & QC_VSH_CLIPPED) out.clamped.vsh++;
    if (qc[i] & QC_PHIT_CLAMPED) out.clamped.phit++;
    if (qc[i] & QC_PHIE_CLAMPED) out.clamped.phie++;
    if (qc[i] & QC_SW_CLAMPED) out.clamped.sw++;
  }
  return out;
}

/** Values around the cutoffs, exactly on them, missing, and now and then infinite or negative. */
const value = fc.oneof(
  { weight: 12, arbitrary: fc.double({ min: 0, max: 1, noNaN: true }) },
  { weight: 3, arbitrary: fc.constantFrom(0.08, 0.4, 0.6, 0, 1) },
  { weight: 2, arbitrary: fc.constant(Number.NaN) },
  { weight: 1, arbitrary: fc.constantFrom(Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0.2, 1e300) },
);

const wellArb = fc.integer({ min: 2, max: 60 }).chain((n) =>
  fc.record({
    steps: fc.array(fc.double({ min: 0.01, max: 2, noNaN: true }), { minLength: n, maxLength: n }),
    vsh: fc.array(value, { minLength: n, maxLength: n }),
    phi: fc.array(value, { minLength: n, maxLength: n }),
    sw: fc.array(value, { minLength: n, maxLength: n }),
    perm: fc.array(fc.oneof(fc.double({ min: 0, max: 2000, noNaN: true }), fc.constant(Number.NaN)), { minLength: n, maxLength: n }),
    qc: fc.array(fc.integer({ min: 0, max: 31 }), { minLength: n, maxLength: n }),
    usePerm: fc.boolean(),
    permMin: fc.constantFrom(0.1, 1, 10),
    topFrac: fc.double({ min: -0.1, max: 0.6, noNaN: true }),
    cosInc: fc.array(fc.double({ min: 0.2, max: 1, noNaN: true }), { minLength: n + 1, maxLength: n + 1 }),
    dipping: fc.boolean(),
    baseFrac: fc.double({ min: 0.4, max: 1.1, noNaN: true }),
  }),
);

describe('zoneSumsMd', () => {
  it('gives the same doubles as the plain per-sample form (random wells with missing, infinite and on-cutoff values)', () => {
    fc.assert(
      fc.property(wellArb, (w) => {
        const d: number[] = [];
        let x = 1000;
        for (const s of w.steps) d.push((x += s));
        const span = d[d.length - 1] - d[0];
        const top = d[0] + w.topFrac * span;
        const base = Math.max(top + 0.001, d[0] + w.baseFrac * span);
        const c: CutoffSet = { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: w.usePerm ? w.permMin : null };
        const perm = w.usePerm ? w.perm : undefined;
        const qc = Uint8Array.from(w.qc);
        const fast = zoneSumsMd(Float64Array.from(d), Float64Array.from(w.vsh), Float64Array.from(w.phi), Float64Array.from(w.sw), perm && Float64Array.from(perm), qc, c, top, base, 0, d.length);
        expect(fast).toEqual(plainSums(d, w.vsh, w.phi, w.sw, perm, qc, c, top, base));
      }),
      { numRuns: 400, seed: 20261202 },
    );
  });
});

describe('zoneSumsGeo', () => {
  it('gives the same doubles as the plain per-sample form, with TVD and TVT thickness', () => {
    fc.assert(
      fc.property(wellArb, (w) => {
        const d: number[] = [];
        let x = 1000;
        for (const s of w.steps) d.push((x += s));
        const n = d.length;
        const span = d[n - 1] - d[0];
        const top = d[0] + w.topFrac * span;
        const base = Math.max(top + 0.001, d[0] + w.baseFrac * span);
        // Boundary positions of an invented path: TVD grows by cos(inclination) per unit MD.
        const tvd = new Float64Array(n + 1), north = new Float64Array(n + 1), east = new Float64Array(n + 1);
        for (let k = 1; k <= n; k++) {
          tvd[k] = tvd[k - 1] + w.cosInc[k] * (k < n ? w.steps[k] : 1);
          north[k] = north[k - 1] + (1 - w.cosInc[k]);
          east[k] = east[k - 1] + 0.5 * (1 - w.cosInc[k]);
        }
        const v: ZoneVertical = {
          tvd, north, east,
          top: { tvd: tvd[0] - 0.3, north: -0.1, east: 0.2 },
          base: { tvd: tvd[n] + 0.4, north: north[n] + 0.1, east: east[n] - 0.1 },
          dipping: w.dipping, kN: w.dipping ? 0.12 : 0, kE: w.dipping ? -0.05 : 0,
        };
        const c: CutoffSet = { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: w.usePerm ? w.permMin : null };
        const perm = w.usePerm ? w.perm : undefined;
        const qc = Uint8Array.from(w.qc);
        const fast = zoneSumsGeo(Float64Array.from(d), Float64Array.from(w.vsh), Float64Array.from(w.phi), Float64Array.from(w.sw), perm && Float64Array.from(perm), qc, c, top, base, 0, n, v);
        expect(fast).toEqual(plainSums(d, w.vsh, w.phi, w.sw, perm, qc, c, top, base, v));
      }),
      { numRuns: 400, seed: 20261203 },
    );
  });
});
