/**
 * Vertical geometry of the samples: TVD, north and east at every sample boundary, from a
 * deviation survey, so summaries can report thickness in TVD and TVT. Built once per well
 * and survey and reused while cutoffs change.
 */
import {
  type PathPositions,
  type SurveyPath,
  type SurveyStation,
  type SurveyTable,
  minimumCurvature,
  positionAtMd,
  positionsAtMd,
  surveyPathFromTable,
} from '../survey/minimum-curvature.js';
import { sampleBoundaries } from './sample-thickness.js';

/** A deviation survey: stations (MD, inclination, azimuth) or a computed MD/TVD(/N/E) table. */
export type SurveyInput = readonly SurveyStation[] | SurveyTable;

export interface SampleGeometry {
  /** Sample boundaries b(0..n), measured depth. */
  boundaries: Float64Array;
  /** Positions at each boundary (length n + 1). */
  at: PathPositions;
  /** False when the survey gives no north/east (TVT then equals TVD thickness). */
  hasHorizontal: boolean;
  path: SurveyPath;
}

/**
 * The survey as a path: stations by minimum curvature (tie-in: TVD = MD of the first
 * station, north = east = 0), a table interpolated linearly.
 * Throws RangeError naming the station/row and field on bad survey data.
 */
export function surveyPath(survey: SurveyInput): SurveyPath {
  return Array.isArray(survey) ? minimumCurvature(survey as readonly SurveyStation[]) : surveyPathFromTable(survey as SurveyTable);
}

/** Positions at every sample boundary. Throws on a bad depth index or survey. */
export function sampleGeometry(depth: Float64Array | readonly number[], survey: SurveyInput): SampleGeometry {
  const path = surveyPath(survey);
  const boundaries = sampleBoundaries(depth);
  return { boundaries, at: positionsAtMd(path, boundaries), hasHorizontal: path.hasHorizontal, path };
}

/** Position at any measured depth on the geometry's path (zone tops and bases). */
export function geometryPositionAt(g: SampleGeometry, md: number): { tvd: number; north: number; east: number } {
  return positionAtMd(g.path, md);
}
