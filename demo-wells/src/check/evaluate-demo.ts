/**
 * Evaluates one demo well with core's evaluateWell, the model's zone parameters and cutoffs:
 * the core-level path of the truth test (the service does the same through its upload API).
 */
import { evaluateWell } from '@poreline/core';
import type { EvaluateWellResult, LasFile } from '@poreline/core';
import { MODEL_CUTOFFS } from '../model/parameters.js';
import { type CanonicalLog, canonicalLog, spliceRuns } from './well-curves.js';
import { type DemoZone, fluidZones, formationZones, zoneParametersFor } from './zones.js';
import { parseSurveyCsv, parseTopsCsv } from './text-files.js';

export interface DemoWellFiles {
  wellName: string;
  /** The well's LAS files, parsed; two runs are spliced in the middle of their overlap. */
  las: readonly LasFile[];
  /** Text of tops.csv. */
  topsCsv: string;
  /** Text of the well's survey CSV, when it has one. */
  surveyCsv?: string;
}

/** The well's log, its runs spliced (shallower run first). */
export function demoWellLog(files: DemoWellFiles): CanonicalLog {
  const logs = files.las.map(canonicalLog).sort((a, b) => a.depth[0] - b.depth[0]);
  if (logs.length === 0) throw new RangeError(`demoWellLog: no LAS file for well '${files.wellName}'`);
  return logs.slice(1).reduce((acc, l) => spliceRuns(acc, l), logs[0]);
}

/**
 * Evaluates a demo well over its formation zones (from tops.csv) or over the model's fluid
 * zones, with the model's zone parameters and cutoffs, and the survey when given.
 */
export function evaluateDemoWell(files: DemoWellFiles, zoning: 'formations' | 'fluids' = 'formations'): EvaluateWellResult & { log: CanonicalLog; zonesUsed: DemoZone[] } {
  const log = demoWellLog(files);
  const params = zoneParametersFor(files.wellName);
  const zones =
    zoning === 'formations'
      ? formationZones(files.wellName, parseTopsCsv(files.topsCsv), log.depth[log.depth.length - 1])
      : fluidZones(files.wellName);
  const result = evaluateWell({
    depth: log.depth,
    depthUnit: log.depthUnit,
    curves: log.curves,
    zones: zones.map((z) => ({ ...z, params: params[z.formation] })),
    cutoffs: MODEL_CUTOFFS,
    survey: files.surveyCsv ? parseSurveyCsv(files.surveyCsv) : undefined,
  });
  return { ...result, log, zonesUsed: zones };
}
