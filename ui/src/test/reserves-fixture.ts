import { RESERVES_DISCLAIMER, evaluateReservesCase } from '@poreline/core';
import type { CaseInputs, CaseResults, ReservesCase } from '../types/reserves';

/** Inputs of an oil case (640 acres, Bo 1.2, RF 0.3) with an area and an Sw distribution. */
export function oilInputs(): CaseInputs {
  return {
    weighting: 'thickness',
    drainageAreas: {},
    wellOverrides: {},
    overrides: {},
    areaUnit: 'acre',
    lengthUnit: 'ft',
    area: 640,
    fluid: 'oil',
    bo: 1.2,
    gas: null,
    recoveryFactor: 0.3,
    standard: { pressurePsia: 14.696, temperatureF: 60 },
    distributions: { area: { kind: 'triangular', min: 480, mode: 640, max: 900 }, sw: { kind: 'uniform', min: 0.2, max: 0.32 } },
    trials: 5000,
    correlations: [],
    declineChecks: {},
  };
}

/** Results as the service stores them, computed here by core's evaluateReservesCase. */
export function resultsFor(inputs: CaseInputs, seed = 7): CaseResults {
  const r = evaluateReservesCase({
    fluid: 'oil',
    area: inputs.area!,
    areaUnit: inputs.areaUnit,
    netPay: 30,
    porosity: 0.2,
    sw: 0.25,
    recoveryFactor: inputs.recoveryFactor!,
    bo: inputs.bo!,
    distributions: inputs.distributions,
    correlations: inputs.correlations,
    monteCarlo: { trials: inputs.trials, seed },
    tornadoBase: 'base',
  });
  const p = r.probabilistic!;
  const out = (o: typeof p.inPlace) => ({
    ...o.field,
    fieldUnit: o.fieldUnit,
    m3: { p90: o.metric.p90, p50: o.metric.p50, p10: o.metric.p10, mean: o.metric.mean },
    histogram: { edges: Array.from(o.histogram.edges), counts: Array.from(o.histogram.counts) },
    exceedance: { value: Array.from(o.exceedance.value), exceedance: Array.from(o.exceedance.exceedance) },
    tornado: { baseOutput: o.tornado.baseOutput, method: o.tornado.method, rows: o.tornado.rows },
  });
  return {
    revision: 3,
    ranAt: '2026-12-02T10:00:00.000Z',
    fluid: 'oil',
    combined: combined(),
    deterministic: {
      values: { area: 640, netPay: 30, porosity: 0.2, sw: 0.25, bo: 1.2, recoveryFactor: 0.3 },
      areaAcres: r.deterministic.areaAcres,
      netPayFt: r.deterministic.netPayFt,
      fvf: r.deterministic.fvf,
      fvfUnit: 'rb/STB',
      pvt: null,
      inPlace: { field: r.deterministic.inPlace.field, fieldUnit: 'STB', m3: r.deterministic.inPlace.metric },
      recoverable: { field: r.deterministic.recoverable.field, fieldUnit: 'STB', m3: r.deterministic.recoverable.metric },
      formula: 'N [STB] = 7758.37 A h phi (1 - Sw) / Bo',
    },
    probabilistic: { trials: p.trials, seed: p.seed, distributions: p.inputs, inputSummaries: p.inputSummaries, correlations: p.correlations, lognormals: {}, inPlace: out(p.inPlace), recoverable: out(p.recoverable), elapsedMs: 12 },
    notes: r.notes,
    conventions: ['Standard conditions: 14.696 psia and 60 F.'],
  };
}

function combined() {
  return {
    weighting: 'thickness' as const,
    notes: { netPay: 'arithmetic mean', porosity: 'weighted by net pay h', sw: 'weighted by pore thickness phi*h' },
    wells: [
      { wellId: 'w1', wellName: 'RC-A', netPay: 20, porosity: 0.15, sw: 0.31, drainageArea: null, overridden: [], used: true },
      { wellId: 'w2', wellName: 'RC-B', netPay: 40, porosity: 0.225, sw: 0.23, drainageArea: null, overridden: [], used: true },
    ],
    computed: { netPay: 30, porosity: 0.2, sw: 0.25, totalDrainageArea: null, wellsUsed: 2, wellsSkipped: 0 },
    final: { netPay: 30, porosity: 0.2, sw: 0.25 },
    overridden: [],
  };
}

/** A whole case DTO (two wells, the first stale), optionally with results. */
export function reservesCase(over: Partial<ReservesCase> = {}, withResults = true): ReservesCase {
  const inputs = oilInputs();
  return {
    id: 'c1',
    assetId: 'a1',
    formationId: 'f1',
    formationName: 'Kestrel Sand',
    name: 'Kestrel base',
    status: 'draft',
    revision: 3,
    seed: 7,
    sources: [
      { wellId: 'w1', wellName: 'RC-A', interpretationId: 'i1', version: 1, approvedAt: null, formationName: 'Kestrel Sand', depthUnit: 'ft', netPay: 20, netPayFt: 20, porosity: 0.15, sw: 0.31, gross: 100, thicknessBasis: 'MD', latestApprovedVersion: 2, latestInterpretationId: 'i3', stale: true },
      { wellId: 'w2', wellName: 'RC-B', interpretationId: 'i2', version: 1, approvedAt: null, formationName: 'Kestrel Sand', depthUnit: 'ft', netPay: 40, netPayFt: 40, porosity: 0.225, sw: 0.23, gross: 100, thicknessBasis: 'MD', latestApprovedVersion: 1, latestInterpretationId: 'i2', stale: false },
    ],
    inputs,
    combined: combined(),
    combinedError: null,
    results: withResults ? resultsFor(inputs) : null,
    resultsCurrent: withResults,
    staleSources: 1,
    conventions: ['Standard conditions: 14.696 psia and 60 F (scf are stated at these).', 'P90 is the value exceeded with 90% probability.'],
    caution: RESERVES_DISCLAIMER,
    createdBy: { id: 'u1', name: 'Eli Engineer' },
    submittedBy: null,
    submittedAt: null,
    reviewedBy: null,
    reviewedAt: null,
    reviewComment: null,
    createdAt: '2026-12-02T09:00:00.000Z',
    updatedAt: '2026-12-02T10:00:00.000Z',
    ...over,
  };
}
