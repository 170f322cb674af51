/**
 * The demo-field generator, pure: model -> files (path under demo-wells/data/ and text).
 * scripts/generate.ts writes them; the generator test compares them with the committed ones.
 */
import { writeLas } from '@poreline/core';
import type { LasWriteCurve, LasWriteItem } from '@poreline/core';
import { FORMATIONS } from './model/formations.js';
import { BIT_SIZE_IN, FIELD_SEED, M_PER_FT, RMF_REFERENCE, SERVICE_COMPANY } from './model/constants.js';
import { type WellColumn, sampleDepth } from './model/column.js';
import { type ModelTruth, modelJson, modelTruth } from './model/field.js';
import { endOfBuildMd, surveyStations } from './model/trajectory.js';
import { kbElevationFt } from './model/wells.js';
import { CURVE_KEYS, type CurveKey, type SyntheticLogs, synthesizeLogs } from './synthesize.js';
import { type DemoFileKind, demoFileEntries } from './files.js';
import { toCsv } from './writers/csv.js';
import { type Las3Column, writeLas3 } from './writers/las3.js';
import { renderReadme } from './readme.js';

export interface GeneratedFile {
  path: string;
  kind: DemoFileKind;
  wellName: string | null;
  content: string;
}

const DESCRIPTIONS: Record<CurveKey, string> = {
  GR: 'Gamma ray',
  SP: 'Spontaneous potential',
  CALI: 'Caliper',
  RHOB: 'Bulk density',
  DRHO: 'Density correction',
  NPHI: 'Neutron porosity (limestone matrix)',
  DT: 'Compressional sonic transit time',
  RT: 'Deep resistivity',
};

/** File mnemonics per well (curve names vary between logging contractors and tools). */
function mnemonics(well: string): Record<CurveKey, string> {
  const base: Record<CurveKey, string> = { GR: 'GR', SP: 'SP', CALI: 'CALI', RHOB: 'RHOB', DRHO: 'DRHO', NPHI: 'NPHI', DT: 'DT', RT: 'ILD' };
  if (well === 'WM-5') return { ...base, RT: 'RT' };
  if (well === 'WM-7') return { ...base, RT: 'LLD' };
  if (well === 'WM-9') return { ...base, CALI: 'HCAL', RHOB: 'RHOZ', NPHI: 'TNPH', DT: 'DTCO', RT: 'AT90' };
  return base;
}

interface UnitSpec {
  unit: string;
  factor: number;
  decimals: number;
}

/** File units and conversion factors (file value = canonical value x factor). */
function units(metric: boolean): Record<CurveKey | 'DEPT', UnitSpec> {
  if (!metric) {
    return {
      DEPT: { unit: 'FT', factor: 1, decimals: 2 },
      GR: { unit: 'GAPI', factor: 1, decimals: 2 },
      SP: { unit: 'MV', factor: 1, decimals: 2 },
      CALI: { unit: 'IN', factor: 1, decimals: 3 },
      RHOB: { unit: 'G/CC', factor: 1, decimals: 4 },
      DRHO: { unit: 'G/CC', factor: 1, decimals: 4 },
      NPHI: { unit: 'V/V', factor: 1, decimals: 4 },
      DT: { unit: 'US/F', factor: 1, decimals: 2 },
      RT: { unit: 'OHMM', factor: 1, decimals: 4 },
    };
  }
  // 1 in = 25.4 mm; 1 g/cm3 = 1000 kg/m3; v/v x 100 = %; us/m = us/ft / 0.3048 (NIST SP 811).
  return {
    DEPT: { unit: 'M', factor: 1, decimals: 2 },
    GR: { unit: 'GAPI', factor: 1, decimals: 2 },
    SP: { unit: 'MV', factor: 1, decimals: 2 },
    CALI: { unit: 'MM', factor: 25.4, decimals: 1 },
    RHOB: { unit: 'KG/M3', factor: 1000, decimals: 1 },
    DRHO: { unit: 'KG/M3', factor: 1000, decimals: 1 },
    NPHI: { unit: '%', factor: 100, decimals: 2 },
    DT: { unit: 'US/M', factor: 1 / M_PER_FT, decimals: 2 },
    RT: { unit: 'OHMM', factor: 1, decimals: 4 },
  };
}

