/**
 * The LAS reader: CWLS Log ASCII Standard 1.2, 2.0 and 3.0 (3.0: ~Version with DLM, ~Well,
 * ~Log_Parameter, ~Log_Definition, ~Log_Data; other 3.0 groups kept as text).
 */
import { DiagnosticLog, LasParseError } from './errors.js';
import type { DataScanResult } from './data-section.js';
import { scanDataFast } from './data-fast.js';
import { scanDataGeneral } from './data-general.js';
import { parseHeaderLine } from './header-line.js';
import { indexInfo } from './index-info.js';
import { parseNumberText } from './number.js';
import { afterLineEnd, findNextSection, lineEnd, sectionKind, type SectionKind } from './sections.js';
import { decodeLatin1, decodeUtf8Strict, encodeUtf8, splitLines } from './text.js';
import type { LasCurve, LasFile, LasHeaderItem, LasSections, ReadLasOptions } from './types.js';

/** NULL assumed when ~Well has none (the value the LAS 2.0 examples use; common practice). */
export const DEFAULT_LAS_NULL = -999.25;
/** Null spellings read as null besides the header's NULL, unless options say otherwise. */
export const DEFAULT_NULL_ALIASES: readonly number[] = [-999.25, -9999];

const BINARY_PROBE = 65536;
const WELL_NUMERIC = new Set(['STRT', 'STOP', 'STEP', 'NULL']);

interface Range {
  kind: SectionKind;
  title: string;
  headerLine: number;
  start: number;
  end: number;
}

function bytesOf(input: Uint8Array | string, maxBytes: number | undefined): Uint8Array {
  const tooLarge = (size: number) =>
    new LasParseError(
      'too_large',
      `The file is ${(size / 1e6).toFixed(1)} MB (${size} bytes), over the limit of ${maxBytes} bytes; split the log or raise the limit.`,
    );
  if (typeof input === 'string') {
    if (maxBytes !== undefined && input.length > maxBytes) throw tooLarge(input.length);
    input = encodeUtf8(input);
  } else if (!(input instanceof Uint8Array)) {
    throw new TypeError('readLas: input must be a Uint8Array or a string');
  }
  if (maxBytes !== undefined && input.length > maxBytes) throw tooLarge(input.length);
  return input;
}

function checkNotEmptyOrBinary(bytes: Uint8Array, pos: number): void {
  const n = bytes.length;
  let k = pos;
  while (k < n && (bytes[k] === 32 || bytes[k] === 9 || bytes[k] === 10 || bytes[k] === 13 || bytes[k] === 26)) k++;
  if (k >= n) throw new LasParseError('empty', 'The file is empty: it holds no LAS sections and no data.');
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw new LasParseError('binary', 'The file is UTF-16 text; save it as ASCII or UTF-8 and upload it again.');
  }
  const end = Math.min(n, pos + BINARY_PROBE);
  let control = 0;
  for (let i = pos; i < end; i++) {
    const b = bytes[i];
    if (b === 0) throw new LasParseError('binary', `The file is binary (a zero byte at offset ${i}), not a LAS text file.`);
    if (b < 32 && b !== 9 && b !== 10 && b !== 13 && b !== 11 && b !== 12 && b !== 26) control++;
  }
  if (control > 8 && control > (end - pos) / 100) {
    throw new LasParseError('binary', `The file is binary (${control} control bytes in its first ${end - pos} bytes), not a LAS text file.`);
  }
}

class Reader {
  readonly log: DiagnosticLog;
  readonly sections: LasSections = { version: [], well: [], curves: [], parameters: [], other: '', extra: [] };
  version: LasFile['version'] = '2.0';
  versionSeen = false;
  wrapped = false;
  delimiter: LasFile['delimiter'] = 'space';
  encoding: LasFile['encoding'] = 'utf-8';
  curvesSeen = false;
  /** Set once the data section is read: curve definitions are then final. */
  dataRead = false;
  curvesLine: number | null = null;
  private readonly otherLines: string[] = [];

