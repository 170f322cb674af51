/**
 * The zones the "model vs evaluated" check evaluates in one demo well: the formation zones of
 * the model's tops (each top to the next, the deepest to the base of the merged log) and the
 * model's fluid zones (a formation cut at the contacts of one accumulation), with the model's
 * zone parameters, clipped to the logged interval exactly as the workbench clips its zones.
 */
import type { ZoneParameters } from '@poreline/core';
import { fluidZones, type ModelZoneParameters, type TopRow } from '@poreline/demo-wells';
import { convertDepth, type DepthUnit } from '../common/well-depth.js';
import { evaluationZones, type EvaluationZoneSpec, type ZoneWithParams } from '../workbench/evaluation-zones.js';

export interface DemoCheckZones {
  formationZones: EvaluationZoneSpec<ZoneParameters>[];
  fluidZones: EvaluationZoneSpec<ZoneParameters>[];
  /** Why a zone is clipped or left out (from evaluationZones). */
  notes: string[];
}

/**
 * @param wellName demo well name ('WM-7')
 * @param tops the demo tops (demoTops()); the well's rows are used, in their own depth unit
 * @param depthUnit the well's depth unit in the asset (its first log run's)
 * @param logged first and last depth of the merged index, in depthUnit
 * @param params the model's zone parameters by formation name (zoneParametersFor)
 * @param formationIds the asset's formation ids by name (for the snapshot; '' when absent)
 * @throws RangeError('demoCheckZones: ...') when the model has no tops for the well
 * @example demoCheckZones('WM-1', demoTops(), 'ft', { first: 4800, last: 5600 }, zoneParametersFor('WM-1'), {}).formationZones[0].name // 'Greyling Shale'
 */
export function demoCheckZones(
  wellName: string,
  tops: readonly TopRow[],
  depthUnit: DepthUnit,
  logged: { first: number; last: number },
  params: Record<string, ModelZoneParameters>,
  formationIds: Record<string, string>,
): DemoCheckZones {
  const own = tops.filter((t) => t.well === wellName).sort((a, b) => a.topMd - b.topMd);
  if (!own.length) throw new RangeError(`demoCheckZones: the model has no tops for well '${wellName}'`);
  const modelUnit = own[0].depthUnit;
  const d = (v: number) => convertDepth(v, modelUnit, depthUnit);
  const zone = (name: string, formation: string, top: number, base: number | null): ZoneWithParams<ZoneParameters> & { formation: string } => ({
    formationId: formationIds[formation] ?? '',
    name,
    formation,
    colour: '',
    top,
    base,
    params: params[formation] as unknown as ZoneParameters,
    isDefault: false,
  });
  const formations = own.map((t, i) => zone(t.formation, t.formation, d(t.topMd), i + 1 < own.length ? d(own[i + 1].topMd) : logged.last));
  const fluids = fluidZones(wellName).map((z) => zone(z.name, z.formation, d(z.top), d(z.base)));
  const f = evaluationZones(formations, logged);
  const g = evaluationZones(fluids, logged);
  // evaluationZones names the formation after the zone; a fluid zone keeps its formation.
  const withFormation = (zs: EvaluationZoneSpec<ZoneParameters>[], from: typeof fluids) =>
    zs.map((z) => ({ ...z, formation: from.find((k) => k.name === z.name)!.formation }));
  return { formationZones: f.zones, fluidZones: withFormation(g.zones, fluids), notes: [...f.notes, ...g.notes] };
}