function scaled(v: Float64Array, factor: number): Float64Array {
  if (factor === 1) return v;
  const out = new Float64Array(v.length);
  for (let i = 0; i < v.length; i++) out[i] = v[i] * factor;
  return out;
}

function wellItems(col: WellColumn, date: string): LasWriteItem[] {
  const w = col.well;
  return [
    { mnemonic: 'COMP', value: modelTruth().operator, description: 'Company' },
    { mnemonic: 'WELL', value: w.name, description: 'Well' },
    { mnemonic: 'FLD', value: modelTruth().field, description: 'Field' },
    { mnemonic: 'LOC', value: `X ${w.x} ft E Y ${w.y} ft N of the field origin (invented local grid)`, description: 'Location' },
    { mnemonic: 'PROV', value: 'Demo province (invented)', description: 'Province' },
    { mnemonic: 'SRVC', value: SERVICE_COMPANY, description: 'Service company' },
    { mnemonic: 'DATE', value: date, description: 'Log date (YYYY-MM-DD)' },
    { mnemonic: 'UWI', value: w.uwi, description: 'Unique well identifier (invented)' },
  ];
}

function parameterItems(col: WellColumn, metric: boolean, run: number): LasWriteItem[] {
  const k = metric ? M_PER_FT : 1;
  const du = metric ? 'M' : 'FT';
  const r2 = (x: number) => Math.round(x * 100) / 100;
  return [
    { mnemonic: 'RUN', value: String(run), description: 'Run number' },
    { mnemonic: 'EKB', unit: du, value: String(r2(kbElevationFt(col.well) * k)), description: 'Elevation of kelly bushing above sea level' },
    { mnemonic: 'EGL', unit: du, value: String(r2(col.well.groundElevationFt * k)), description: 'Ground elevation above sea level' },
    { mnemonic: 'BS', unit: metric ? 'MM' : 'IN', value: metric ? String(r2(BIT_SIZE_IN * 25.4)) : String(BIT_SIZE_IN), description: 'Bit size' },
    { mnemonic: 'RMF', unit: 'OHMM', value: String(RMF_REFERENCE.rmf), description: 'Mud filtrate resistivity' },
    { mnemonic: 'RMFT', unit: 'DEGF', value: String(RMF_REFERENCE.temperatureF), description: 'Temperature of the RMF measurement' },
  ];
}

function otherText(wellName: string, note: string | null): string {
  const lines = [
    `Synthetic logs of the invented ${modelTruth().field} (well ${wellName}).`,
    `Generated by demo-wells from a layered earth model with seed ${FIELD_SEED}; not measured data.`,
  ];
  if (note) lines.push(note);
  return lines.join('\n');
}

function las2Curves(logs: SyntheticLogs, metric: boolean): LasWriteCurve[] {
  const u = units(metric);
  const mn = mnemonics(logs.well);
  return [
    { mnemonic: 'DEPT', unit: u.DEPT.unit, description: 'Measured depth', values: logs.depth, decimals: u.DEPT.decimals },
    ...CURVE_KEYS.map((k) => ({ mnemonic: mn[k], unit: u[k].unit, description: DESCRIPTIONS[k], values: scaled(logs.curves[k], u[k].factor), decimals: u[k].decimals })),
  ];
}

function las2File(col: WellColumn, logs: SyntheticLogs, opts: { wrap: boolean; run: number; date: string; note: string | null }): string {
  const metric = col.sampling.unit === 'm';
  return writeLas(
    {
      well: wellItems(col, opts.date),
      curves: las2Curves(logs, metric),
      parameters: parameterItems(col, metric, opts.run),
      other: otherText(col.well.name, opts.note),
    },
    { wrap: opts.wrap },
  );
}

