import Papa from 'papaparse';

/**
 * Reading a production CSV: a header row names the columns (case-insensitive; a unit in
 * brackets or parentheses after the name is ignored), then one point per line. Blank lines and
 * lines starting with # are skipped. Every problem is reported with its line number; a file
 * with any problem is refused whole.
 */

export interface CsvProblem {
  line: number | null;
  message: string;
}

export type PressurePoint = { cumGas: number; pressure: number };
export type RatePoint = { t: number; rate: number; date?: string };

const PRESSURE_COLUMNS = { cumGas: ['cum_gas', 'cumgas', 'gp', 'cumulative_gas', 'cumulative gas', 'cum gas', 'cumulative'], pressure: ['pressure', 'p', 'static_pressure', 'static pressure', 'pr'] };
const RATE_COLUMNS = { t: ['t', 'time', 'days', 'day', 'months', 'month', 'years', 'year'], date: ['date'], rate: ['rate', 'q', 'qg', 'qo'] };

/** A unit written as a suffix of a column name: "cum_gas_mmscf", "static_pressure_psia", "oil_stb". */
const UNIT_SUFFIX = /_(mmscf|bscf|mscf|scf|psia|psig|psi|kpa|mpa|bar|stb|bbl|m3|sm3)$/;

function clean(name: string): string {
  return name
    .replace(/^\uFEFF/, '')
    .replace(/[([].*?[)\]]/g, '')
    .trim()
    .toLowerCase()
    .replace(UNIT_SUFFIX, '');
}

interface Rows {
  header: string[];
  headerLine: number;
  rows: { line: number; cells: string[] }[];
}

function readRows(text: string, problems: CsvProblem[]): Rows | null {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false, delimiter: '' });
  for (const e of parsed.errors) if (e.type !== 'Delimiter') problems.push({ line: typeof e.row === 'number' ? e.row + 1 : null, message: e.message });
  let header: string[] | null = null;
  let headerLine = 0;
  const rows: Rows['rows'] = [];
  parsed.data.forEach((cells, i) => {
    const line = i + 1;
    if (cells.every((c) => c.trim() === '') || cells[0]?.trim().startsWith('#')) return;
    if (!header) {
      header = cells.map(clean);
      headerLine = line;
      return;
    }
    rows.push({ line, cells });
  });
  if (!header) {
    problems.push({ line: null, message: 'the file is empty: expected a header row and data lines' });
    return null;
  }
  return { header, headerLine, rows };
}

function column(header: string[], names: string[]): number {
  return header.findIndex((h) => names.includes(h));
}

function numberAt(cells: string[], index: number, line: number, name: string, problems: CsvProblem[]): number {
  const raw = (cells[index] ?? '').trim();
  const value = raw === '' ? NaN : Number(raw.replace(/,(?=\d{3}\b)/g, ''));
  if (!Number.isFinite(value)) problems.push({ line, message: `${name} must be a number (got "${raw}")` });
  return value;
}

