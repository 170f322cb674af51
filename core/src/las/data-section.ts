/**
 * The ~A (LAS 3.0: ~Log_Data) section: rows of numbers into one Float64Array per curve.
 *
 * Two readers share the rules below. `scanDataFast` walks the bytes once, unwrapped and
 * space/tab delimited (the common case), parsing numbers in place. `scanDataGeneral` reads
 * line by line through strings and also handles WRAP YES, comma delimiters and quoted
 * tokens. Rules, both readers:
 * - blank lines and lines starting with '#' are skipped; a line starting with '~' ends the
 *   section;
 * - the header's NULL and each null alias become NaN; a token that is not a number becomes
 *   NaN with a warning; a number beyond the double range becomes NaN with a warning;
 * - a line holding no number at all is text, ignored with a warning (text after the data);
 * - a row with too few values gets NaN at its end, one with too many loses the extras, each
 *   with an error naming the line (columns are never shifted silently).
 */
import { decodeLatin1 } from './text.js';
import { parseNumberText, POW10 } from './number.js';
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

const TOPIC_TOKEN = 'value that is not a number';
const TOPIC_RANGE = 'number beyond the double range';
const TOPIC_TEXT = 'text in the data section';
const TOPIC_SHORT = 'row with too few values';
const TOPIC_LONG = 'row with too many values';
const TOPIC_EMPTY = 'empty field';

function notANumber(line: number, token: string): string {
  return `line ${line}: "${preview(token)}" is not a number; read as null`;
}

function preview(text: string): string {
  return text.length > 24 ? `${text.slice(0, 24)}...` : text;
}

/** Upper bound of the number of lines from `start`: max(LF count, CR count) + 1. */
function estimateLines(bytes: Uint8Array, start: number): number {
  let lf = 0;
  for (let p = bytes.indexOf(10, start); p !== -1; p = bytes.indexOf(10, p + 1)) lf++;
  let cr = 0;
  if (bytes.indexOf(13, start) !== -1) {
    for (let p = bytes.indexOf(13, start); p !== -1; p = bytes.indexOf(13, p + 1)) cr++;
  }
  return Math.max(lf, cr) + 1;
}

function allocate(nCurves: number, capacity: number): Float64Array[] {
  const cols: Float64Array[] = [];
  for (let c = 0; c < nCurves; c++) cols.push(new Float64Array(capacity));
  return cols;
}

function grow(cols: Float64Array[], capacity: number): void {
  for (let c = 0; c < cols.length; c++) {
    const next = new Float64Array(capacity);
    next.set(cols[c]);
    cols[c] = next;
  }
}

/** Trims columns to `rows`: a view when little is wasted, else a copy that frees the rest. */
function trim(cols: Float64Array[], rows: number): Float64Array[] {
  return cols.map((c) => (c.length === rows ? c : c.length - rows <= c.length / 8 ? c.subarray(0, rows) : c.slice(0, rows)));
}

function mismatchMessage(line: number, got: number, expected: number): string {
  return got < expected
    ? `line ${line}: ${got} values where ${expected} curves are defined; the missing values at the end of the row were read as null`
    : `line ${line}: ${got} values where ${expected} curves are defined; the ${got - expected} extra values at the end of the row were ignored`;
}

/** Resumable state of the fast reader (the loop stops when the columns are full). */
interface FastState {
  i: number;
  line: number;
  row: number;
  cap: number;
  done: boolean;
  mismatched: number;
  firstMismatch: DataScanResult['firstMismatch'];
  aliasNulls: number;
}

/**
 * Fast reader: unwrapped, space or tab delimited, at most three null aliases.
 * Reads bytes directly; strings are made only for odd tokens. Columns start small and are
 * sized from the bytes per row seen so far, so no pass over the file is needed to count lines.
 */