function las3File(col: WellColumn, logs: SyntheticLogs): string {
  const u = units(false);
  const mn = mnemonics(logs.well);
  const log: Las3Column[] = [
    { mnemonic: 'DEPT', unit: 'FT', description: 'Measured depth', values: logs.depth, decimals: 2 },
    ...CURVE_KEYS.map((k) => ({ mnemonic: mn[k], unit: u[k].unit, description: DESCRIPTIONS[k], values: logs.curves[k], decimals: u[k].decimals })),
  ];
  const tops = FORMATIONS.map((f, i) => ({ name: f.name, top: col.topsMd[i], base: i + 1 < FORMATIONS.length ? col.topsMd[i + 1] : col.logBaseMd }));
  const items = wellItems(col, col.well.logDate).map((it) => ({
    mnemonic: it.mnemonic,
    value: String(it.value ?? '').replace(/,/g, ''),
    description: it.mnemonic === 'DATE' ? 'Log date' : (it.description ?? ''),
    format: it.mnemonic === 'DATE' ? 'YYYY-MM-DD' : undefined,
  }));
  return writeLas3({
    well: items,
    parameters: parameterItems(col, false, 1).map((it) => ({ mnemonic: it.mnemonic, unit: it.unit, value: String(it.value), description: it.description ?? '', format: it.mnemonic === 'RUN' ? undefined : 'F' })),
    log,
    groups: [
      {
        name: 'Tops',
        columns: [
          { mnemonic: 'TOPT', unit: 'FT', description: 'Top depth', decimals: 2, values: tops.map((t) => t.top) },
          { mnemonic: 'TOPB', unit: 'FT', description: 'Base depth', decimals: 2, values: tops.map((t) => t.base) },
          { mnemonic: 'TOPN', unit: '', description: 'Formation name', values: tops.map((t) => t.name) },
        ],
      },
    ],
  });
}

function lasFiles(t: ModelTruth): GeneratedFile[] {
  const out: GeneratedFile[] = [];
  for (const wt of t.wells) {
    const col = wt.column;
    const w = col.well;
    const d = w.delivery;
    if (d.kind === 'las2_two_runs') {
      const k = FORMATIONS.findIndex((f) => f.name === d.splitAnchor);
      const splitMd = col.topsMd[k] + d.splitOffsetFt;
      let iSplit = 0;
      while (sampleDepth(col.sampling, iSplit).md < splitMd) iSplit++;
      const iEnd1 = Math.min(col.sampling.count, iSplit + Math.round(d.overlapFt / col.sampling.step));
      const run1 = synthesizeLogs(col, { from: 0, to: iEnd1, run: 'run1' });
      const run2 = synthesizeLogs(col, { from: iSplit, to: col.sampling.count, run: 'run2' });
      const overlap = `Runs overlap from ${run2.depth[0].toFixed(2)} to ${run1.depth[run1.depth.length - 1].toFixed(2)} ft; splice them inside the overlap.`;
      out.push({ path: `las/${w.name}_run1.las`, kind: 'las', wellName: w.name, content: las2File(col, run1, { wrap: false, run: 1, date: w.logDate, note: `Run 1 of 2. ${overlap}` }) });
      out.push({ path: `las/${w.name}_run2.las`, kind: 'las', wellName: w.name, content: las2File(col, run2, { wrap: false, run: 2, date: shiftDate(w.logDate, 9), note: `Run 2 of 2. ${overlap}` }) });
      continue;
    }
    const logs = synthesizeLogs(col);
    const content = d.kind === 'las3' ? las3File(col, logs) : las2File(col, logs, { wrap: d.kind === 'las2_wrapped', run: 1, date: w.logDate, note: null });
    out.push({ path: `las/${w.name}.las`, kind: 'las', wellName: w.name, content });
  }
  return out;
}

