import {
  applyCutoffs,
  cutoffSensitivity,
  evaluateWell,
  summariseZones,
  type CutoffSensitivity,
  type CutoffTable,
  type EvaluateWellResult,
  type EvaluationZone,
  type SurveyInput,
  type ZoneParameters,
  type ZoneSummary,
} from '@poreline/core';
import type { Cutoffs, WorkbenchDto } from '../../../types/workbench';
import type { MergedSamples } from '../api/get-merged-samples';

/**
 * The browser side of the evaluation: the same core code the server runs on "Save".
 * - `evaluateBase` runs evaluateWell once per (samples, zones, parameters, survey): the
 *   per-sample curves (VSH, PHIT, PHIE, SW, BVW, PERM), the QC mask and the sample geometry;
 * - `applyLiveCutoffs` re-runs only the cheap parts (applyCutoffs and summariseZones, reusing
 *   the geometry) on every cutoff change, so sliders never refetch nor recompute curves;
 * - `sensitivityFor` sweeps each cutoff of one formation (cutoffSensitivity).
 */

export interface BaseEvaluation {
  result: EvaluateWellResult;
  zones: EvaluationZone[];
  depth: Float64Array;
}

export interface LiveResult {
  NET_RES: Float64Array;
  NET_PAY: Float64Array;
  summaries: ZoneSummary[];
}

/** Cutoffs in the shape core reads (permMin null = not used). */
export function toCutoffTable(cutoffs: Readonly<Record<string, Cutoffs>>): CutoffTable {
  const out: Record<string, { vshMax: number; phiMin: number; swMax: number; permMin: number | null }> = {};
  for (const [name, c] of Object.entries(cutoffs)) out[name] = { vshMax: c.vshMax, phiMin: c.phiMin, swMax: c.swMax, permMin: c.permMin ?? null };
  return out;
}

/** The workbench's zones as evaluation zones (zone name = formation name). */
export function evaluationZones(workbench: Pick<WorkbenchDto, 'zones'>): EvaluationZone[] {
  return workbench.zones.map((z) => ({
    name: z.name,
    formation: z.formation ?? z.name,
    top: z.top,
    base: z.base,
    params: z.params as unknown as ZoneParameters,
  }));
}

/** The survey exactly as the server passes it to evaluateWell: its stations (md, inc, azi). */
function surveyInput(survey: WorkbenchDto['survey']): SurveyInput | undefined {
  return survey && survey.stations.length ? survey.stations : undefined;
}

const key = (k: string) => k.toUpperCase();

/**
 * evaluateWell on the held samples. Throws core's EvaluationInputError (naming zone and field)
 * when the inputs are not evaluable yet (no zones, a missing curve, bad parameters).
 */
export function evaluateBase(samples: MergedSamples, workbench: WorkbenchDto, cutoffs: Readonly<Record<string, Cutoffs>>): BaseEvaluation {
  const curve = (k: string) => samples.curves[key(k)]?.values;
  const zones = evaluationZones(workbench);
  const unit = (workbench.depthUnit ?? samples.depthUnit) === 'm' ? 'm' : 'ft';
  const result = evaluateWell({
    depth: samples.depth,
    depthUnit: unit,
    curves: { gr: curve('gr'), rhob: curve('rhob'), nphi: curve('nphi'), dt: curve('dt'), rt: curve('rt'), sp: curve('sp') },
    zones,
    cutoffs: toCutoffTable(cutoffs),
    survey: surveyInput(workbench.survey),
  });
  return { result, zones, depth: samples.depth };
}

/** Flags and zone summaries for a set of cutoffs, on curves already computed. */
export function applyLiveCutoffs(base: BaseEvaluation, cutoffs: Readonly<Record<string, Cutoffs>>): LiveResult {
  const { result, zones, depth } = base;
  const table = toCutoffTable(cutoffs);
  const curves = { VSH: result.curves.VSH, PHIE: result.curves.PHIE, SW: result.curves.SW, PERM: result.curves.PERM ?? undefined };
  const flags = applyCutoffs({ depth, curves, zones, cutoffs: table });
  const summaries = summariseZones({ depth, curves, qc: result.qc, zones, cutoffs: table, geometry: result.geometry ?? undefined });
  return { NET_RES: flags.NET_RES, NET_PAY: flags.NET_PAY, summaries };
}

