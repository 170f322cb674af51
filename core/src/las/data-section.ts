/**
 * The ~A (LAS 3.0: ~Log_Data) section: rows of numbers into one Float64Array per curve.
 *
 * Two readers share the rules below; this file holds their shared types and messages.
 * `scanDataFast` (data-fast.ts) walks the bytes of unwrapped, space/tab delimited data (the
 * common case), parsing numbers in place: once, or twice for a line holding anything but
 * plain decimals. `scanDataGeneral` (data-general.ts) reads line by line through strings and
 * also handles WRAP YES, comma delimiters and quoted tokens. Rules, both readers:
 * - blank lines and lines starting with '#' are skipped; a line starting with '~' ends the
 *   section;
 * - the header's NULL and each null alias become NaN; a token that is not a number becomes
 *   NaN with a warning; a number beyond the double range becomes NaN with a warning;
 * - a line holding no number at all is text, ignored with a warning (text after the data);
 * - a row with too few values gets NaN at its end, one with too many loses the extras, each
 *   with an error naming the line (columns are never shifted silently).
 */
import type { DiagnosticLog } from './errors.js';

export interface DataScanParams {
  nCurves: number;
  nullValue: number;
  nullAliases: readonly number[];
  wrapped: boolean;
  delimiter: 'space' | 'comma' | 'tab';
  /** Line number of the byte at `start`. */
  startLine: number;
  log: DiagnosticLog;
}

export interface DataScanResult {
  columns: Float64Array[];
  rows: number;
  /** Offset of the line that ended the section ('~...') or the input length. */
  end: number;
  endLine: number;
  mismatchedRows: number;
  firstMismatch: { line: number; values: number } | null;
  aliasNulls: number;
}

export const TOPIC_TOKEN = 'value that is not a number';
export const TOPIC_RANGE = 'number beyond the double range';
export const TOPIC_TEXT = 'text in the data section';
export const TOPIC_SHORT = 'row with too few values';
export const TOPIC_LONG = 'row with too many values';
export const TOPIC_EMPTY = 'empty field';

export function notANumber(line: number, token: string): string {
  return `line ${line}: "${preview(token)}" is not a number; read as null`;
}

export function preview(text: string): string {
  return text.length > 24 ? `${text.slice(0, 24)}...` : text;
}

export function allocate(nCurves: number, capacity: number): Float64Array[] {
  const cols: Float64Array[] = [];
  for (let c = 0; c < nCurves; c++) cols.push(new Float64Array(capacity));
  return cols;
}

export function grow(cols: Float64Array[], capacity: number): void {
  for (let c = 0; c < cols.length; c++) {
    const next = new Float64Array(capacity);
    next.set(cols[c]);
    cols[c] = next;
  }
}

/** Trims columns to `rows`: a view when little is wasted, else a copy that frees the rest. */
export function trim(cols: Float64Array[], rows: number): Float64Array[] {
  return cols.map((c) => (c.length === rows ? c : c.length - rows <= c.length / 8 ? c.subarray(0, rows) : c.slice(0, rows)));
}

export function mismatchMessage(line: number, got: number, expected: number): string {
  return got < expected
    ? `line ${line}: ${got} values where ${expected} curves are defined; the missing values at the end of the row were read as null`
    : `line ${line}: ${got} values where ${expected} curves are defined; the ${got - expected} extra values at the end of the row were ignored`;
}