function shiftDate(iso: string, days: number): string {
  const d = new Date(`${iso}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

function topsCsv(t: ModelTruth): string {
  const rows: (string | number)[][] = [];
  for (const wt of t.wells) {
    const metric = wt.column.sampling.unit === 'm';
    FORMATIONS.forEach((f, i) => {
      const md = wt.column.topsMd[i];
      rows.push([wt.name, f.name, metric ? (md * M_PER_FT).toFixed(3) : md.toFixed(2), metric ? 'm' : 'ft']);
    });
  }
  return toCsv(['well', 'formation', 'top_md', 'depth_unit'], rows);
}

function wellsCsv(t: ModelTruth): string {
  const entries = demoFileEntries();
  const rows = t.wells.map((wt) => {
    const w = wt.column.well;
    const las = entries.filter((e) => e.kind === 'las' && e.wellName === w.name).map((e) => e.path);
    const survey = entries.find((e) => e.kind === 'survey' && e.wellName === w.name)?.path ?? '';
    return [w.name, w.uwi, w.status, w.x, w.y, w.groundElevationFt, Math.round(kbElevationFt(w) * 100) / 100, wt.column.sampling.unit, w.trajectory.kind, las.join(';'), survey];
  });
  return toCsv(['well', 'uwi', 'status', 'x_ft', 'y_ft', 'ground_elevation_ft', 'kb_elevation_ft', 'depth_unit', 'trajectory', 'las_files', 'survey_file'], rows);
}

function surveyCsv(col: WellColumn): string {
  const t = col.well.trajectory;
  const td = Math.ceil((col.logBaseMd + 10) / 10) * 10;
  const rows = surveyStations(t, td).map((s) => [s.md.toFixed(2), s.inclinationDeg.toFixed(3), s.azimuthDeg.toFixed(2)]);
  if (t.kind === 'build_hold' && !rows.some((r) => r[0] === endOfBuildMd(t).toFixed(2))) throw new RangeError('surveyCsv: end of build missing');
  return toCsv(['md_ft', 'inclination_deg', 'azimuth_deg'], rows);
}

function productionFiles(t: ModelTruth): GeneratedFile[] {
  const g = t.gasWell;
  const o = t.oilWell;
  return [
    {
      path: 'production/WM-1_monthly.csv',
      kind: 'production',
      wellName: 'WM-1',
      content: toCsv(['month', 'days_on', 'gas_mscf', 'water_bbl'], g.monthly.map((m) => [m.month, m.daysOn, m.gasMscf, m.waterBbl])),
    },
    {
      path: 'production/WM-1_static_pressures.csv',
      kind: 'production',
      wellName: 'WM-1',
      content: toCsv(
        ['date', 'cum_gas_mmscf', 'static_pressure_psia', 'datum_tvdss_ft'],
        g.pressures.map((p) => [p.date, p.cumGasMmscf.toFixed(3), p.pressurePsia, g.input.datumTvdss]),
      ),
    },
    {
      path: 'production/WM-4_monthly.csv',
      kind: 'production',
      wellName: 'WM-4',
      content: toCsv(['month', 'days_on', 'oil_stb', 'gas_mscf', 'water_bbl'], o.monthly.map((m) => [m.month, m.daysOn, m.oilStb, m.gasMscf, m.waterBbl])),
    },
  ];
}

/** Rounds every number to 10 significant digits (stable, readable JSON). */
function roundNumbers(_key: string, value: unknown): unknown {
  return typeof value === 'number' && Number.isFinite(value) && !Number.isInteger(value) ? Number(value.toPrecision(10)) : value;
}

/** Generates every file of the demo field, in the order of demoFileEntries(). */
export function generateDemoField(): GeneratedFile[] {
  const t = modelTruth();
  const files: GeneratedFile[] = [
    ...lasFiles(t),
    { path: 'tops.csv', kind: 'tops', wellName: null, content: topsCsv(t) },
    { path: 'wells.csv', kind: 'wells', wellName: null, content: wellsCsv(t) },
    ...t.wells
      .filter((w) => w.column.well.trajectory.kind !== 'vertical')
      .map((w) => ({ path: `surveys/${w.name}_survey.csv`, kind: 'survey' as const, wellName: w.name, content: surveyCsv(w.column) })),
    ...productionFiles(t),
    { path: 'model.json', kind: 'model', wellName: null, content: JSON.stringify(modelJson(t), roundNumbers, 2) + '\n' },
    { path: 'README.md', kind: 'readme', wellName: null, content: renderReadme(t) },
  ];
  const expected = demoFileEntries().map((e) => e.path);
  const got = files.map((f) => f.path);
  if (expected.join('|') !== got.join('|')) throw new RangeError(`generateDemoField: files ${got.join(', ')} differ from the list ${expected.join(', ')}`);
  return files;
}