export function scanDataFast(bytes: Uint8Array, start: number, p: DataScanParams): DataScanResult {
  if (p.nullAliases.length > 3) throw new RangeError('scanDataFast: at most 3 null aliases');
  const nc = p.nCurves;
  const st: FastState = { i: start, line: p.startLine, row: 0, cap: 64, done: false, mismatched: 0, firstMismatch: null, aliasNulls: 0 };
  const cols = allocate(nc, st.cap);
  for (;;) {
    fastLoop(bytes, cols, st, p);
    if (st.done) break;
    // Columns full: size them for the rest of the section at the bytes per row seen so far.
    const perRow = Math.max(1, (st.i - start) / st.row);
    const more = Math.ceil(((bytes.length - st.i) / perRow) * 1.02) + 16;
    st.cap = st.row + Math.max(more, st.row >> 1);
    grow(cols, st.cap);
  }
  return {
    columns: trim(cols, st.row),
    rows: st.row,
    end: st.i,
    endLine: st.line,
    mismatchedRows: st.mismatched,
    firstMismatch: st.firstMismatch,
    aliasNulls: st.aliasNulls,
  };
}

const BLOCK = 128;

/** Copies `rows` rows of a row-major block into the columns from row `row0`. */
function flush(blk: Float64Array, cols: Float64Array[], row0: number, rows: number): void {
  const nc = cols.length;
  for (let k = 0; k < nc; k++) {
    const col = cols[k];
    for (let r = 0, j = k; r < rows; r++, j += nc) col[row0 + r] = blk[j];
  }
}

