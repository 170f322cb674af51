/**
 * Fast reader of the ~A section (rules: data-section.ts): unwrapped, space or tab delimited
 * data, parsed from the bytes in place; a line holding anything but plain decimals is read
 * again by the general token rules.
 */
import { decodeLatin1 } from './text.js';
import { parseNumberText, POW10 } from './number.js';
import type { DiagnosticLog } from './errors.js';
import {
  type DataScanParams,
  type DataScanResult,
  TOPIC_LONG, TOPIC_RANGE, TOPIC_SHORT, TOPIC_TEXT, TOPIC_TOKEN,
  allocate, grow, mismatchMessage, notANumber, preview, trim,
} from './data-section.js';

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

/** The header's NULL and up to three aliases (missing ones repeat NULL), and the range they span. */
interface NullSet {
  value: number;
  a0: number;
  a1: number;
  a2: number;
  min: number;
  max: number;
}

function nullSet(p: DataScanParams): NullSet {
  const value = p.nullValue;
  const a = p.nullAliases;
  const a0 = a.length > 0 ? a[0] : value;
  const a1 = a.length > 1 ? a[1] : value;
  const a2 = a.length > 2 ? a[2] : value;
  return { value, a0, a1, a2, min: Math.min(value, a0, a1, a2), max: Math.max(value, a0, a1, a2) };
}

/** Offset just after the last line end (LF or CR) at or after `start`; `start` when there is none. */
function afterLastLineEnd(bytes: Uint8Array, start: number): number {
  for (let k = bytes.length - 1; k >= start; k--) {
    const c = bytes[k];
    if (c === 10 || c === 13) return k + 1;
  }
  return start;
}

/**
 * Fast reader: unwrapped, space or tab delimited, at most three null aliases.
 * Reads bytes directly; strings are made only for odd tokens. Columns start small and are
 * sized from the bytes per row seen so far, so no pass over the file is needed to count lines.
 * The byte loop runs up to the last line end, so every scan in it stops at a line end
 * without bounds checks; a last line without one is read from a copy ending in LF (the same
 * rules; that line end is not counted).
 */
export function scanDataFast(bytes: Uint8Array, start: number, p: DataScanParams): DataScanResult {
  if (p.nullAliases.length > 3) throw new RangeError('scanDataFast: at most 3 null aliases');
  const n = bytes.length;
  const st: FastState = { i: start, line: p.startLine, row: 0, cap: 64, done: false, mismatched: 0, firstMismatch: null, aliasNulls: 0 };
  const cols = allocate(p.nCurves, st.cap);
  const nulls = nullSet(p);
  // A plain Uint8Array (a Node Buffer is another type) keeps the loop's loads monomorphic.
  const body = new Uint8Array(bytes.buffer, bytes.byteOffset, n);
  const lim = afterLastLineEnd(body, start);
  fill(body, lim, start, cols, st, p, nulls);
  let end = st.i;
  if (st.i === lim && lim < n) {
    const tail = new Uint8Array(n - lim + 1);
    tail.set(body.subarray(lim));
    tail[n - lim] = 10;
    st.i = 0;
    fill(tail, tail.length, 0, cols, st, p, nulls);
    if (st.i === tail.length) {
      end = n;
      st.line--;
    } else {
      end = lim + st.i;
    }
  }
  return {
    columns: trim(cols, st.row),
    rows: st.row,
    end,
    endLine: st.line,
    mismatchedRows: st.mismatched,
    firstMismatch: st.firstMismatch,
    aliasNulls: st.aliasNulls,
  };
}

/** Runs {@link fastLoop} up to `lim` (just after a line end), growing the columns whenever they are full. */
function fill(bytes: Uint8Array, lim: number, start: number, cols: Float64Array[], st: FastState, p: DataScanParams, nulls: NullSet): void {
  for (;;) {
    fastLoop(bytes, lim, cols, st, p, nulls);
    if (st.done) return;
    // Columns full: size them for the rest of the section at the bytes per row seen so far.
    const perRow = Math.max(1, (st.i - start) / Math.max(1, st.row));
    const more = Math.ceil(((lim - st.i) / perRow) * 1.02) + 16;
    st.cap = st.row + Math.max(more, st.row >> 1);
    grow(cols, st.cap);
  }
}

