import {
  arpsRw,
  formationTemperature,
  minimumCurvature,
  positionAtMd,
  type ResolvedZoneParameters,
  type TemperatureModel,
  type TemperatureUnit,
} from '@poreline/core';
import type { WorkbenchDto, WorkbenchZone } from '../../../types/workbench';

/** TVD at a measured depth on the survey path (minimum curvature, as the evaluation uses), else MD. */
export function tvdAt(md: number, survey: WorkbenchDto['survey']): number {
  if (!survey || !survey.stations.length) return md;
  return positionAtMd(minimumCurvature(survey.stations), md).tvd;
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
