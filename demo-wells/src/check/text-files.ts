/**
 * Readers of the demo field's CSV files (tops and deviation survey), as written by the
 * generator: a header line, comma-separated fields, no quoted commas in these two files.
 */

export interface TopRow {
  well: string;
  formation: string;
  topMd: number;
  depthUnit: 'ft' | 'm';
}

function rows(text: string, fn: string, header: string): string[][] {
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== '');
  if (lines[0] !== header) throw new RangeError(`${fn}: the header must be '${header}'`);
  return lines.slice(1).map((l) => l.split(','));
}

function num(fn: string, field: string, s: string, line: number): number {
  const x = Number(s);
  if (s.trim() === '' || !Number.isFinite(x)) throw new RangeError(`${fn}: ${field} on line ${line} is not a number`);
  return x;
}

/** Parses tops.csv. Throws RangeError('parseTopsCsv: ...') on a bad header, number or unit. */
export function parseTopsCsv(text: string): TopRow[] {
  const fn = 'parseTopsCsv';
  return rows(text, fn, 'well,formation,top_md,depth_unit').map((r, i) => {
    if (r[3] !== 'ft' && r[3] !== 'm') throw new RangeError(`${fn}: depth_unit on line ${i + 2} must be ft or m`);
    return { well: r[0], formation: r[1], topMd: num(fn, 'top_md', r[2], i + 2), depthUnit: r[3] };
  });
}

export interface SurveyRow {
  md: number;
  inc: number;
  azi: number;
}

/** Parses a survey CSV (md_ft, inclination_deg, azimuth_deg) into core's SurveyStation shape. */
export function parseSurveyCsv(text: string): SurveyRow[] {
  const fn = 'parseSurveyCsv';
  return rows(text, fn, 'md_ft,inclination_deg,azimuth_deg').map((r, i) => ({
    md: num(fn, 'md_ft', r[0], i + 2),
    inc: num(fn, 'inclination_deg', r[1], i + 2),
    azi: num(fn, 'azimuth_deg', r[2], i + 2),
  }));
}
