/**
 * A small LAS 3.0 writer (core writes LAS 2.0 only): ~Version with DLM COMMA, ~Well,
 * ~Log_Parameter, ~Log_Definition, optional extra groups (definition + data, e.g. ~Tops), and
 * ~Log_Data | Log_Definition, comma-delimited, one line per depth step.
 *
 * Layout follows the CWLS Log ASCII Standard version 3.0 (Canadian Well Logging Society,
 * 2000; its sample file `sample_las3.0_spec.las`): header lines `MNEM.UNIT  VALUE : DESCRIPTION
 * {format} | association`, formats F (float) and S (string), data sections named
 * `~<Group>_Data | <Group>_Definition` (the Log group) or `~<Group> | <Group>_Definition`.
 * Extra groups are written before the Log group so that readers which treat the log data
 * as the end of the header still read every group.
 */

export interface Las3Item {
  mnemonic: string;
  unit?: string;
  value?: string;
  description: string;
  /** 'F' float, 'S' string, or a date format such as 'YYYY-MM-DD'. */
  format?: string;
  association?: string;
}

export interface Las3Column {
  mnemonic: string;
  unit: string;
  description: string;
  /** Fixed decimals for floats; strings are written as given. */
  decimals?: number;
  values: ArrayLike<number> | readonly string[];
}

export interface Las3Group {
  /** Group name, e.g. 'Tops' (sections ~Tops_Definition and ~Tops | Tops_Definition). */
  name: string;
  columns: Las3Column[];
}

export interface Las3Input {
  well: Las3Item[];
  parameters: Las3Item[];
  /** First column = depth index. */
  log: Las3Column[];
  groups?: Las3Group[];
  nullValue?: number;
}

function fail(message: string): never {
  throw new RangeError(`writeLas3: ${message}`);
}

function checkField(what: string, text: string): void {
  if (/[\r\n]/.test(text)) fail(`${what} must not contain a line break`);
  if (/[:{}|,]/.test(text) && !what.startsWith('description')) fail(`${what} must not contain ':', '{', '}', '|' or ','`);
}

function headerLine(it: Las3Item): string {
  const unit = it.unit ?? '';
  const value = it.value ?? '';
  checkField(`mnemonic ${it.mnemonic}`, it.mnemonic);
  checkField(`unit of ${it.mnemonic}`, unit);
  checkField(`value of ${it.mnemonic}`, value);
  if (/[:{}|]/.test(it.description)) fail(`description of ${it.mnemonic} must not contain ':', '{', '}' or '|'`);
  let line = `${` ${it.mnemonic}.${unit}`.padEnd(16)} ${value.padStart(18)} : ${it.description}`;
  if (it.format) line += ` {${it.format}}`;
  if (it.association) line += ` | ${it.association}`;
  return line.trimEnd();
}

function columnText(c: Las3Column, i: number, nullText: string): string {
  const v = c.values[i];
  if (typeof v === 'string') {
    if (/[,\r\n]/.test(v)) fail(`string value in column ${c.mnemonic} must not contain ',' or a line break`);
    return v;
  }
  if (v !== v) return nullText;
  if (!Number.isFinite(v)) fail(`column ${c.mnemonic} sample ${i} is not finite`);
  return c.decimals === undefined ? String(v) : v.toFixed(c.decimals);
}

function dataLines(cols: Las3Column[], nullText: string): string[] {
  const n = cols[0].values.length;
  for (const c of cols) if (c.values.length !== n) fail(`column ${c.mnemonic} has ${c.values.length} values, expected ${n}`);
  const out: string[] = [];
  for (let i = 0; i < n; i++) out.push(cols.map((c) => columnText(c, i, nullText)).join(','));
  return out;
}

function definitionLines(cols: Las3Column[]): string[] {
  return cols.map((c) => headerLine({ mnemonic: c.mnemonic, unit: c.unit, description: c.description, format: c.decimals === undefined && typeof c.values[0] === 'string' ? 'S' : 'F' }));
}

/**
 * Writes a LAS 3.0 file (see the file comment). STRT, STOP, STEP are taken from the index
 * column and written first in ~Well, then NULL; given items with those mnemonics are dropped.
 * Throws RangeError('writeLas3: ...') on an empty log, unequal column lengths, a null in the
 * index, or a header field holding a LAS 3.0 delimiter (':', '{', '}', '|', ',').
 */
export function writeLas3(input: Las3Input): string {
  const nullValue = input.nullValue ?? -999.25;
  const nullText = String(nullValue);
  const idx = input.log[0];
  if (!idx || idx.values.length < 2) fail('the log needs an index column with at least 2 samples');
  const n = idx.values.length;
  for (let i = 0; i < n; i++) if (typeof idx.values[i] !== 'number' || idx.values[i] !== idx.values[i]) fail(`index ${idx.mnemonic} has no value at sample ${i}`);
  const first = idx.values[0] as number;
  const last = idx.values[n - 1] as number;
  const step = Number(((last - first) / (n - 1)).toPrecision(12));
  const fmt = (x: number) => (idx.decimals === undefined ? String(x) : x.toFixed(idx.decimals));
  const out: string[] = [];
  out.push('~Version');
  out.push(headerLine({ mnemonic: 'VERS', value: '3.0', description: 'CWLS LOG ASCII STANDARD - VERSION 3.0' }));
  out.push(headerLine({ mnemonic: 'WRAP', value: 'NO', description: 'ONE LINE PER DEPTH STEP' }));
  out.push(headerLine({ mnemonic: 'DLM', value: 'COMMA', description: 'DELIMITING CHARACTER BETWEEN DATA COLUMNS' }));
  out.push('~Well');
  out.push(headerLine({ mnemonic: 'STRT', unit: idx.unit, value: fmt(first), description: 'First index value', format: 'F' }));
  out.push(headerLine({ mnemonic: 'STOP', unit: idx.unit, value: fmt(last), description: 'Last index value', format: 'F' }));
  out.push(headerLine({ mnemonic: 'STEP', unit: idx.unit, value: String(step), description: 'Index step', format: 'F' }));
  out.push(headerLine({ mnemonic: 'NULL', value: nullText, description: 'Null value', format: 'F' }));
  for (const it of input.well) if (!['STRT', 'STOP', 'STEP', 'NULL'].includes(it.mnemonic.toUpperCase())) out.push(headerLine(it));
  for (const g of input.groups ?? []) {
    out.push(`~${g.name}_Definition`);
    out.push(...definitionLines(g.columns));
    out.push(`~${g.name} | ${g.name}_Definition`);
    out.push(...dataLines(g.columns, nullText));
  }
  out.push('~Log_Parameter');
  for (const it of input.parameters) out.push(headerLine(it));
  out.push('~Log_Definition');
  out.push(...definitionLines(input.log));
  out.push('~Log_Data | Log_Definition');
  out.push(...dataLines(input.log, nullText));
  return out.join('\n') + '\n';
}