  constructor(
    readonly bytes: Uint8Array,
    readonly options: ReadLasOptions,
  ) {
    this.log = new DiagnosticLog(options.maxDiagnosticsPerKind ?? 20);
  }

  decode(start: number, end: number, line: number): string {
    const sub = this.bytes.subarray(start, end);
    const text = decodeUtf8Strict(sub);
    if (text !== null) return text;
    if (this.encoding === 'utf-8') {
      this.encoding = 'latin-1';
      this.log.add('info', line, `line ${line}: text is not valid UTF-8; the file is read as Latin-1`);
    }
    return decodeLatin1(sub);
  }

  interpret(ranges: Range[]): void {
    const ordered = [...ranges.filter((r) => r.kind === 'version'), ...ranges.filter((r) => r.kind !== 'version')];
    for (const r of ordered) {
      const lines = splitLines(this.decode(r.start, r.end, r.headerLine + 1));
      if (lines.length > 0 && lines[lines.length - 1] === '' && r.end > r.start) lines.pop();
      const first = r.headerLine + 1;
      if (r.kind === 'other') {
        for (const l of lines) if (!l.trim().startsWith('#')) this.otherLines.push(l.trimEnd());
        continue;
      }
      if (r.kind === 'extra') {
        this.sections.extra.push({ name: r.title.trim(), line: r.headerLine, lines: lines.map((l) => l.trimEnd()) });
        continue;
      }
      if (r.kind === 'curves' && this.dataRead) {
        this.log.add('warning', r.headerLine, `line ${r.headerLine}: a ~Curve section after the data is ignored (kept as text)`);
        this.sections.extra.push({ name: r.title.trim(), line: r.headerLine, lines: lines.map((l) => l.trimEnd()) });
        continue;
      }
      if (r.kind === 'curves') {
        this.curvesSeen = true;
        this.curvesLine ??= r.headerLine;
      }
      const items = this.items(lines, first, r.kind);
      if (r.kind === 'version') this.readVersion(items, r.headerLine);
      else if (r.kind === 'well') this.sections.well.push(...this.readWell(items));
      else if (r.kind === 'curves') this.sections.curves.push(...items);
      else if (r.kind === 'parameters') this.sections.parameters.push(...items);
    }
  }

  private items(lines: string[], firstLine: number, kind: SectionKind): LasHeaderItem[] {
    const out: LasHeaderItem[] = [];
    lines.forEach((raw, k) => {
      const text = raw.trim();
      if (text === '' || text.startsWith('#')) return;
      const line = firstLine + k;
      const p = parseHeaderLine(text, this.version === '3.0');
      if (p.problem) this.log.add('warning', line, `line ${line}: ${p.problem} in ~${kind} line "${text.slice(0, 40)}"`, 'header line format');
      const item: LasHeaderItem = { mnemonic: p.mnemonic, unit: p.unit, value: p.value, description: p.description, line };
      if (p.format !== undefined) item.format = p.format;
      if (p.association !== undefined) item.association = p.association;
      out.push(item);
    });
    return out;
  }

