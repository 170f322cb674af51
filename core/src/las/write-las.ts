/**
 * The LAS 2.0 writer: ~Version, ~Well (STRT/STOP/STEP/NULL computed from the index), ~Curve,
 * optional ~Parameter and ~Other, then ~A, unwrapped or wrapped (WRAP YES: the index alone on
 * its line, the other values on lines of at most 80 characters; CWLS LAS 2.0, from memory).
 */
import { parseNumberText } from './number.js';
import { DEFAULT_LAS_NULL, DEFAULT_NULL_ALIASES } from './read-las.js';

export interface LasWriteItem {
  mnemonic: string;
  unit?: string;
  value?: string | number;
  description?: string;
}

export interface LasWriteCurve {
  mnemonic: string;
  unit?: string;
  description?: string;
  /** LAS 2.0 API code (the curve line's value field), optional. */
  apiCode?: string;
  /** Samples; NaN is written as the NULL value. */
  values: Float64Array | readonly number[];
  /**
   * Digits after the decimal point. Omitted: the shortest text that reads back to the same
   * double (exact round trip). Given: fixed notation, read back within 0.5 x 10^-decimals.
   */
  decimals?: number;
}

export interface LasWriteInput {
  /** Well items (COMP, WELL, FLD, UWI, ...). STRT, STOP, STEP and NULL are computed and replace any given here. */
  well?: readonly LasWriteItem[];
  /** First curve = index (depth or time), no nulls. */
  curves: readonly LasWriteCurve[];
  parameters?: readonly LasWriteItem[];
  /** Free text of the ~Other section. */
  other?: string;
  /** Written for NaN samples; default -999.25. */
  nullValue?: number;
}

export interface WriteLasOptions {
  /** WRAP YES: index on its own line, other values on lines of at most 80 characters. */
  wrap?: boolean;
  /** Default '\n'. */
  lineEnding?: '\n' | '\r\n';
}

const MAX_WRAPPED_LINE = 80;
const COMPUTED = new Set(['STRT', 'STOP', 'STEP', 'NULL']);

function fail(message: string): never {
  throw new RangeError(`writeLas: ${message}`);
}

function checkText(what: string, text: string, forbidColon: boolean): void {
  if (/[\r\n]/.test(text)) fail(`${what} must not contain a line break`);
  if (forbidColon && text.includes(':')) fail(`${what} must not contain ':' (the reader splits the description at the last colon)`);
}