export type SweptCutoff = 'vshMax' | 'phiMin' | 'swMax';

/** Sweep grid of each cutoff, v/v (inclusive ends). */
export const SWEEPS: Record<SweptCutoff, number[]> = {
  vshMax: range(0, 1, 0.025),
  phiMin: range(0, 0.3, 0.0075),
  swMax: range(0, 1, 0.025),
};

function range(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  const n = Math.round((to - from) / step);
  for (let k = 0; k <= n; k++) out.push(Math.round((from + k * step) * 1e6) / 1e6);
  return out;
}

/** Net pay, phi-h (and storage lost for phiMin) against each cutoff of one formation's zones. */
export function sensitivityFor(
  base: BaseEvaluation,
  cutoffs: Readonly<Record<string, Cutoffs>>,
  formation: string,
): Record<SweptCutoff, CutoffSensitivity> | null {
  const chosen = base.zones.filter((z) => (z.formation ?? z.name) === formation).map((z) => z.name);
  if (!chosen.length) return null;
  const { result, zones, depth } = base;
  const input = {
    depth,
    curves: { VSH: result.curves.VSH, PHIE: result.curves.PHIE, SW: result.curves.SW, PERM: result.curves.PERM ?? undefined },
    zones,
    cutoffs: toCutoffTable(cutoffs),
  };
  return {
    vshMax: cutoffSensitivity(input, 'vshMax', SWEEPS.vshMax, { zones: chosen }),
    phiMin: cutoffSensitivity(input, 'phiMin', SWEEPS.phiMin, { zones: chosen }),
    swMax: cutoffSensitivity(input, 'swMax', SWEEPS.swMax, { zones: chosen }),
  };
}

/** The fields compared between the browser's summary and the server's stored one. */
export const COMPARED_FIELDS = [
  ['gross', (s: ZoneSummary) => s.gross.thickness.md],
  ['net reservoir', (s: ZoneSummary) => s.netReservoir.thickness.md],
  ['net pay', (s: ZoneSummary) => s.netPay.thickness.md],
  ['porosity', (s: ZoneSummary) => s.netPay.meanPhi],
  ['Sw', (s: ZoneSummary) => s.netPay.meanSw],
  ['phi-h', (s: ZoneSummary) => s.netPay.phiH.md],
] as const;

export interface SummaryMismatch {
  zone: string;
  field: string;
  browser: number | null;
  server: number | null;
}

/**
 * Where the server's stored summaries differ from the browser's (relative 1e-9, absolute 1e-12),
 * matched by zone name; a zone present on one side only is a mismatch too.
 */
export function compareSummaries(browser: readonly ZoneSummary[], server: readonly ZoneSummary[]): SummaryMismatch[] {
  const out: SummaryMismatch[] = [];
  const byName = new Map(server.map((s) => [s.zone, s]));
  for (const b of browser) {
    const s = byName.get(b.zone);
    if (!s) {
      out.push({ zone: b.zone, field: 'zone', browser: null, server: null });
      continue;
    }
    for (const [field, get] of COMPARED_FIELDS) {
      let bv: number | null;
      let sv: number | null;
      try {
        bv = get(b);
        sv = get(s);
      } catch {
        out.push({ zone: b.zone, field, browser: null, server: null });
        continue;
      }
      const same = bv === sv || (bv !== null && sv !== null && Math.abs(bv - sv) <= 1e-12 + 1e-9 * Math.max(Math.abs(bv), Math.abs(sv)));
      if (!same) out.push({ zone: b.zone, field, browser: bv, server: sv });
    }
  }
  for (const s of server) if (!browser.some((b) => b.zone === s.zone)) out.push({ zone: s.zone, field: 'zone', browser: null, server: null });
  return out;
}
