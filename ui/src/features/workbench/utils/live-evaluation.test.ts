import { defaultZoneParameters, evaluateWell } from '@poreline/core';
import { describe, expect, it } from 'vitest';
import type { WorkbenchDto } from '../../../types/workbench';
import type { MergedSamples } from '../api/get-merged-samples';
import { applyLiveCutoffs, compareSummaries, evaluateBase, sensitivityFor, toCutoffTable } from './live-evaluation';

// A ten-sample well worked by hand: 1 ft step, one zone 999.5-1009.5 ft (gross 10 ft).
// GR 20 (clean) on the first five samples, 120 (shale) below: Vsh 0 then 1 (linear index, picks 20/120).
// RHOB 2.32 everywhere: density porosity (2.65 - 2.32) / (2.65 - 1.0) = 0.2.
// Archie with a = 1, m = 2, n = 2, Rw 0.05 ohm.m at a constant 75 F: Sw = sqrt(0.05 / (0.2^2 Rt)),
// so Rt 5 gives Sw 0.5 and Rt 1.25 gives Sw 1 (by hand).
const depth = Float64Array.from({ length: 10 }, (_, i) => 1000 + i);
const gr = Float64Array.from([20, 20, 20, 20, 20, 120, 120, 120, 120, 120]);
const rhob = new Float64Array(10).fill(2.32);
const rt = Float64Array.from([5, 5, 5, 1.25, 1.25, 5, 5, 5, 5, 5]);
const curve = (mnemonic: string, unit: string, values: Float64Array) => ({ mnemonic, unit, values, source: null });
const samples: MergedSamples = {
  depth,
  depthUnit: 'ft',
  curves: { GR: curve('GR', 'gAPI', gr), RHOB: curve('RHOB', 'g/cm3', rhob), RT: curve('RT', 'ohm.m', rt) },
};
const params = {
  ...defaultZoneParameters('sandstone', 'ft'),
  grClean: 20,
  grShale: 120,
  temperature: { kind: 'constant' as const, temperature: 75 },
  rw: { kind: 'at_temperature' as const, rw: 0.05, temperature: 75 },
};
const stored = { 'A Sand': { vshMax: 0.4, phiMin: 0.1, swMax: 0.6, permMin: null } };
const workbench: WorkbenchDto = {
  well: { id: 'w1', name: 'Hand-1', uwi: null },
  depthUnit: 'ft',
  zones: [{ formationId: 'f1', name: 'A Sand', formation: 'A Sand', colour: '#d9b26f', top: 999.5, base: 1009.5, params }],
  cutoffs: stored,
  bindings: [],
  survey: null,
  conventions: [],
  latest: null,
};

describe('live evaluation in the browser', () => {
  const base = evaluateBase(samples, workbench, stored);

  it('evaluateBase computes the hand-worked porosity and saturation', () => {
    expect(base.result.curves.PHIE[0]).toBeCloseTo(0.2, 12); // (2.65 - 2.32) / 1.65
    expect(base.result.curves.SW[0]).toBeCloseTo(0.5, 12); // sqrt(0.05 / (0.04 * 5))
    expect(base.result.curves.SW[3]).toBeCloseTo(1, 12); // sqrt(0.05 / (0.04 * 1.25))
  });

  it('applyLiveCutoffs gives the hand-counted net reservoir 5 ft, net pay 3 ft, phi-h 0.6 ft', () => {
    const live = applyLiveCutoffs(base, stored);
    const z = live.summaries[0];
    expect(z.gross.thickness.md).toBeCloseTo(10, 12);
    expect(z.netReservoir.thickness.md).toBeCloseTo(5, 12); // five clean samples
    expect(z.netPay.thickness.md).toBeCloseTo(3, 12); // three of them with Sw 0.5 <= 0.6
    expect(z.netPay.phiH.md).toBeCloseTo(0.6, 12); // 3 ft x 0.2
    expect(Array.from(live.NET_PAY)).toEqual([1, 1, 1, 0, 0, 0, 0, 0, 0, 0]);
  });

  it('moving Sw max to 1 turns the two wet clean samples into pay, without recomputing curves', () => {
    const live = applyLiveCutoffs(base, { 'A Sand': { ...stored['A Sand'], swMax: 1 } });
    expect(live.summaries[0].netPay.thickness.md).toBeCloseTo(5, 12);
  });

  it('the live summary equals a full evaluateWell with the same cutoffs (what the server stores on Save)', () => {
    const tuned = { 'A Sand': { vshMax: 0.4, phiMin: 0.1, swMax: 0.55, permMin: null } };
    const full = evaluateWell({
      depth,
      depthUnit: 'ft',
      curves: { gr, rhob, rt },
      zones: [{ name: 'A Sand', formation: 'A Sand', top: 999.5, base: 1009.5, params }],
      cutoffs: toCutoffTable(tuned),
    });
    expect(compareSummaries(applyLiveCutoffs(base, tuned).summaries, full.zones)).toEqual([]);
  });

  it('compareSummaries names the zone and field that differ', () => {
    const a = applyLiveCutoffs(base, stored).summaries;
    const b = applyLiveCutoffs(base, { 'A Sand': { ...stored['A Sand'], swMax: 1 } }).summaries;
    const diff = compareSummaries(a, b);
    expect(diff.map((d) => `${d.zone}/${d.field}`)).toContain('A Sand/net pay');
    expect(diff.find((d) => d.field === 'net pay')).toMatchObject({ browser: 3, server: 5 });
  });

  it('sensitivityFor sweeps Sw max: net pay 3 ft from 0.5 up to below 1, 5 ft at 1', () => {
    const s = sensitivityFor(base, stored, 'A Sand')!;
    const at = (v: number) => s.swMax.netPay[Array.from(s.swMax.values).findIndex((x) => Math.abs(x - v) < 1e-9)];
    expect(at(0.45)).toBeCloseTo(0, 12);
    expect(at(0.5)).toBeCloseTo(3, 12);
    expect(at(0.975)).toBeCloseTo(3, 12);
    expect(at(1)).toBeCloseTo(5, 12);
  });
});