const BLOCK = 128;

/**
 * `v`, or NaN when it is the header's NULL or one of the aliases (an alias is counted in
 * `st.aliasNulls`).
 */
function unNull(v: number, nulls: NullSet, st: FastState): number {
  if (v >= nulls.min && v <= nulls.max) {
    if (v === nulls.value) return Number.NaN;
    if (v === nulls.a0 || v === nulls.a1 || v === nulls.a2) {
      st.aliasNulls++;
      return Number.NaN;
    }
  }
  return v;
}

/** Copies the first `rows` rows of a block (column k at k * BLOCK) into the columns from row `row0`. */
function flush(blk: Float64Array, cols: Float64Array[], row0: number, rows: number): void {
  for (let k = 0; k < cols.length; k++) cols[k].set(blk.subarray(k * BLOCK, k * BLOCK + rows), row0);
}

/**
 * The byte loop of {@link scanDataFast}, over the lines up to `lim` (just after a line end);
 * returns at the section's end or when the columns are full. Rows go to a small block
 * (column k at k * BLOCK, L1-sized) copied to the columns every BLOCK rows. A line is read
 * by {@link plainLine}, or when that declines, by {@link generalLine}.
 */
function fastLoop(bytes: Uint8Array, lim: number, cols: Float64Array[], st: FastState, p: DataScanParams, nulls: NullSet): void {
  const nc = p.nCurves;
  const cap = st.cap;
  const tok: TokenEnd = { end: 0, bad: null };
  const blk = new Float64Array(BLOCK * nc);
  let br = 0;
  let row0 = st.row;
  let row = st.row;
  let i = st.i;
  let line = st.line;
  let done = true;
  while (i < lim) {
    const ls = i;
    let c = bytes[i];
    while (c === 32 || c === 9) c = bytes[++i];
    if (c === 10) {
      i++;
      line++;
      continue;
    }
    if (c === 13) {
      i++;
      if (i < lim && bytes[i] === 10) i++;
      line++;
      continue;
    }
    if (c === 126 /* ~ */) {
      i = ls;
      break;
    }
    if (c === 35 /* # */) {
      while ((c = bytes[i]) !== 10 && c !== 13) i++;
      continue;
    }
    if (row >= cap) {
      i = ls;
      done = false;
      break;
    }
    const e = plainLine(bytes, i, blk, br, nc, nulls, st);
    if (e >= 0) {
      i = e;
    } else {
      const isRow = generalLine(bytes, i, line, blk, br, st, p, nulls, tok);
      i = tok.end;
      if (!isRow) continue;
    }
    row++;
    if (++br === BLOCK) {
      flush(blk, cols, row0, br);
      row0 = row;
      br = 0;
    }
  }
  if (br > 0) flush(blk, cols, row0, br);
  st.i = i;
  st.line = line;
  st.row = row;
  st.done = done;
}

/**
 * Reads a line of exactly `nc` plain decimals from `i` (its first token) into block row `r`,
 * nulls read as NaN; returns the offset of the line end, or -1 when the line holds anything
 * else (nothing is counted then; the caller reads the line by the general rules). Plain:
 * `[-]digits[.digits]` or `[-].digits` with 1 to 15 digits, optionally `e`/`E[+-]digits`,
 * a power of ten within 10^±22 in all, ended by a blank or a line end. Such a mantissa is
 * below 10^15, so exact, and times or over an exact power of ten it gives the same double as
 * Clinger's fast path in {@link generalToken}.
 */