/** The byte loop of {@link scanDataFast}; returns at the section's end or when the columns are full. */
function fastLoop(bytes: Uint8Array, cols: Float64Array[], st: FastState, p: DataScanParams): void {
  const n = bytes.length;
  const nc = p.nCurves;
  const log = p.log;
  const nullV = p.nullValue;
  const a0 = p.nullAliases.length > 0 ? p.nullAliases[0] : nullV;
  const a1 = p.nullAliases.length > 1 ? p.nullAliases[1] : nullV;
  const a2 = p.nullAliases.length > 2 ? p.nullAliases[2] : nullV;
  const nullMin = Math.min(nullV, a0, a1, a2);
  const nullMax = Math.max(nullV, a0, a1, a2);
  const cap = st.cap;
  // Rows go to a small row-major block (L1-sized) flushed to the columns every BLOCK rows:
  // one sequential write stream instead of one per curve.
  const blk = new Float64Array(BLOCK * nc);
  let br = 0;
  let base = 0;
  let row0 = st.row;
  let row = st.row;
  let i = st.i;
  let line = st.line;
  let c = 0;
  let ls = i;
  let done = true;
  while (i < n) {
    ls = i;
    c = bytes[i];
    while (c === 32 || c === 9) c = bytes[++i];
    if (c === 10) {
      i++;
      line++;
      continue;
    }
    if (c === 13) {
      i++;
      if (bytes[i] === 10) i++;
      line++;
      continue;
    }
    if (i >= n) break;
    if (c === 126 /* ~ */) {
      i = ls;
      break;
    }
    if (c === 35 /* # */) {
      while (i < n && (c = bytes[i]) !== 10 && c !== 13) i++;
      continue;
    }
    if (row >= cap) {
      i = ls;
      done = false;
      break;
    }
    let col = 0;
    let numeric = 0;
    let badTokens: string[] | null = null;
    for (;;) {
      const ts = i;
      let v = 0;
      let neg = false;
      if (c === 45) {
        neg = true;
        c = bytes[++i];
      } else if (c === 43) {
        c = bytes[++i];
      }
      let mant = 0;
      let exp = 0;
      const ds = i;
      while (c >= 48 && c <= 57) {
        mant = mant * 10 + (c - 48);
        c = bytes[++i];
      }
      let nd = i - ds;
      if (c === 46) {
        const fs = ++i;
        c = bytes[i];
        while (c >= 48 && c <= 57) {
          mant = mant * 10 + (c - 48);
          c = bytes[++i];
        }
        exp = fs - i;
        nd -= exp;
      }
      let any = nd > 0;
      if (any && (c === 101 || c === 69)) {
        c = bytes[++i];
        let eneg = false;
        if (c === 45) {
          eneg = true;
          c = bytes[++i];
        } else if (c === 43) {
          c = bytes[++i];
        }
        let e = 0;
        const es = i;
        while (c >= 48 && c <= 57) {
          if (e < 100000) e = e * 10 + (c - 48);
          c = bytes[++i];
        }
        if (i === es) any = false;
        exp += eneg ? -e : e;
      }
      // Clinger's fast path: an exact mantissa (<= 2^53) and an exact power of ten (|exp| <= 22).
      if (any && (c === 32 || c === 9 || c === 10 || c === 13 || i >= n) && mant <= 9007199254740992 && exp >= -22 && exp <= 22) {
        v = exp < 0 ? mant / POW10[-exp] : exp > 0 ? mant * POW10[exp] : mant;
        if (neg) v = -v;
        numeric++;
      } else {
        while (i < n && (c = bytes[i]) !== 32 && c !== 9 && c !== 10 && c !== 13) i++;
        c = bytes[i];
        const text = decodeLatin1(bytes.subarray(ts, i));
        v = parseNumberText(text);
        if (v !== v) {
          (badTokens ??= []).push(text);
        } else {
          numeric++;
          if (v === Infinity || v === -Infinity) {
            log.add('warning', line, `line ${line}: ${preview(text)} is beyond the range of numbers; read as null`, TOPIC_RANGE);
            v = Number.NaN;
          }
        }
      }
      if (v >= nullMin && v <= nullMax) {
        if (v === nullV) v = Number.NaN;
        else if (v === a0 || v === a1 || v === a2) {
          v = Number.NaN;
          st.aliasNulls++;
        }
      }
      if (col < nc) blk[base + col] = v;
      col++;
      while (c === 32 || c === 9) c = bytes[++i];
      if (c === 10 || c === 13 || i >= n) break;
    }
    if (numeric === 0) {
      log.add('warning', line, `line ${line}: text in the data section ignored: "${preview(decodeLatin1(bytes.subarray(ls, i)).trim())}"`, TOPIC_TEXT);
      continue;
    }
    if (badTokens) for (const t of badTokens) log.add('warning', line, notANumber(line, t), TOPIC_TOKEN);
    if (col !== nc) {
      st.mismatched++;
      st.firstMismatch ??= { line, values: col };
      log.add('error', line, mismatchMessage(line, col, nc), col < nc ? TOPIC_SHORT : TOPIC_LONG);
      for (let k = col; k < nc; k++) blk[base + k] = Number.NaN;
    }
    row++;
    if (++br === BLOCK) {
      flush(blk, cols, row0, br);
      row0 = row;
      br = 0;
    }
    base = br * nc;
  }
  if (br > 0) flush(blk, cols, row0, br);
  st.i = Math.min(i, n);
  st.line = line;
  st.row = row;
  st.done = done;
}

const SPACE_TOKENS = /"[^"]*"?|[^ \t]+/g;

function tokensOf(text: string, delimiter: DataScanParams['delimiter']): string[] {
  if (delimiter === 'comma') return text.split(',').map((t) => t.trim());
  return text.match(SPACE_TOKENS) ?? [];
}

/**
 * General reader: line by line through strings; WRAP YES or NO, space, tab or comma
 * delimited. In wrapped data each row starts with the index on its own line (LAS 2.0); a row
 * is complete when it has one value per curve. A line holding a lone value while a row still
 * misses two or more values, and close to the next index due (previous spacing, within half a
 * step), starts a new row (the short row is reported); values after a row's end on the same
 * line are ignored (reported).
 */