  private readVersion(items: LasHeaderItem[], headerLine: number): void {
    this.versionSeen = true;
    this.sections.version.push(...items);
    const get = (m: string) => items.find((i) => i.mnemonic.toUpperCase() === m);
    const vers = get('VERS');
    const v = vers ? parseNumberText(vers.value) : Number.NaN;
    if (v === 1.2) this.version = '1.2';
    else if (v === 2) this.version = '2.0';
    else if (v === 3) this.version = '3.0';
    else {
      this.log.add('warning', vers?.line ?? headerLine, vers ? `line ${vers.line}: VERS "${vers.value}" is not 1.2, 2.0 or 3.0; read as LAS 2.0` : `no VERS in ~Version (line ${headerLine}); read as LAS 2.0`);
    }
    const wrap = get('WRAP');
    const w = wrap?.value.toUpperCase();
    if (w === 'YES') this.wrapped = true;
    else if (w !== 'NO') {
      this.log.add('warning', wrap?.line ?? headerLine, wrap ? `line ${wrap.line}: WRAP "${wrap.value}" is not YES or NO; read as NO` : `no WRAP in ~Version (line ${headerLine}); read as NO`);
    }
    if (this.wrapped && this.version === '3.0') this.log.add('warning', wrap?.line ?? null, 'WRAP YES is not allowed in LAS 3.0; reading wrapped anyway');
    const dlm = get('DLM');
    if (dlm) {
      const d = dlm.value.toUpperCase();
      if (d === 'COMMA') this.delimiter = 'comma';
      else if (d === 'TAB') this.delimiter = 'tab';
      else if (d !== 'SPACE' && d !== '') this.log.add('warning', dlm.line, `line ${dlm.line}: DLM "${dlm.value}" is not SPACE, COMMA or TAB; read as SPACE`);
    }
  }

  private readWell(items: LasHeaderItem[]): LasHeaderItem[] {
    if (this.version !== '1.2') return items;
    let swapped = false;
    const out = items.map((it) => {
      if (WELL_NUMERIC.has(it.mnemonic.toUpperCase()) || it.description === '') return it;
      swapped = true;
      return { ...it, value: it.description, description: it.value };
    });
    if (swapped) this.log.add('info', null, 'LAS 1.2: ~Well values were read from after the colon (the LAS 1.2 layout)');
    return out;
  }

  wellNumber(mnemonic: string): { value: number | null; unit: string } {
    const it = this.sections.well.find((i) => i.mnemonic.toUpperCase() === mnemonic);
    if (!it) return { value: null, unit: '' };
    const v = parseNumberText(it.value);
    if (!Number.isFinite(v)) {
      this.log.add('warning', it.line, `line ${it.line}: ${mnemonic} "${it.value}" is not a number`, 'header number');
      return { value: null, unit: it.unit };
    }
    return { value: v, unit: it.unit };
  }

  nullValue(): number {
    const nv = this.wellNumber('NULL').value;
    if (nv === null) {
      this.log.add('warning', null, `no usable NULL in ~Well; ${DEFAULT_LAS_NULL} is read as null`);
      return DEFAULT_LAS_NULL;
    }
    return nv;
  }

  scan(start: number, startLine: number, nullValue: number, headerLine: number): DataScanResult & { wrapped: boolean; log: DiagnosticLog } {
    const nc = this.sections.curves.length;
    if (nc === 0) {
      throw this.curvesSeen
        ? new LasParseError('no_curves', `The ~Curve section (line ${this.curvesLine}) defines no curves; list one line per data column.`, this.curvesLine)
        : new LasParseError('no_curves', `There is no ~Curve section before the data (line ${headerLine}); a LAS file names its data columns in ~Curve.`, headerLine);
    }
    const aliases = (this.options.nullAliases ?? DEFAULT_NULL_ALIASES).filter((a) => a !== nullValue);
    const per = this.options.maxDiagnosticsPerKind ?? 20;
    const run = (wrapped: boolean) => {
      const log = new DiagnosticLog(per);
      const params = { nCurves: nc, nullValue, nullAliases: aliases, wrapped, delimiter: this.delimiter, startLine, log };
      const fast = !wrapped && this.delimiter !== 'comma' && aliases.length <= 3;
      const r = fast ? scanDataFast(this.bytes, start, params) : scanDataGeneral(this.bytes, start, params);
      return { ...r, wrapped, log };
    };
    this.dataRead = true;
    let r = run(this.wrapped);
    const bad = (x: DataScanResult) => x.rows > 0 && x.mismatchedRows * 2 > x.rows;
    if (bad(r) && !this.wrapped && nc > 1) {
      const w = run(true);
      if (w.rows > 0 && w.mismatchedRows === 0) {
        this.log.add('warning', headerLine, `WRAP is NO but the data is wrapped (one row over several lines); read as wrapped`);
        r = w;
      }
    }
    if (bad(r)) {
      const f = r.firstMismatch;
      throw new LasParseError(
        'curve_count_mismatch',
        `~Curve defines ${nc} curves but ${r.mismatchedRows} of ${r.rows} data rows have another number of values` +
          (f ? ` (first: line ${f.line} has ${f.values})` : '') +
          '; make ~Curve list exactly one line per data column.',
        f ? f.line : headerLine,
      );
    }
    return r;
  }

