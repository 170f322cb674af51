import ExcelJS from 'exceljs';
import Papa from 'papaparse';

/** Key/value lines that say where a table came from (written before the table in CSV, on its own sheet in XLSX). */
export type Provenance = [key: string, value: string][];

export interface TableColumn<R> {
  key: keyof R;
  label: string;
  /** 'depth': the rows' depth unit; any other string is written as is; null: no unit. */
  unit: 'depth' | string | null;
}

export interface Table {
  header: string[];
  rows: (string | number | null)[][];
}

/**
 * A table with units in the header row ("Net pay MD (ft)"). Depth columns take the rows' depth
 * unit when all rows share one, else "(depth unit)" and each row's unit is in the last column.
 */
export function tableOf<R>(columns: readonly TableColumn<R>[], rows: readonly R[], depthUnitOf: (row: R) => string | null): Table {
  const units = new Set(rows.map(depthUnitOf).filter((u): u is string => !!u));
  const depthLabel = units.size === 1 ? [...units][0] : 'depth unit';
  const header = [...columns.map((c) => (c.unit === null ? c.label : `${c.label} (${c.unit === 'depth' ? depthLabel : c.unit})`)), 'Depth unit'];
  const cell = (v: unknown) => (typeof v === 'number' ? (Number.isFinite(v) ? v : null) : v === null || v === undefined ? null : String(v));
  return { header, rows: rows.map((r) => [...columns.map((c) => cell(r[c.key])), depthUnitOf(r)]) };
}

/**
 * CSV (papaparse): the provenance block first, one "# key,value" line each (read it back with
 * papaparse's `comments: '#'` or skip lines starting with '#'), then the header row and the rows.
 */
export function tableCsv(table: Table, provenance: Provenance): string {
  const block = Papa.unparse(provenance.map(([k, v]) => [`# ${k}`, v]), { newline: '\r\n' });
  const body = Papa.unparse({ fields: table.header, data: table.rows.map((r) => r.map((v) => (v === null ? '' : v))) }, { newline: '\r\n' });
  return `${block}\r\n${body}\r\n`;
}

/** XLSX (exceljs): each table on its own sheet (bold header row), then a "Provenance" sheet. */
export async function tableXlsx(sheets: { name: string; table: Table }[], provenance: Provenance): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Poreline';
  wb.created = new Date();
  for (const { name, table } of sheets) {
    const ws = wb.addWorksheet(name);
    ws.addRow(table.header).font = { bold: true };
    for (const r of table.rows) ws.addRow(r.map((v) => (v === null ? '' : v)));
    ws.views = [{ state: 'frozen', ySplit: 1 }];
    ws.columns.forEach((c) => (c.width = 16));
  }
  const ws = wb.addWorksheet('Provenance');
  ws.addRow(['Key', 'Value']).font = { bold: true };
  for (const [k, v] of provenance) ws.addRow([k, v]);
  ws.getColumn(1).width = 28;
  ws.getColumn(2).width = 100;
  return Buffer.from(await wb.xlsx.writeBuffer());
}
