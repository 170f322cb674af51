/**
 * Shapes of a parsed LAS file (see `readLas`). Header items keep their text as written;
 * samples are one Float64Array per curve with NaN for null.
 */
import type { LasDiagnostic } from './errors.js';

/** One header line `MNEM.UNIT  VALUE : DESCRIPTION`; `line` is 1-based in the file. */
export interface LasHeaderItem {
  mnemonic: string;
  unit: string;
  value: string;
  description: string;
  line: number;
  /** LAS 3.0 only: the `{format}` written after the description, without braces. */
  format?: string;
  /** LAS 3.0 only: the `| association` written after the description. */
  association?: string;
}

/** A section the reader keeps as text (LAS 3.0 groups other than Log, unknown `~X` sections). */
export interface LasRawSection {
  /** The title as written after `~`, trimmed. */
  name: string;
  line: number;
  lines: string[];
}

export interface LasSections {
  version: LasHeaderItem[];
  well: LasHeaderItem[];
  /** The curve definitions (~Curve / ~Log_Definition), in file order. */
  curves: LasHeaderItem[];
  parameters: LasHeaderItem[];
  /** The ~Other section's text, lines joined with '\n' ('' when absent). */
  other: string;
  /** Any other section, kept as text. */
  extra: LasRawSection[];
}

export interface LasCurve {
  /** Unique within the file: a repeated mnemonic gets a suffix (`GR`, `GR_2`). */
  mnemonic: string;
  /** The mnemonic as written in the file. */
  originalMnemonic: string;
  unit: string;
  /** The value field of the curve line (API log code in LAS 2.0). */
  apiCode: string;
  description: string;
  /** Line of the curve's definition in ~Curve. */
  line: number;
  /** One sample per data row; NaN for null. */
  values: Float64Array;
}

export type LasDirection = 'ascending' | 'descending' | 'unordered';

export interface LasIndexInfo {
  mnemonic: string;
  /** The index curve's unit as written (or the STRT unit when the curve has none). */
  unit: string;
  /** 'ft' or 'm' when the unit is a recognised depth unit, else null (time index, unknown). */
  depthUnit: 'ft' | 'm' | null;
  /** First and last index values of the data (NaN when the index is null there). */
  start: number;
  stop: number;
  /** Regular spacing of the data (signed, as STEP), or null when sampling is irregular. */
  step: number | null;
  direction: LasDirection;
  /** STRT, STOP, STEP as declared in ~Well (null when missing or not a number). */
  declared: { start: number | null; stop: number | null; step: number | null };
}

export interface LasFile {
  version: '1.2' | '2.0' | '3.0';
  wrapped: boolean;
  /** LAS 3.0 DLM; 'space' for earlier versions. */
  delimiter: 'space' | 'comma' | 'tab';
  sections: LasSections;
  /** First curve = index (depth or time). */
  curves: LasCurve[];
  rowCount: number;
  index: LasIndexInfo;
  /** The NULL value declared in ~Well (default -999.25 when missing). */
  nullValue: number;
  /** 'utf-8' unless bytes were not valid UTF-8 and were read as Latin-1. */
  encoding: 'utf-8' | 'latin-1';
  diagnostics: LasDiagnostic[];
}

export interface ReadLasOptions {
  /** Refuse inputs larger than this many bytes (kind 'too_large'). Default: no limit. */
  maxBytes?: number;
  /**
   * Values read as null besides the header's NULL. Default [-999.25, -9999] (common practice:
   * the two spellings of "no value" met most often in LAS files).
   */
  nullAliases?: readonly number[];
  /** At most this many diagnostics per kind of problem, then one summary line. Default 20. */
  maxDiagnosticsPerKind?: number;
}