  finishOther(): void {
    while (this.otherLines.length && this.otherLines[0].trim() === '') this.otherLines.shift();
    while (this.otherLines.length && this.otherLines[this.otherLines.length - 1].trim() === '') this.otherLines.pop();
    this.sections.other = this.otherLines.join('\n');
  }
}

function uniqueMnemonics(items: LasHeaderItem[], log: DiagnosticLog): string[] {
  const seen = new Set<string>();
  return items.map((it, k) => {
    let base = it.mnemonic;
    if (base === '') {
      base = `CURVE_${k + 1}`;
      log.add('warning', it.line, `line ${it.line}: curve without a mnemonic named ${base}`);
    }
    let name = base;
    for (let s = 2; seen.has(name.toUpperCase()); s++) name = `${base}_${s}`;
    if (name !== base) log.add('warning', it.line, `line ${it.line}: curve ${base} is defined twice; the second is named ${name}`);
    seen.add(name.toUpperCase());
    return name;
  });
}

/**
 * Reads a LAS file (CWLS Log ASCII Standard 1.2, 2.0 or 3.0) into header records and one
 * Float64Array per curve (NaN for null), with diagnostics for everything read past.
 *
 * Lines follow `MNEM.UNIT  VALUE : DESCRIPTION` (first period, first space after the unit,
 * last colon); LAS 1.2 ~Well values after the colon are swapped back. Data: WRAP YES or NO,
 * DLM SPACE/COMMA/TAB (3.0); the header NULL and `options.nullAliases` become NaN.
 * Accepts CRLF/CR/LF, a UTF-8 BOM, Latin-1 bytes, tabs, comments, blank lines and lower-case
 * section letters.
 *
 * @param input the file's bytes (or its text)
 * @param options `maxBytes` size limit; `nullAliases` (default [-999.25, -9999]);
 *   `maxDiagnosticsPerKind` (default 20)
 * @throws LasParseError kind 'empty' | 'too_large' | 'binary' | 'not_las' |
 *   'no_data_section' | 'no_curves' | 'no_data_rows' | 'curve_count_mismatch'
 * @throws TypeError when input is neither a Uint8Array nor a string
 * @example
 * const las = readLas(bytes, { maxBytes: 200e6 });
 * las.curves[1].mnemonic; // 'GR'
 * las.curves[1].values;   // Float64Array, NaN where the file had NULL
 */
