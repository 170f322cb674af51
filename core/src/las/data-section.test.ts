// The byte scanner's number fast path must give exactly what Number() gives for the same text
// (the independent reference: ECMAScript's own StringToNumber), and the fast and general
// scanners must agree on any unwrapped file.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DiagnosticLog } from './errors.js';
import type { DataScanParams } from './data-section.js';
import { scanDataFast } from './data-fast.js';
import { scanDataGeneral } from './data-general.js';
import { parseNumberText } from './number.js';

const enc = new TextEncoder();
const params = (nCurves: number, over: Partial<DataScanParams> = {}): DataScanParams => ({
  nCurves,
  nullValue: -999.25,
  nullAliases: [-9999],
  wrapped: false,
  delimiter: 'space',
  startLine: 1,
  log: new DiagnosticLog(),
  ...over,
});
const same = (a: number, b: number) => Object.is(a, b) || (Number.isNaN(a) && Number.isNaN(b));

const numberText = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((v) => String(v)),
  fc.tuple(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 12 })).map(([v, d]) => v.toFixed(d)),
  fc.tuple(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 17 })).map(([v, d]) => v.toExponential(d - 1)),
  fc.stringMatching(/^[+-]?\d{1,25}(\.\d{0,25})?([eE][+-]?\d{1,3})?$/),
);

describe('scanDataFast', () => {
  it('scanDataFast parses every decimal exactly as Number() does (property)', () => {
    fc.assert(
      fc.property(fc.array(numberText, { minLength: 1, maxLength: 30 }), (tokens) => {
        const text = tokens.map((t) => `1 ${t}`).join('\n');
        const r = scanDataFast(enc.encode(text), 0, params(2, { nullAliases: [] }));
        expect(r.rows).toBe(tokens.length);
        tokens.forEach((t, k) => {
          let want = Number(t);
          if (want === -999.25 || !Number.isFinite(want)) want = Number.NaN;
          expect(same(r.columns[1][k], want), `${t} -> ${r.columns[1][k]} vs ${want}`).toBe(true);
        });
      }),
      { numRuns: 300 },
    );
  });

  it('scanDataFast and scanDataGeneral agree on values, rows and diagnostics (property)', () => {
    const token = fc.oneof(numberText, fc.constantFrom('-999.25', '-9999', 'abc', '1.#IND', '-', '.', '1e999', '1.5D+02'));
    const line = fc.oneof(fc.array(token, { minLength: 1, maxLength: 5 }).map((t) => t.join(' \t ')), fc.constantFrom('', '# c', '  # indented', 'some text', ' \t~X section'));
    const eol = fc.constantFrom('\n', '\r\n', '\r');
    fc.assert(
      fc.property(fc.array(fc.tuple(line, eol), { minLength: 1, maxLength: 20 }), fc.integer({ min: 1, max: 4 }), (lines, nc) => {
        const bytes = enc.encode(lines.map(([l, e]) => l + e).join('') + '~O\nnext section');
        const pf = params(nc);
        const pg = params(nc);
        const f = scanDataFast(bytes, 0, pf);
        const g = scanDataGeneral(bytes, 0, pg);
        expect(f.rows).toBe(g.rows);
        expect(f.end).toBe(g.end);
        expect(f.endLine).toBe(g.endLine);
        expect(f.mismatchedRows).toBe(g.mismatchedRows);
        expect(f.aliasNulls).toBe(g.aliasNulls);
        for (let c = 0; c < nc; c++) for (let r = 0; r < f.rows; r++) expect(same(f.columns[c][r], g.columns[c][r])).toBe(true);
        const strip = (l: DiagnosticLog) => l.finish().map((d) => `${d.severity}@${d.line}`);
        expect(strip(pf.log)).toEqual(strip(pg.log));
      }),
      { numRuns: 300 },
    );
  });

  it('scanDataFast grows its columns when rows get longer mid-section and matches scanDataGeneral', () => {
    // 100 short rows then 5000 long ones: the first size estimate is far too small.
    const lines = [
      ...Array.from({ length: 100 }, (_, r) => `${r} 1 2`),
      ...Array.from({ length: 5000 }, (_, r) => `${100 + r}.000000001 ${(r * 1.000001).toFixed(9)} ${(-r / 7).toExponential(12)}`),
    ];
    const bytes = enc.encode(lines.join('\n'));
    const f = scanDataFast(bytes, 0, params(3));
    const g = scanDataGeneral(bytes, 0, params(3));
    expect(f.rows).toBe(5100);
    for (let c = 0; c < 3; c++) expect(Array.from(f.columns[c])).toEqual(Array.from(g.columns[c]));
    expect(f.columns[1][5099]).toBe(Number((4999 * 1.000001).toFixed(9)));
  });

  it('scanDataFast stops at a line starting with ~ and reports where', () => {
    const r = scanDataFast(enc.encode('1 2\n3 4\n  ~Other\ntext'), 0, params(2));
    expect(r.rows).toBe(2);
    expect(r.end).toBe(8);
    expect(r.endLine).toBe(3);
  });
});

