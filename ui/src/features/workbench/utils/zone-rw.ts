import { arpsRw, formationTemperature, type ResolvedZoneParameters, type TemperatureModel, type TemperatureUnit } from '@poreline/core';
import type { WorkbenchDto, WorkbenchZone } from '../../../types/workbench';

/** TVD at a measured depth from the survey table (linear between stations, as core reads a TVD table), else MD. */
export function tvdAt(md: number, survey: WorkbenchDto['survey']): number {
  if (!survey || survey.md.length < 2) return md;
  const { md: m, tvd: t } = survey;
  if (md <= m[0]) return t[0] + (md - m[0]);
  for (let i = 1; i < m.length; i++) {
    if (md <= m[i]) return t[i - 1] + ((md - m[i - 1]) / (m[i] - m[i - 1])) * (t[i] - t[i - 1]);
  }
  return t[t.length - 1] + (md - m[m.length - 1]);
}

/**
 * Rw of a zone at its mid-depth formation temperature (ohm.m), for the Pickett plot's iso-Sw
 * lines: the Rw the evaluation resolved at its reference temperature, carried to the zone's
 * temperature with core's Arps correction. Null when the zone's parameters lack a temperature model.
 */
export function zoneRw(zone: WorkbenchZone, resolved: ResolvedZoneParameters, survey: WorkbenchDto['survey']): number | null {
  const p = zone.params as { temperature?: TemperatureModel; temperatureUnit?: TemperatureUnit };
  if (!p.temperature || !p.temperatureUnit) return null;
  try {
    const t = formationTemperature(p.temperature, tvdAt((zone.top + zone.base) / 2, survey));
    return arpsRw(resolved.rwReference, resolved.rwReferenceTemperature, t, p.temperatureUnit);
  } catch {
    return null;
  }
}