function checkMnemonic(what: string, m: string): void {
  if (!/^[^\s.:~#][^\s.:]*$/.test(m)) fail(`${what} mnemonic ${JSON.stringify(m)} must be non-empty, without spaces, '.', ':' and not start with '~' or '#'`);
}

function checkUnit(what: string, u: string): void {
  if (/\s/.test(u)) fail(`${what} unit ${JSON.stringify(u)} must not contain spaces`);
}

/** Shortest round-trip text of a double (ECMAScript Number::toString), keeping -0's sign. */
function shortest(v: number): string {
  return Object.is(v, -0) ? '-0' : String(v);
}

function itemLine(mnemonic: string, unit: string, value: string, description: string): string {
  // At least four spaces between unit and value keep simple split-by-spaces readers working.
  const head = ` ${mnemonic}.${unit}`.padEnd(16);
  return `${head}    ${value.padStart(16)} : ${description}`.trimEnd();
}

/**
 * Writes a LAS 2.0 file.
 *
 * Number format: per curve, `decimals` undefined writes the shortest decimal that reads back
 * to the identical double (exact round trip, including -0); `decimals: d` writes fixed
 * notation, read back within 0.5 x 10^-d. NaN is written as `nullValue`.
 *
 * @param input well items, curves (first = index), optional parameters and other text
 * @param options `wrap` (WRAP YES), `lineEnding`
 * @returns the file text (ASCII when the inputs are ASCII; encode as UTF-8 otherwise)
 * @throws RangeError naming the field: no curves, no samples, unequal lengths, an index null,
 *   ±Infinity, a sample whose text reads back as the NULL or a null alias (-999.25, -9999),
 *   bad mnemonics/units, duplicate mnemonics, ':' in a description, '~' starting an ~Other line
 * @example
 * writeLas({ well: [{ mnemonic: 'WELL', value: 'KESTREL 7-14' }],
 *            curves: [{ mnemonic: 'DEPT', unit: 'M', values: [1000, 1000.5] },
 *                     { mnemonic: 'PHIE', unit: 'V/V', values: [0.21, NaN], decimals: 4 }] })
 */
export function writeLas(input: LasWriteInput, options: WriteLasOptions = {}): string {
  const eol = options.lineEnding ?? '\n';
  const nullValue = input.nullValue ?? DEFAULT_LAS_NULL;
  if (!Number.isFinite(nullValue)) fail('nullValue must be a finite number');
  const curves = input.curves;
  if (!curves || curves.length === 0) fail('curves must hold at least the index curve');
  const n = curves[0].values.length;
  if (n === 0) fail(`index curve ${curves[0].mnemonic} has no samples`);
  const seen = new Set<string>();
  curves.forEach((c, k) => {
    checkMnemonic(`curve ${k + 1}`, c.mnemonic);
    checkUnit(`curve ${c.mnemonic}`, c.unit ?? '');
    checkText(`description of curve ${c.mnemonic}`, c.description ?? '', true);
    checkText(`apiCode of curve ${c.mnemonic}`, c.apiCode ?? '', true);
    if (seen.has(c.mnemonic.toUpperCase())) fail(`duplicate curve mnemonic ${c.mnemonic}`);
    seen.add(c.mnemonic.toUpperCase());
    if (c.values.length !== n) fail(`curve ${c.mnemonic} has ${c.values.length} samples, the index has ${n}`);
    if (c.decimals !== undefined && !(Number.isInteger(c.decimals) && c.decimals >= 0 && c.decimals <= 20)) {
      fail(`decimals of curve ${c.mnemonic} must be an integer 0..20`);
    }
  });
  const nulls = [nullValue, ...DEFAULT_NULL_ALIASES];
  const nullText = shortest(nullValue);
  const columns = curves.map((c, k) => formatColumn(c, k === 0, nullText, nulls));

  const idx = curves[0].values;
  let step = 0;
  if (n >= 2) {
    const d = (idx[n - 1] - idx[0]) / (n - 1);
    let regular = d !== 0;
    for (let i = 1; i < n && regular; i++) if (Math.abs(idx[i] - idx[i - 1] - d) > Math.abs(d) * 1e-6) regular = false;
    if (regular) step = Number(d.toPrecision(12));
  }
  const indexUnit = curves[0].unit ?? '';
  const out: string[] = [];
  out.push('~Version information');
  out.push(itemLine('VERS', '', '2.0', 'CWLS Log ASCII Standard, version 2.0'));
  out.push(itemLine('WRAP', '', options.wrap ? 'YES' : 'NO', options.wrap ? 'Rows wrapped, index on its own line' : 'One line per index step'));
  out.push('~Well information');
  out.push(itemLine('STRT', indexUnit, columns[0].text[0], 'First index value'));
  out.push(itemLine('STOP', indexUnit, columns[0].text[n - 1], 'Last index value'));
  out.push(itemLine('STEP', indexUnit, shortest(step), step === 0 ? 'Irregular sampling' : 'Index step'));
  out.push(itemLine('NULL', '', nullText, 'Missing value'));
  for (const it of input.well ?? []) {
    if (COMPUTED.has(it.mnemonic.toUpperCase())) continue;
    out.push(headerItem('well', it));
  }
  out.push('~Curve information');
  for (const c of curves) out.push(itemLine(c.mnemonic, c.unit ?? '', c.apiCode ?? '', c.description ?? ''));
  if (input.parameters && input.parameters.length > 0) {
    out.push('~Parameter information');
    for (const it of input.parameters) out.push(headerItem('parameter', it));
  }
  if (input.other !== undefined && input.other.trim() !== '') {
    out.push('~Other information');
    input.other.split(/\r\n|\r|\n/).forEach((l, k) => {
      if (l.trimStart().startsWith('~')) fail(`other text line ${k + 1} must not start with '~'`);
      out.push(l);
    });
  }
  const widths = columns.map((c) => c.width);
  out.push(options.wrap ? '~A' : `~A ${curves.map((c, k) => c.mnemonic.padStart(widths[k])).join(' ')}`);
  if (!options.wrap) {
    for (let r = 0; r < n; r++) {
      let line = '';
      for (let k = 0; k < columns.length; k++) line += (k ? ' ' : '') + columns[k].text[r].padStart(widths[k]);
      out.push(line);
    }
  } else {
    for (let r = 0; r < n; r++) {
      out.push(columns[0].text[r]);
      let line = '';
      for (let k = 1; k < columns.length; k++) {
        const t = columns[k].text[r].padStart(widths[k]);
        if (line !== '' && line.length + 1 + t.length > MAX_WRAPPED_LINE) {
          out.push(line);
          line = '';
        }
        line += (line ? ' ' : '') + t;
      }
      if (line !== '') out.push(line);
    }
  }
  return out.join(eol) + eol;
}

function headerItem(section: string, it: LasWriteItem): string {
  checkMnemonic(`${section} item`, it.mnemonic);
  checkUnit(`${section} item ${it.mnemonic}`, it.unit ?? '');
  const value = it.value === undefined ? '' : typeof it.value === 'number' ? shortest(it.value) : it.value;
  checkText(`value of ${section} item ${it.mnemonic}`, value, false);
  checkText(`description of ${section} item ${it.mnemonic}`, it.description ?? '', true);
  return itemLine(it.mnemonic, it.unit ?? '', value, it.description ?? '');
}

function formatColumn(c: LasWriteCurve, isIndex: boolean, nullText: string, nulls: readonly number[]): { text: string[]; width: number } {
  const v = c.values;
  const text = new Array<string>(v.length);
  let width = c.mnemonic.length;
  const d = c.decimals;
  for (let i = 0; i < v.length; i++) {
    const x = v[i];
    let t: string;
    if (x !== x) {
      if (isIndex) fail(`index curve ${c.mnemonic} is null at sample ${i}; the index must have a value on every row`);
      t = nullText;
    } else {
      if (x === Infinity || x === -Infinity) fail(`curve ${c.mnemonic} sample ${i} is ${x}; LAS holds finite numbers only`);
      t = d === undefined ? shortest(x) : x.toFixed(d);
      for (const z of nulls) {
        if (Math.abs(x - z) < 1 && parseNumberText(t) === z) {
          fail(`curve ${c.mnemonic} sample ${i} (${t}) would read back as null (${z}); change the value or the NULL value`);
        }
      }
    }
    text[i] = t;
    if (t.length > width) width = t.length;
  }
  return { text, width };
}