function plainLine(bytes: Uint8Array, i: number, blk: Float64Array, r: number, nc: number, nulls: NullSet, st: FastState): number {
  // Integer parameters made int32 up front, so that the optimizing compiler keeps the
  // indices derived from them untagged.
  i |= 0;
  r |= 0;
  nc |= 0;
  const pow10 = POW10;
  const min = nulls.min;
  const max = nulls.max;
  let aliases = 0;
  let c = bytes[i];
  for (let col = 0, o = r; col < nc; col++, o += BLOCK) {
    let j = i;
    const neg = c === 45;
    if (neg) c = bytes[++j];
    const ds = j;
    let m = 0;
    let d = c - 48;
    while (d >>> 0 < 10) {
      m = m * 10 + d;
      d = (c = bytes[++j]) - 48;
    }
    let nd = j - ds;
    let fd = 0;
    if (c === 46) {
      const fs = ++j;
      // Four, then two, digits at once when they are there (4 and 6 decimals are the usual
      // LAS formats): loads in straight-line code share their checks, unlike those of a loop.
      const n = bytes.length;
      if (j + 3 < n) {
        const d0 = bytes[j] - 48;
        const d1 = bytes[j + 1] - 48;
        const d2 = bytes[j + 2] - 48;
        const d3 = bytes[j + 3] - 48;
        if (d0 >>> 0 < 10 && d1 >>> 0 < 10 && d2 >>> 0 < 10 && d3 >>> 0 < 10) {
          m = m * 10000 + (d0 * 1000 + d1 * 100 + d2 * 10 + d3);
          j += 4;
          if (j + 1 < n) {
            const e0 = bytes[j] - 48;
            const e1 = bytes[j + 1] - 48;
            if (e0 >>> 0 < 10 && e1 >>> 0 < 10) {
              m = m * 100 + (e0 * 10 + e1);
              j += 2;
            }
          }
        }
      }
      d = (c = bytes[j]) - 48;
      while (d >>> 0 < 10) {
        m = m * 10 + d;
        d = (c = bytes[++j]) - 48;
      }
      fd = j - fs;
      nd += fd;
    }
    let v: number;
    if (c === 32 || c === 9 || c === 10 || c === 13) {
      if (nd === 0 || nd > 15) return -1;
      v = m;
      if (fd > 0) v /= pow10[fd];
    } else {
      // An exponent, or a token of another shape.
      if ((c !== 101 && c !== 69) || nd === 0 || nd > 15) return -1;
      c = bytes[++j];
      const eneg = c === 45;
      if (eneg || c === 43) c = bytes[++j];
      const es = j;
      let e = 0;
      d = c - 48;
      while (d >>> 0 < 10) {
        if (e < 100000) e = e * 10 + d;
        d = (c = bytes[++j]) - 48;
      }
      const exp = (eneg ? -e : e) - fd;
      if (j === es || exp < -22 || exp > 22 || (c !== 32 && c !== 9 && c !== 10 && c !== 13)) return -1;
      v = m;
      if (exp < 0) v /= pow10[-exp];
      else if (exp > 0) v *= pow10[exp];
    }
    if (neg) v = -v;
    if (v >= min && v <= max) {
      if (v === nulls.value) v = Number.NaN;
      else if (v === nulls.a0 || v === nulls.a1 || v === nulls.a2) {
        v = Number.NaN;
        aliases++;
      }
    }
    blk[o] = v;
    i = j;
    while (c === 32 || c === 9) c = bytes[++i];
    if (c === 10 || c === 13) {
      if (col !== nc - 1) return -1;
      st.aliasNulls += aliases;
      return i;
    }
  }
  return -1;
}

/** What {@link generalToken} read: where the token ends, and its text when it is not a number. */
interface TokenEnd {
  end: number;
  bad: string | null;
}

/**
 * Reads one token from `ts` by the general rules: sign, digits, point, exponent through
 * Clinger's fast path (an exact mantissa <= 2^53 and an exact power of ten, |exp| <= 22),
 * anything else through its text with {@link parseNumberText}. Returns the value (NaN when
 * not a number, then `out.bad` holds the text; NaN with a warning when beyond the double
 * range); `out.end` is the offset after the token.
 */
