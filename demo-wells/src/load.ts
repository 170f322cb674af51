/// <reference types="node" />
/**
 * Reads the committed demo-field files from demo-wells/data/ (Node only: the service seed and
 * the tests use it; the rest of demo-wells is pure).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { type SurveyRow, type TopRow, parseSurveyCsv, parseTopsCsv } from './check/text-files.js';
import { type DemoFileEntry, demoFileEntries, demoLasFiles } from './files.js';

/** Absolute path of demo-wells/data/ (from src/ or dist/, both one level below the package). */
export const DEMO_DATA_DIR = fileURLToPath(new URL('../data/', import.meta.url));

export interface DemoFieldFile {
  wellName: string;
  /** Path under demo-wells/data/, e.g. 'las/WM-4_run1.las'. */
  fileName: string;
  bytes: Uint8Array;
}

/** Bytes of one file under demo-wells/data/ ('/'-separated path). */
export function readDemoFile(path: string): Uint8Array {
  return new Uint8Array(readFileSync(new URL(path, new URL('../data/', import.meta.url))));
}

/** Text (UTF-8) of one file under demo-wells/data/. */
export function readDemoText(path: string): string {
  return new TextDecoder().decode(readDemoFile(path));
}

/** The demo field's LAS files with their well, for the upload API or the service seed. */
export function demoFieldFiles(): DemoFieldFile[] {
  return demoLasFiles().map((e) => ({ wellName: e.wellName!, fileName: e.path, bytes: readDemoFile(e.path) }));
}

/** Every demo file (LAS, tops, wells, surveys, production, model, README) with its bytes. */
export function allDemoFiles(): (DemoFileEntry & { bytes: Uint8Array })[] {
  return demoFileEntries().map((e) => ({ ...e, bytes: readDemoFile(e.path) }));
}

/** The formation tops of every demo well (data/tops.csv), MD in each well's depth unit. */
export function demoTops(): TopRow[] {
  return parseTopsCsv(readDemoText('tops.csv'));
}

/** The deviation survey of a demo well (MD ft, inclination and azimuth in degrees), or null for a vertical well. */
export function demoSurvey(wellName: string): SurveyRow[] | null {
  const e = demoFileEntries().find((k) => k.kind === 'survey' && k.wellName === wellName);
  return e ? parseSurveyCsv(readDemoText(e.path)) : null;
}
