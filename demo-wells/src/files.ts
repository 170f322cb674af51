/**
 * The demo field's files: which file belongs to which well, in which format, and where it
 * lies under demo-wells/data/. Pure (no I/O); load.ts reads them from disk.
 */
import { WELLS } from './model/wells.js';

export type DemoFileKind = 'las' | 'tops' | 'survey' | 'production' | 'wells' | 'model' | 'readme';

export interface DemoFileEntry {
  /** Path under demo-wells/data/, '/'-separated. */
  path: string;
  kind: DemoFileKind;
  /** Well the file belongs to (null for field-wide files). */
  wellName: string | null;
  /** LAS files: version and special case. */
  las?: { version: '2.0' | '3.0'; depthUnit: 'ft' | 'm'; wrapped: boolean; run: number | null };
}

/** LAS files, one or two per well (WELLS order; WM-4 has two runs). */
export function demoLasFiles(): DemoFileEntry[] {
  const out: DemoFileEntry[] = [];
  for (const w of WELLS) {
    const d = w.delivery;
    const base = { kind: 'las' as const, wellName: w.name };
    if (d.kind === 'las2_two_runs') {
      for (const run of [1, 2]) out.push({ ...base, path: `las/${w.name}_run${run}.las`, las: { version: '2.0', depthUnit: 'ft', wrapped: false, run } });
    } else {
      out.push({
        ...base,
        path: `las/${w.name}.las`,
        las: { version: d.kind === 'las3' ? '3.0' : '2.0', depthUnit: d.kind === 'las2_metric' ? 'm' : 'ft', wrapped: d.kind === 'las2_wrapped', run: null },
      });
    }
  }
  return out;
}

/** Every file of the demo field, in a fixed order. */
export function demoFileEntries(): DemoFileEntry[] {
  return [
    ...demoLasFiles(),
    { path: 'tops.csv', kind: 'tops', wellName: null },
    { path: 'wells.csv', kind: 'wells', wellName: null },
    ...WELLS.filter((w) => w.trajectory.kind !== 'vertical').map((w) => ({ path: `surveys/${w.name}_survey.csv`, kind: 'survey' as const, wellName: w.name })),
    { path: 'production/WM-1_monthly.csv', kind: 'production', wellName: 'WM-1' },
    { path: 'production/WM-1_static_pressures.csv', kind: 'production', wellName: 'WM-1' },
    { path: 'production/WM-4_monthly.csv', kind: 'production', wellName: 'WM-4' },
    { path: 'model.json', kind: 'model', wellName: null },
    { path: 'README.md', kind: 'readme', wellName: null },
  ];
}
