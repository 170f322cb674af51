import type { AppConfig } from '../config/app-config.js';

/** Largest deviation survey CSV accepted, bytes: a survey is a short table of stations, so a fixed 5 MB is ample. */
export const SURVEY_UPLOAD_MAX_BYTES = 5 * 1024 * 1024;

/** The upload limit that applied to a request, for a 413 message the user can act on. */
export interface UploadLimit {
  bytes: number;
  /** What the limit is about, and what to do. */
  advice: string;
}

/**
 * The limit of the route a request went to: deviation surveys have their own fixed limit; LAS
 * files and production series use UPLOAD_MAX_MB.
 */
export function uploadLimitFor(path: string, config: Pick<AppConfig, 'uploadMaxBytes'>): UploadLimit {
  const route = path.split('?')[0].replace(/\/+$/, '');
  if (/\/wells\/[^/]+\/survey$/.test(route)) {
    return { bytes: SURVEY_UPLOAD_MAX_BYTES, advice: 'A deviation survey is a table of stations (MD, inclination, azimuth); check that this is the survey file.' };
  }
  return { bytes: config.uploadMaxBytes, advice: 'Split the file or ask an admin to raise UPLOAD_MAX_MB.' };
}