// Rows of plain decimals take the fast scanner's line reader; anything else in a line sends
// the line to the general token rules. Both must give what Number() and scanDataGeneral give.
const digits = (max: number) => fc.stringMatching(new RegExp(`^\\d{0,${max}}$`));
const plainToken = fc
  .tuple(
    fc.constantFrom('', '', '-'),
    digits(20),
    fc.option(digits(20)),
    fc.option(fc.tuple(fc.constantFrom('e', 'E'), fc.constantFrom('', '+', '-'), fc.integer({ min: 0, max: 40 }))),
  )
  .filter(([, int, frac]) => int !== '' || (frac ?? '') !== '')
  .map(([sign, int, frac, exp]) => sign + int + (frac === null ? '' : `.${frac}`) + (exp === null ? '' : exp[0] + exp[1] + exp[2]));
const rowToken = fc.oneof(
  { weight: 8, arbitrary: plainToken },
  { weight: 1, arbitrary: fc.constantFrom('-999.25', '-999.2500', '-9999', '-9999.0', '-0.0', '.5', '5.', '-.5', '0', '1e5', '1E-5', '1e005') },
);
const blanks = fc.stringMatching(/^[ \t]{1,3}$/);
const lineEnd = fc.constantFrom('\n', '\r\n', '\r');

/** Expected value of a plain token: Number(), nulls (-999.25 and the alias -9999) as NaN. */
const expected = (t: string) => {
  const v = Number(t);
  return v === -999.25 || v === -9999 || !Number.isFinite(v) ? Number.NaN : v;
};