function generalToken(bytes: Uint8Array, ts: number, line: number, log: DiagnosticLog, out: TokenEnd): number {
  const n = bytes.length;
  let i = ts;
  let c = bytes[i];
  let v = 0;
  let neg = false;
  if (c === 45) {
    neg = true;
    c = ++i < n ? bytes[i] : -1;
  } else if (c === 43) {
    c = ++i < n ? bytes[i] : -1;
  }
  let mant = 0;
  let exp = 0;
  const ds = i;
  while (c >= 48 && c <= 57) {
    mant = mant * 10 + (c - 48);
    c = ++i < n ? bytes[i] : -1;
  }
  let nd = i - ds;
  if (c === 46) {
    const fs = ++i;
    c = i < n ? bytes[i] : -1;
    while (c >= 48 && c <= 57) {
      mant = mant * 10 + (c - 48);
      c = ++i < n ? bytes[i] : -1;
    }
    exp = fs - i;
    nd -= exp;
  }
  let any = nd > 0;
  if (any && (c === 101 || c === 69)) {
    c = ++i < n ? bytes[i] : -1;
    let eneg = false;
    if (c === 45) {
      eneg = true;
      c = ++i < n ? bytes[i] : -1;
    } else if (c === 43) {
      c = ++i < n ? bytes[i] : -1;
    }
    let e = 0;
    const es = i;
    while (c >= 48 && c <= 57) {
      if (e < 100000) e = e * 10 + (c - 48);
      c = ++i < n ? bytes[i] : -1;
    }
    if (i === es) any = false;
    exp += eneg ? -e : e;
  }
  out.bad = null;
  if (any && (c === 32 || c === 9 || c === 10 || c === 13 || i >= n) && mant <= 9007199254740992 && exp >= -22 && exp <= 22) {
    v = exp < 0 ? mant / POW10[-exp] : exp > 0 ? mant * POW10[exp] : mant;
    if (neg) v = -v;
  } else {
    while (i < n && (c = bytes[i]) !== 32 && c !== 9 && c !== 10 && c !== 13) i++;
    const text = decodeLatin1(bytes.subarray(ts, i));
    v = parseNumberText(text);
    if (v !== v) {
      out.bad = text;
    } else if (v === Infinity || v === -Infinity) {
      log.add('warning', line, `line ${line}: ${preview(text)} is beyond the range of numbers; read as null`, TOPIC_RANGE);
      v = Number.NaN;
    }
  }
  out.end = i;
  return v;
}

/**
 * Reads the line from `i` (its first token) by the general token rules into block row `r`,
 * nulls read as NaN, with its diagnostics: tokens that are not numbers, a line holding no
 * number (text, no row), a row with too few values (NaN at its end) or too many (extras
 * dropped; their aliases still counted, as in {@link scanDataGeneral}). Sets `out.end` to the
 * offset of the line end; returns whether the line is a row.
 */
function generalLine(bytes: Uint8Array, i: number, line: number, blk: Float64Array, r: number, st: FastState, p: DataScanParams, nulls: NullSet, out: TokenEnd): boolean {
  const nc = p.nCurves;
  const log = p.log;
  const first = i;
  let col = 0;
  let numeric = 0;
  let badTokens: string[] | null = null;
  for (;;) {
    const v = generalToken(bytes, i, line, log, out);
    if (out.bad !== null) (badTokens ??= []).push(out.bad);
    else numeric++;
    const kept = unNull(v, nulls, st);
    if (col < nc) blk[col * BLOCK + r] = kept;
    col++;
    i = out.end;
    let c = bytes[i];
    while (c === 32 || c === 9) c = bytes[++i];
    if (c === 10 || c === 13) break;
  }
  out.end = i;
  if (numeric === 0) {
    log.add('warning', line, `line ${line}: text in the data section ignored: "${preview(decodeLatin1(bytes.subarray(first, i)).trim())}"`, TOPIC_TEXT);
    return false;
  }
  if (badTokens) for (const t of badTokens) log.add('warning', line, notANumber(line, t), TOPIC_TOKEN);
  if (col !== nc) {
    st.mismatched++;
    st.firstMismatch ??= { line, values: col };
    log.add('error', line, mismatchMessage(line, col, nc), col < nc ? TOPIC_SHORT : TOPIC_LONG);
    for (let k = col; k < nc; k++) blk[k * BLOCK + r] = Number.NaN;
  }
  return true;
}
