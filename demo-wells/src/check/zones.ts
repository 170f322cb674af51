/**
 * Zones of a demo well for an evaluation: formation zones from tops (each top to the next,
 * the last to the base of the logs), and the model's fluid zones (a formation cut at the
 * contacts of one accumulation), with the model's zone parameters.
 */
import { modelTruth } from '../model/field.js';
import type { ModelZoneParameters } from '../model/parameters.js';
import type { TopRow } from './text-files.js';

export interface DemoZone {
  name: string;
  formation: string;
  /** Depths in the well's depth unit. */
  top: number;
  base: number;
}

function wellTruth(wellName: string) {
  const w = modelTruth().wells.find((k) => k.name === wellName);
  if (!w) throw new RangeError(`demo-wells: unknown well '${wellName}'`);
  return w;
}

/**
 * Formation zones of `wellName` from its tops: each top to the next deeper top, the deepest
 * to `logBase` (the last logged depth). Depths in the tops' unit.
 * Throws RangeError('formationZones: ...') when the well has no tops.
 */
export function formationZones(wellName: string, tops: readonly TopRow[], logBase: number): DemoZone[] {
  const own = tops.filter((t) => t.well === wellName).sort((a, b) => a.topMd - b.topMd);
  if (own.length === 0) throw new RangeError(`formationZones: no tops for well '${wellName}'`);
  return own.map((t, i) => ({ name: t.formation, formation: t.formation, top: t.topMd, base: i + 1 < own.length ? own[i + 1].topMd : logBase }));
}

/** The model's fluid zones of a well ("Wren Sand oil", ...), depths in the well's unit. */
export function fluidZones(wellName: string): DemoZone[] {
  return wellTruth(wellName).fluidZones.map((z) => ({ name: z.zone, formation: z.formation, top: z.top, base: z.base }));
}

/** The model's zone parameters of a well, by formation name. */
export function zoneParametersFor(wellName: string): Record<string, ModelZoneParameters> {
  return Object.fromEntries(wellTruth(wellName).zoneParameters.map((z) => [z.formation, z.params]));
}