describe('scanDataFast plain lines', () => {
  it('scanDataFast reads rows of plain decimals exactly as Number() does, whatever the blanks and line ends (property)', () => {
    const file = fc.integer({ min: 1, max: 5 }).chain((nc) =>
      fc.record({
        nc: fc.constant(nc),
        rows: fc.array(fc.tuple(fc.array(fc.tuple(blanks, rowToken), { minLength: nc, maxLength: nc }), fc.constantFrom('', ' ', '\t '), lineEnd), { minLength: 1, maxLength: 12 }),
        lastEnd: fc.boolean(),
      }),
    );
    fc.assert(
      fc.property(file, ({ nc, rows, lastEnd }) => {
        const text = rows.map(([cells, trail, eol], k) => cells.map(([b, t]) => b + t).join('') + trail + (k < rows.length - 1 || lastEnd ? eol : '')).join('');
        // A view at an odd offset into a larger buffer, as a Node Buffer often is.
        const raw = enc.encode(text);
        const big = new Uint8Array(raw.length + 8);
        big.set(raw, 3);
        const r = scanDataFast(big.subarray(3, 3 + raw.length), 0, params(nc));
        expect(r.rows).toBe(rows.length);
        expect(r.mismatchedRows).toBe(0);
        expect(r.end).toBe(raw.length);
        rows.forEach(([cells], row) =>
          cells.forEach(([, t], c) => {
            const got = r.columns[c][row];
            expect(same(got, expected(t)), `${t} -> ${got}`).toBe(true);
          }),
        );
        const aliasCount = rows.reduce((n, [cells]) => n + cells.filter(([, t]) => Number(t) === -9999).length, 0);
        expect(r.aliasNulls).toBe(aliasCount);
      }),
      { numRuns: 500 },
    );
  });

  it('scanDataFast agrees with scanDataGeneral on rows that are short, long or hold odd tokens (property)', () => {
    const token = fc.oneof({ weight: 6, arbitrary: rowToken }, { weight: 1, arbitrary: fc.constantFrom('abc', '1.5D+02', '+3', '1.#IND', '-', '.', 'e5', '1e', '1e999', '12345678901234567890', '0.12345678901234567891') });
    const line = fc.oneof(
      { weight: 6, arbitrary: fc.tuple(fc.constantFrom('', ' ', '\t'), fc.array(fc.tuple(token, blanks), { minLength: 1, maxLength: 6 })).map(([lead, cells]) => lead + cells.map(([t, b]) => t + b).join('').trimEnd()) },
      { weight: 1, arbitrary: fc.constantFrom('', '  ', '# note', 'text only', ' \t~Other') },
    );
    fc.assert(
      fc.property(fc.array(fc.tuple(line, lineEnd), { minLength: 1, maxLength: 15 }), fc.integer({ min: 1, max: 5 }), fc.boolean(), (lines, nc, lastEnd) => {
        const text = lines.map(([l, e], k) => l + (k < lines.length - 1 || lastEnd ? e : '')).join('');
        const bytes = enc.encode(text);
        const pf = params(nc);
        const pg = params(nc);
        const f = scanDataFast(bytes, 0, pf);
        const g = scanDataGeneral(bytes, 0, pg);
        expect([f.rows, f.end, f.mismatchedRows, f.aliasNulls]).toEqual([g.rows, g.end, g.mismatchedRows, g.aliasNulls]);
        // After a last line without a line end the general reader counts one line more.
        const openLast = text !== '' && !/[\r\n]$/.test(text) && f.end === bytes.length;
        expect(f.endLine).toBe(openLast ? g.endLine - 1 : g.endLine);
        expect(f.firstMismatch).toEqual(g.firstMismatch);
        for (let c = 0; c < nc; c++) for (let r = 0; r < f.rows; r++) expect(same(f.columns[c][r], g.columns[c][r])).toBe(true);
        const strip = (l: DiagnosticLog) => l.finish().map((d) => `${d.severity}@${d.line}:${d.message}`);
        expect(strip(pf.log)).toEqual(strip(pg.log));
      }),
      { numRuns: 500 },
    );
  });

  it('scanDataFast reads the edge cases of the plain reader like Number() and scanDataGeneral', () => {
    const text = [
      '-0.0 .5 5. -.5',
      '\t1e5\t1E-5  1e005 -999.25',
      ' 9007199254740993 0.12345678901234567 123456789012345.6 1234567890123456',
      '1000.6096 -9999 32.327475 105.054579',
      '1 2 3',
      '1 2 3 4 5',
      '1.5 2.25 3.125 4.0625',
    ].join('\r\n') + '\r7 8 9 10';
    const bytes = enc.encode(text);
    const pf = params(4);
    const f = scanDataFast(bytes, 0, pf);
    const g = scanDataGeneral(bytes, 0, params(4));
    expect(f.rows).toBe(8);
    expect(f.end).toBe(bytes.length);
    expect(f.endLine).toBe(8);
    const row = (r: number) => f.columns.map((c) => c[r]);
    expect(Object.is(row(0)[0], -0)).toBe(true);
    expect(row(0).slice(1)).toEqual([0.5, 5, -0.5]);
    expect(row(1)).toEqual([1e5, 1e-5, 1e5, Number.NaN]);
    expect(row(2)).toEqual(['9007199254740993', '0.12345678901234567', '123456789012345.6', '1234567890123456'].map(Number));
    expect(row(3)).toEqual([1000.6096, Number.NaN, 32.327475, 105.054579]);
    expect(row(4)).toEqual([1, 2, 3, Number.NaN]);
    expect(row(5)).toEqual([1, 2, 3, 4]);
    expect(row(6)).toEqual([1.5, 2.25, 3.125, 4.0625]);
    expect(row(7)).toEqual([7, 8, 9, 10]);
    expect([f.mismatchedRows, f.aliasNulls]).toEqual([2, 1]);
    for (let c = 0; c < 4; c++) for (let r = 0; r < f.rows; r++) expect(same(f.columns[c][r], g.columns[c][r])).toBe(true);
    expect(pf.log.finish().map((d) => d.line)).toEqual([5, 6]);
  });
});

describe('parseNumberText', () => {
  it.each([
    ['-999.2500', -999.25],
    ['1.5D+02', 150],
    ['.5', 0.5],
    ['5.', 5],
    ['+3e2', 300],
  ])('parseNumberText(%j) = %d', (t, v) => expect(parseNumberText(t)).toBe(v));

  it.each(['', 'null', 'NaN', 'Infinity', '0x10', '1.#IND', '1e', '--1'])('parseNumberText(%j) is NaN', (t) => {
    expect(parseNumberText(t)).toBeNaN();
  });
});

describe('scanDataGeneral (wrapped)', () => {
  it('scanDataGeneral starts a new row at a lone index when a wrapped row is short', () => {
    const p = params(4, { wrapped: true });
    const r = scanDataGeneral(enc.encode('100\n1 2 3\n101\n4\n102\n6 7 8\n'), 0, p);
    expect(r.rows).toBe(3);
    expect(Array.from(r.columns[0])).toEqual([100, 101, 102]);
    expect(Array.from(r.columns[2])).toEqual([2, Number.NaN, 7]);
    expect(p.log.finish()).toHaveLength(1);
  });

  it('scanDataGeneral completes a wrapped row whose last line holds one value', () => {
    const r = scanDataGeneral(enc.encode('100\n1 2\n3\n101\n4 5\n6\n'), 0, params(4, { wrapped: true }));
    expect(Array.from(r.columns[3])).toEqual([3, 6]);
    expect(r.mismatchedRows).toBe(0);
  });
});