export function readLas(input: Uint8Array | string, options: ReadLasOptions = {}): LasFile {
  if (options.maxBytes !== undefined && !(options.maxBytes >= 0)) throw new RangeError('readLas: options.maxBytes must be >= 0');
  const bytes = bytesOf(input, options.maxBytes);
  const n = bytes.length;
  const bom = n >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
  checkNotEmptyOrBinary(bytes, bom);
  const rd = new Reader(bytes, options);

  const first = findNextSection(bytes, bom, 1);
  if (first.at >= n) {
    throw new LasParseError('not_las', 'No LAS section found: a LAS file starts with a ~Version (~V) section line.', null);
  }
  if (first.at > bom) {
    const pre = splitLines(rd.decode(bom, first.at, 1));
    pre.forEach((l, k) => {
      const t = l.trim();
      if (t !== '' && !t.startsWith('#')) rd.log.add('warning', k + 1, `line ${k + 1}: text before the first section ignored`, 'text before the first section');
    });
  }

  let pos = first.at;
  let line = first.line;
  const pending: Range[] = [];
  let data: ReturnType<Reader['scan']> | null = null;
  let dataHeaderLine = 0;
  let deferred: { start: number; line: number; headerLine: number } | null = null;
  let nullValue = DEFAULT_LAS_NULL;
  while (pos < n) {
    const e = lineEnd(bytes, pos);
    const title = rd.decode(pos, e, line).trim().slice(1);
    const kind = sectionKind(title);
    const bodyStart = afterLineEnd(bytes, e);
    const bodyLine = line + 1;
    if (kind === 'data') {
      if (data || deferred) {
        rd.log.add('warning', line, `line ${line}: a second data section ("~${title.slice(0, 30)}") ignored`);
      } else if (rd.curvesSeen || pending.some((r) => r.kind === 'curves')) {
        rd.interpret(pending.splice(0));
        nullValue = rd.nullValue();
        dataHeaderLine = line;
        data = rd.scan(bodyStart, bodyLine, nullValue, line);
        pos = data.end;
        line = data.endLine;
        continue;
      } else {
        deferred = { start: bodyStart, line: bodyLine, headerLine: line };
      }
    }
    const next = findNextSection(bytes, bodyStart, bodyLine);
    if (kind !== 'data') pending.push({ kind, title, headerLine: line, start: bodyStart, end: next.at });
    pos = next.at;
    line = next.line;
  }
  rd.interpret(pending);
  rd.finishOther();
  if (!data && deferred) {
    if (rd.curvesSeen) rd.log.add('warning', deferred.headerLine, `line ${deferred.headerLine}: the data section comes before ~Curve; LAS puts ~A last`);
    nullValue = rd.nullValue();
    dataHeaderLine = deferred.headerLine;
    data = rd.scan(deferred.start, deferred.line, nullValue, deferred.headerLine);
  }
  if (!data) {
    throw new LasParseError('no_data_section', 'There is no data section (~A or ~Log_Data): the file holds a header only.', null);
  }
  if (!rd.versionSeen) rd.log.add('warning', null, 'no ~Version section; read as LAS 2.0, WRAP NO');
  if (data.rows === 0) {
    throw new LasParseError('no_data_rows', `The data section (line ${dataHeaderLine}) holds no rows of numbers.`, dataHeaderLine);
  }

  const names = uniqueMnemonics(rd.sections.curves, rd.log);
  const columns = data.columns;
  const curves: LasCurve[] = rd.sections.curves.map((it, k) => ({
    mnemonic: names[k],
    originalMnemonic: it.mnemonic,
    unit: it.unit,
    apiCode: it.value,
    description: it.description,
    line: it.line,
    values: columns[k],
  }));
  if (data.aliasNulls > 0) {
    const aliases = (options.nullAliases ?? DEFAULT_NULL_ALIASES).filter((a) => a !== nullValue);
    rd.log.add('info', null, `${data.aliasNulls} values spelled ${aliases.join(' or ')} were read as null (the header NULL is ${nullValue})`);
  }
  const strt = rd.wellNumber('STRT');
  const declared = { start: strt.value, stop: rd.wellNumber('STOP').value, step: rd.wellNumber('STEP').value };
  const indexLog = new DiagnosticLog(options.maxDiagnosticsPerKind ?? 20);
  const index = indexInfo({ mnemonic: curves[0].mnemonic, unit: curves[0].unit, strtUnit: strt.unit, values: curves[0].values, declared }, indexLog);
  const diagnostics = [...rd.log.finish(), ...data.log.finish(), ...indexLog.finish()];
  return {
    version: rd.version,
    wrapped: data.wrapped,
    delimiter: rd.delimiter,
    sections: rd.sections,
    curves,
    rowCount: data.rows,
    index,
    nullValue,
    encoding: rd.encoding,
    diagnostics,
  };
}
