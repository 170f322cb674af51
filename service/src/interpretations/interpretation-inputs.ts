import type { CutoffSet, SurveyStation, ZoneParameters } from '@poreline/core';
import type { BindingKey } from '../bindings/binding-keys.js';
import type { DepthUnit } from '../common/well-depth.js';
import type { WorkingState } from '../workbench/workbench.service.js';

/**
 * The snapshot stored with each interpretation version: everything evaluateWell ran on (zones
 * with parameters, cutoffs, survey, and the bindings that select the merged curves) plus the
 * provenance an export needs (tops, log-run sha256s, merged index, app version).
 */
export interface InterpretationInputs {
  depthUnit: DepthUnit;
  zones: { formationId: string; name: string; formation: string; top: number; base: number; params: ZoneParameters; isDefault: boolean }[];
  /** Cutoffs per formation name, for the formations of the zones. */
  cutoffs: Record<string, CutoffSet & { permMin: number | null }>;
  /** Stations in depthUnit (core's SurveyStation), or null without a survey. */
  survey: { stations: SurveyStation[] } | null;
  bindings: { binding: BindingKey; logRunId: string; fileName: string; mnemonic: string; unit: string }[];
  tops: { formationId: string; formation: string; md: number }[];
  logRuns: { id: string; fileName: string; sha256: string }[];
  merged: { start: number; stop: number; step: number; samples: number };
  notes: string[];
  appVersion: string;
}

/** The snapshot of a working state that has merged samples (see WorkbenchService.state). */
export function snapshotOf(state: WorkingState & { merged: NonNullable<WorkingState['merged']>; depthUnit: DepthUnit }, appVersion: string): InterpretationInputs {
  const m = state.merged;
  const zones = state.evaluationZones.map((z) => ({ formationId: z.formationId, name: z.name, formation: z.formation, top: z.top, base: z.base, params: z.params, isDefault: z.isDefault }));
  return {
    depthUnit: state.depthUnit,
    zones,
    cutoffs: Object.fromEntries(zones.map((z) => [z.formation, state.cutoffs[z.formation]])),
    survey: state.survey ? { stations: state.survey.stations } : null,
    bindings: m.entries.map((e) => ({ binding: e.binding, logRunId: e.source.logRunId, fileName: e.source.fileName, mnemonic: e.source.mnemonic, unit: e.source.unit })),
    tops: state.zones.map((z) => ({ formationId: z.formationId, formation: z.name, md: z.top })),
    logRuns: m.runs,
    merged: { start: m.depth[0], stop: m.depth[m.depth.length - 1], step: m.step, samples: m.depth.length },
    notes: state.notes,
    appVersion,
  };
}
