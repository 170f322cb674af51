/**
 * General reader of the ~A section (rules: data-section.ts): line by line through strings,
 * for wrapped data, comma delimiters and quoted tokens.
 */
import { decodeLatin1 } from './text.js';
import { parseNumberText } from './number.js';
import {
  type DataScanParams,
  type DataScanResult,
  TOPIC_EMPTY, TOPIC_LONG, TOPIC_RANGE, TOPIC_SHORT, TOPIC_TEXT, TOPIC_TOKEN,
  allocate, grow, mismatchMessage, notANumber, preview, trim,
} from './data-section.js';

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
