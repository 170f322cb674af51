import Papa from 'papaparse';
import type { DepthUnit } from '../common/well-depth.js';

export interface ParsedStation {
  md: number;
  inclination: number;
  azimuth: number;
}

export interface ParsedSurvey {
  stations: ParsedStation[];
  /** The depth unit written in the md header ("md (ft)", "md [m]"), or null when none is written. */
  headerUnit: DepthUnit | null;
}

/** A survey file problem with the 1-based line it points at (null: the file as a whole). */
export class SurveyCsvError extends Error {
  constructor(
    message: string,
    readonly line: number | null,
  ) {
    super(line === null ? message : `line ${line}: ${message}`);
    this.name = 'SurveyCsvError';
  }
}

const UNIT_SUFFIX = /_(ft|feet|m|metres|meters|deg|degrees)$/;

const COLUMNS = {
  md: ['md', 'measured depth', 'measured_depth', 'depth'],
  inclination: ['inclination', 'inc', 'incl'],
  azimuth: ['azimuth', 'azi', 'az', 'azim'],
} as const;

/**
 * Reads a deviation survey CSV: a header naming md, inclination and azimuth (any order,
 * other columns ignored; a unit may follow in brackets, "md (ft)", or as a suffix, "md_ft",
 * "inclination_deg"), then one station a line.
 * Angles in degrees: inclination in [0, 180], azimuth in [0, 360]. MD strictly increasing,
 * at least two stations. Comma, semicolon or tab separated. Blank lines are skipped.
 *
 * @throws SurveyCsvError naming the line and the field
 * @example parseSurveyCsv('md,inclination,azimuth\n0,0,0\n1000,10,45\n').stations[1] // { md: 1000, inclination: 10, azimuth: 45 }
 */
export function parseSurveyCsv(text: string): ParsedSurvey {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false, delimitersToGuess: [',', ';', '\t'] });
  const rows = parsed.data;
  const headerIndex = rows.findIndex((r) => r.some((c) => c.trim() !== ''));
  if (headerIndex < 0) throw new SurveyCsvError('the file is empty: expected a header md,inclination,azimuth and one station a line', null);
  const header = rows[headerIndex].map((c) => c.trim().toLowerCase());
  // A unit may follow a name in brackets ("md (ft)") or as a suffix ("md_ft", "inclination_deg").
  const unitOf = (h: string) => /[([]\s*([^)\]]+?)\s*[)\]]\s*$/.exec(h)?.[1] ?? UNIT_SUFFIX.exec(h)?.[1];
  const bare = header.map((h) => h.replace(/\s*[([].*[)\]]\s*$/, '').replace(UNIT_SUFFIX, ''));
  const col = (name: keyof typeof COLUMNS) => bare.findIndex((h) => (COLUMNS[name] as readonly string[]).includes(h));
  const idx = { md: col('md'), inclination: col('inclination'), azimuth: col('azimuth') };
  for (const [name, i] of Object.entries(idx)) {
    if (i < 0) throw new SurveyCsvError(`the header must name an ${name} column (found: ${rows[headerIndex].join(', ')})`, headerIndex + 1);
  }
  const unitText = unitOf(header[idx.md]);
  const headerUnit = unitText === undefined ? null : unitText === 'ft' || unitText === 'feet' || unitText === 'f' ? 'ft' : unitText === 'm' || unitText === 'metres' || unitText === 'meters' ? 'm' : undefined;
  if (headerUnit === undefined) throw new SurveyCsvError(`md unit "${unitText}" must be ft or m`, headerIndex + 1);

  const stations: ParsedStation[] = [];
  for (let r = headerIndex + 1; r < rows.length; r++) {
    const row = rows[r];
    if (row.every((c) => c.trim() === '')) continue;
    const line = r + 1;
    const num = (field: keyof typeof idx) => {
      const raw = (row[idx[field]] ?? '').trim();
      const v = raw === '' ? NaN : Number(raw);
      if (!Number.isFinite(v)) throw new SurveyCsvError(`${field} must be a number, got "${raw}"`, line);
      return v;
    };
    const station = { md: num('md'), inclination: num('inclination'), azimuth: num('azimuth') };
    if (station.inclination < 0 || station.inclination > 180) throw new SurveyCsvError(`inclination must be between 0 and 180 degrees, got ${station.inclination}`, line);
    if (station.azimuth < 0 || station.azimuth > 360) throw new SurveyCsvError(`azimuth must be between 0 and 360 degrees, got ${station.azimuth}`, line);
    const prev = stations[stations.length - 1];
    if (prev && !(station.md > prev.md)) throw new SurveyCsvError(`md (${station.md}) must be greater than the previous station's (${prev.md})`, line);
    stations.push(station);
  }
  if (stations.length < 2) throw new SurveyCsvError(`the survey needs at least 2 stations, found ${stations.length}`, null);
  return { stations, headerUnit };
}
