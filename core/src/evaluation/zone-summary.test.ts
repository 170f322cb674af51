import { describe, expect, it } from 'vitest';
import { QC_PHIT_CLAMPED, QC_SW_CLAMPED } from './qc.js';
import { sampleGeometry } from './sample-geometry.js';
import { cutoffSensitivity } from './sensitivity.js';
import { summariseZones } from './zone-summary.js';

// Five samples at 0.5 ft; zone [1000, 1002]: thicknesses 0.25, 0.5, 0.5, 0.5, 0.25 (midpoint rule).
const depth = [1000, 1000.5, 1001, 1001.5, 1002];
const curves = {
  VSH: [0.1, 0.2, 0.5, 0.1, 0.3],
  PHIE: [0.2, 0.1, 0.3, 0.05, 0.25],
  SW: [0.3, 0.5, 0.4, 0.9, 0.8],
};
const zones = [{ name: 'Z', top: 1000, base: 1002 }];
const cutoffs = { Z: { vshMax: 0.4, phiMin: 0.08, swMax: 0.6 } };

describe('summariseZones', () => {
  it('gross, net reservoir and net pay follow the midpoint rule and the cutoffs (hand-computed)', () => {
    const [s] = summariseZones({ depth, curves, zones, cutoffs });
    expect(s.gross.thickness.md).toBe(2);
    // Reservoir: samples 0 (0.25), 1 (0.5), 4 (0.25) -> 1.0; pay: 0 and 1 -> 0.75.
    expect(s.netReservoir.thickness.md).toBeCloseTo(1.0, 12);
    expect(s.netPay.thickness.md).toBeCloseTo(0.75, 12);
    expect(s.netToGross).toBeCloseTo(0.5, 12);
    expect(s.payToGross).toBeCloseTo(0.375, 12);
    expect(s.gross.thickness.tvd).toBeNull();
    expect(s.sampleCount).toBe(5);
  });

  it('porosity is averaged by thickness and Sw by pore volume (hand-computed)', () => {
    // Convention 'averaging'. Net pay: (phi, Sw, h) = (0.2, 0.3, 0.25), (0.1, 0.5, 0.5).
    // mean phi = (0.05 + 0.05)/0.75 = 0.13333; phi-h = 0.1; mean Sw = (0.015 + 0.025)/0.1 = 0.4
    // (the thickness-weighted Sw would be 0.43333); HCPT = 0.035 + 0.025 = 0.06; mean Vsh = (0.025 + 0.1)/0.75.
    const [s] = summariseZones({ depth, curves, zones, cutoffs });
    expect(s.netPay.meanPhi).toBeCloseTo(0.133333, 6);
    expect(s.netPay.phiH.md).toBeCloseTo(0.1, 12);
    expect(s.netPay.meanSw).toBeCloseTo(0.4, 12);
    expect(s.netPay.hcpt.md).toBeCloseTo(0.06, 12);
    expect(s.netPay.meanVsh).toBeCloseTo(0.125 / 0.75, 12);
  });

  it('counts null samples (undetermined pay) with their thickness, and clamped samples from the QC mask', () => {
    const withGap = { ...curves, SW: [0.3, NaN, 0.4, 0.9, 0.8] };
    const qc = new Uint8Array([0, QC_PHIT_CLAMPED, 0, QC_SW_CLAMPED | QC_PHIT_CLAMPED, 0]);
    const [s] = summariseZones({ depth, curves: withGap, qc, zones, cutoffs });
    expect(s.nullCount).toBe(1);
    expect(s.nullThickness).toBeCloseTo(0.5, 12);
    expect(s.netPay.thickness.md).toBeCloseTo(0.25, 12);
    expect(s.clamped).toEqual({ vsh: 0, phit: 2, phie: 0, sw: 1 });
  });

  it('with a straight 60-degree hole the TVD thickness is half the MD thickness; TVT with dip follows the textbook form', () => {
    // TVD = MD cos(60) on a straight hole; TVT = dMD (cos I - sin I cos(A - dipAz) tan dip) // from memory.
    const survey = [{ md: 0, inc: 60, azi: 90 }, { md: 3000, inc: 60, azi: 90 }];
    const [s] = summariseZones({ depth, curves, zones, cutoffs, survey });
    expect(s.gross.thickness.tvd).toBeCloseTo(1.0, 9);
    expect(s.netPay.thickness.tvd).toBeCloseTo(0.375, 9);
    expect(s.netPay.phiH.tvd).toBeCloseTo(0.05, 9);
    const dipped = summariseZones({ depth, curves, zones: [{ ...zones[0], dipDeg: 10, dipAzimuthDeg: 90 }], cutoffs, geometry: sampleGeometry(depth, survey) })[0];
    const I = Math.PI / 3, tanDip = Math.tan(Math.PI / 18);
    expect(dipped.gross.thickness.tvt).toBeCloseTo(2 * (Math.cos(I) - Math.sin(I) * tanDip), 9);
    expect(dipped.netPay.thickness.tvt).toBeCloseTo(0.75 * (Math.cos(I) - Math.sin(I) * tanDip), 9);
  });

  it('a zone boundary between samples is honoured: two zones add up to the whole interval', () => {
    const two = [
      { name: 'A', top: 1000, base: 1000.6 },
      { name: 'B', top: 1000.6, base: 1002 },
    ];
    const [a, b] = summariseZones({ depth, curves, zones: two, cutoffs: { A: cutoffs.Z, B: cutoffs.Z } });
    expect(a.gross.thickness.md).toBeCloseTo(0.6, 12);
    expect(b.gross.thickness.md).toBeCloseTo(1.4, 12);
    expect(a.netPay.thickness.md + b.netPay.thickness.md).toBeCloseTo(0.75, 12);
  });
});

describe('cutoffSensitivity', () => {
  it('sweeping phiMin gives net pay, phi-h and the share of storage lost (hand-computed)', () => {
    const r = cutoffSensitivity({ depth, curves, zones, cutoffs }, 'phiMin', [0, 0.08, 0.15, 0.22]);
    // Total phi-h = 0.05 + 0.05 + 0.15 + 0.025 + 0.0625 = 0.3375.
    // phiMin 0.15: pay only sample 0 (0.25 ft; sample 2 fails Vsh, 4 fails Sw) -> phi-h 0.05.
    expect(Array.from(r.netPay)).toEqual([0.75, 0.75, 0.25, 0]);
    expect(r.phiH[2]).toBeCloseTo(0.05, 12);
    // Lost below 0.15: samples 1 and 3: 0.075 / 0.3375 = 0.22222; below 0.22: + samples 0 -> 0.125/0.3375.
    expect(r.storageLostShare![0]).toBe(0);
    expect(r.storageLostShare![2]).toBeCloseTo(0.075 / 0.3375, 12);
    expect(r.storageLostShare![3]).toBeCloseTo(0.125 / 0.3375, 12);
  });

  it('net pay never increases as the Sw cutoff is lowered', () => {
    const r = cutoffSensitivity({ depth, curves, zones, cutoffs }, 'swMax', [1, 0.8, 0.6, 0.4, 0.2]);
    for (let k = 1; k < r.netPay.length; k++) expect(r.netPay[k]).toBeLessThanOrEqual(r.netPay[k - 1]);
    expect(r.storageLostShare).toBeNull();
  });

  it('refuses a permMin sweep without a PERM curve', () => {
    expect(() => cutoffSensitivity({ depth, curves, zones, cutoffs }, 'permMin', [1])).toThrow('curves.PERM is required');
  });
});