/** Static pressure against cumulative gas. */
export function parsePressureCsv(text: string): { points: PressurePoint[]; problems: CsvProblem[] } {
  const problems: CsvProblem[] = [];
  const rows = readRows(text, problems);
  if (!rows) return { points: [], problems };
  const gi = column(rows.header, PRESSURE_COLUMNS.cumGas);
  const pi = column(rows.header, PRESSURE_COLUMNS.pressure);
  if (gi < 0) problems.push({ line: rows.headerLine, message: `no cumulative gas column: name one "cum_gas" or "gp" (found: ${rows.header.join(', ')})` });
  if (pi < 0) problems.push({ line: rows.headerLine, message: `no pressure column: name one "pressure" or "p" (found: ${rows.header.join(', ')})` });
  if (gi < 0 || pi < 0) return { points: [], problems };
  const points: PressurePoint[] = [];
  for (const { line, cells } of rows.rows) {
    const cumGas = numberAt(cells, gi, line, 'cumulative gas', problems);
    const pressure = numberAt(cells, pi, line, 'pressure', problems);
    if (Number.isFinite(cumGas) && cumGas < 0) problems.push({ line, message: `cumulative gas must be >= 0 (got ${cumGas})` });
    if (Number.isFinite(pressure) && !(pressure > 0)) problems.push({ line, message: `pressure must be > 0 (an absolute pressure; got ${pressure})` });
    const prev = points[points.length - 1];
    if (prev && Number.isFinite(cumGas) && cumGas < prev.cumGas) problems.push({ line, message: `cumulative gas must not decrease (${cumGas} after ${prev.cumGas})` });
    points.push({ cumGas, pressure });
  }
  if (rows.rows.length < 2) problems.push({ line: null, message: `at least 2 data lines are needed (found ${rows.rows.length})` });
  return { points, problems };
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/**
 * Rate against time (numeric time, or ISO dates turned into days since the first date), or
 * monthly volumes: a `days_on` column and a volume column named for the fluid (`oil`, `gas`,
 * with or without a unit suffix such as `oil_stb`, `gas_mscf`). Monthly volumes become a rate
 * per producing day, rate = volume / days_on, at t = producing days before the month plus half
 * the month's (common practice); months with no producing days are skipped.
 */
export function parseRateCsv(text: string, fluid?: 'oil' | 'gas'): { points: RatePoint[]; problems: CsvProblem[]; dated: boolean } {
  const problems: CsvProblem[] = [];
  const rows = readRows(text, problems);
  if (!rows) return { points: [], problems, dated: false };
  const daysOn = column(rows.header, ['days_on', 'days on', 'producing_days', 'producing days']);
  if (daysOn >= 0 && column(rows.header, RATE_COLUMNS.rate) < 0) return { ...monthlyVolumes(rows, daysOn, fluid, problems), dated: false };
  const ti = column(rows.header, RATE_COLUMNS.t);
  const di = column(rows.header, RATE_COLUMNS.date);
  const qi = column(rows.header, RATE_COLUMNS.rate);
  if (ti < 0 && di < 0) problems.push({ line: rows.headerLine, message: `no time column: name one "t" (numeric) or "date" (yyyy-mm-dd) (found: ${rows.header.join(', ')})` });
  if (qi < 0) problems.push({ line: rows.headerLine, message: `no rate column: name one "rate" or "q" (found: ${rows.header.join(', ')})` });
  if ((ti < 0 && di < 0) || qi < 0) return { points: [], problems, dated: false };
  const dated = ti < 0;
  const points: RatePoint[] = [];
  let first: number | null = null;
  for (const { line, cells } of rows.rows) {
    let t: number;
    let date: string | undefined;
    if (dated) {
      date = (cells[di] ?? '').trim();
      const ms = ISO_DATE.test(date) ? Date.parse(`${date}T00:00:00Z`) : NaN;
      if (!Number.isFinite(ms)) {
        problems.push({ line, message: `date must be yyyy-mm-dd (got "${date}")` });
        t = NaN;
      } else {
        first ??= ms;
        t = (ms - first) / 86_400_000;
      }
    } else t = numberAt(cells, ti, line, 'time', problems);
    const rate = numberAt(cells, qi, line, 'rate', problems);
    if (Number.isFinite(t) && t < 0) problems.push({ line, message: `time must be >= 0 (got ${t})` });
    if (Number.isFinite(rate) && rate < 0) problems.push({ line, message: `rate must be >= 0 (got ${rate})` });
    const prev = points[points.length - 1];
    if (prev && Number.isFinite(t) && Number.isFinite(prev.t) && !(t > prev.t)) problems.push({ line, message: `time must increase (${dated ? date : t} after ${dated ? prev.date : prev.t})` });
    points.push(dated ? { t, rate, date } : { t, rate });
  }
  if (rows.rows.length < 2) problems.push({ line: null, message: `at least 2 data lines are needed (found ${rows.rows.length})` });
  return { points, problems, dated };
}

function monthlyVolumes(rows: Rows, daysOn: number, fluid: 'oil' | 'gas' | undefined, problems: CsvProblem[]): { points: RatePoint[]; problems: CsvProblem[] } {
  const names = fluid ? [fluid, 'volume'] : ['volume', 'oil', 'gas'];
  const vi = column(rows.header, names);
  if (vi < 0) {
    problems.push({ line: rows.headerLine, message: `monthly volumes need a volume column named "${names[0]}" (found: ${rows.header.join(', ')})` });
    return { points: [], problems };
  }
  const points: RatePoint[] = [];
  let before = 0;
  for (const { line, cells } of rows.rows) {
    const days = numberAt(cells, daysOn, line, 'days on', problems);
    const volume = numberAt(cells, vi, line, rows.header[vi], problems);
    if (Number.isFinite(days) && (days < 0 || days > 31)) problems.push({ line, message: `days on must be between 0 and 31 (got ${days})` });
    if (Number.isFinite(volume) && volume < 0) problems.push({ line, message: `${rows.header[vi]} must be >= 0 (got ${volume})` });
    if (days > 0) points.push({ t: before + days / 2, rate: volume / days });
    if (Number.isFinite(days)) before += days;
  }
  if (points.length < 2) problems.push({ line: null, message: `at least 2 producing months are needed (found ${points.length})` });
  return { points, problems };
}