export function scanDataGeneral(bytes: Uint8Array, start: number, p: DataScanParams): DataScanResult {
  const n = bytes.length;
  const nc = p.nCurves;
  const log = p.log;
  const nulls = [p.nullValue];
  let cap = Math.max(16, p.wrapped ? 16 : estimateLines(bytes, start));
  const cols = allocate(nc, cap);
  let row = 0;
  let col = 0;
  let rowLine = 0;
  let rowsStartAlone = true;
  let i = start;
  let line = p.startLine;
  let mismatched = 0;
  let firstMismatch: DataScanResult['firstMismatch'] = null;
  let aliasNulls = 0;

  const endRow = (gotValues: number, atLine: number): void => {
    if (gotValues !== nc) {
      mismatched++;
      firstMismatch ??= { line: atLine, values: gotValues };
      log.add('error', atLine, mismatchMessage(atLine, gotValues, nc), gotValues < nc ? TOPIC_SHORT : TOPIC_LONG);
      for (let k = gotValues; k < nc; k++) cols[k][row] = Number.NaN;
    }
    row++;
    col = 0;
  };

  while (i < n) {
    let e = i;
    while (e < n && bytes[e] !== 10 && bytes[e] !== 13) e++;
    const text = decodeLatin1(bytes.subarray(i, e));
    const trimmed = text.trim();
    const next = e < n && bytes[e] === 13 && bytes[e + 1] === 10 ? e + 2 : e + 1;
    if (trimmed.startsWith('~')) break;
    if (trimmed === '' || trimmed.startsWith('#')) {
      i = next;
      line++;
      continue;
    }
    const tokens = tokensOf(trimmed, p.delimiter);
    const values: number[] = [];
    const badTokens: string[] = [];
    let empties = 0;
    let numeric = 0;
    for (const t of tokens) {
      let v: number;
      if (t === '') {
        empties++;
        v = Number.NaN;
      } else {
        v = parseNumberText(t);
        if (v !== v) {
          badTokens.push(t);
        } else {
          numeric++;
          if (!Number.isFinite(v)) {
            log.add('warning', line, `line ${line}: ${preview(t)} is beyond the range of numbers; read as null`, TOPIC_RANGE);
            v = Number.NaN;
          } else if (nulls.includes(v)) {
            v = Number.NaN;
          } else if (p.nullAliases.includes(v)) {
            v = Number.NaN;
            aliasNulls++;
          }
        }
      }
      values.push(v);
    }
    if (numeric === 0) {
      log.add('warning', line, `line ${line}: text in the data section ignored: "${preview(trimmed)}"`, TOPIC_TEXT);
      i = next;
      line++;
      continue;
    }
    for (const t of badTokens) log.add('warning', line, notANumber(line, t), TOPIC_TOKEN);
    if (empties > 0) log.add('warning', line, `line ${line}: ${empties} empty field${empties > 1 ? 's' : ''} read as null`, TOPIC_EMPTY);
    if (row + 1 >= cap) {
      cap *= 2;
      grow(cols, cap);
    }
    if (!p.wrapped) {
      for (let k = 0; k < values.length && k < nc; k++) cols[k][row] = values[k];
      endRow(values.length, line);
    } else {
      if (col > 0 && values.length === 1 && nc - col > 1 && rowsStartAlone && row > 0) {
        // A lone value where the next index is due starts a new row (the open row is short).
        const cur = cols[0][row];
        const stepNow = cur - cols[0][row - 1];
        if (stepNow !== 0 && Math.abs(values[0] - (cur + stepNow)) <= Math.abs(stepNow) / 2) endRow(col, rowLine);
      }
      if (col === 0) {
        rowLine = line;
        if (values.length !== 1 && nc > 1) rowsStartAlone = false;
      }
      let k = 0;
      for (; k < values.length && col < nc; k++) cols[col++][row] = values[k];
      if (k < values.length) {
        mismatched++;
        firstMismatch ??= { line, values: nc + values.length - k };
        log.add('error', line, `line ${line}: ${values.length - k} values after the end of the row that starts at line ${rowLine} were ignored`, TOPIC_LONG);
      }
      if (col === nc) endRow(nc, rowLine);
    }
    i = next;
    line++;
  }
  if (col > 0) endRow(col, rowLine);
  return { columns: trim(cols, row), rows: row, end: Math.min(i, n), endLine: line, mismatchedRows: mismatched, firstMismatch, aliasNulls };
}
